import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { freePort, startChild, waitFor } from '../../scripts/lib/proc.mjs'

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..')

export interface Instances {
  bases: string[]
  stop: () => Promise<void>
}

/**
 * Starts `count` more app servers (the built .output) on free ports against the same test
 * database, object store and mail spool as the test server, with `env` added.
 */
export async function startInstances(count: number, env: Record<string, string>, options: { ownSession?: boolean } = {}): Promise<Instances> {
  const children: Array<ReturnType<typeof startChild>> = []
  const bases: string[] = []
  const stop = async () => {
    await Promise.all(
      children.map(async (c) => {
        if (c.exitCode === null) {
          c.kill('SIGTERM')
          await (c as unknown as { exited: Promise<number> }).exited
        }
      }),
    )
  }
  try {
    for (let i = 0; i < count; i++) {
      const port = await freePort()
      const base = `http://127.0.0.1:${port}`
      children.push(
        // ownSession: each server in a session of its own (setsid), so with the kernel's autogroup
        // scheduling it gets its own share of the CPU, as a server on its own host would, instead of
        // splitting the share of the session that started it.
        startChild(options.ownSession ? 'setsid' : process.execPath, [...(options.ownSession ? [process.execPath] : []), path.join(ROOT, '.output', 'server', 'index.mjs')], {
          prefix: `instance-${i + 1}`,
          env: { ...process.env, NODE_ENV: 'production', HOST: '127.0.0.1', PORT: String(port), NUXT_PUBLIC_BASE_URL: base, ...env },
        }),
      )
      bases.push(base)
    }
    for (const base of bases) await waitFor(async () => (await fetch(`${base}/api/health`)).ok, { timeoutMs: 60_000, what: base })
  } catch (e) {
    await stop()
    throw e
  }
  return { bases, stop }
}
