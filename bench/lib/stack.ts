// A throwaway Ionfolio for a benchmark: PostgreSQL, object store and mail spool under a temporary
// folder (as `npm test` starts them), migrated and seeded, an optional preparation step on the
// database, then the built server. Everything stops when the callback ends.
import { mkdtempSync, chmodSync, rmSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import knexFactory, { type Knex } from 'knex'
import { ensureBuild, dbTask, ROOT } from '../../scripts/lib/setup.mjs'
import { freePort, startChild, waitFor } from '../../scripts/lib/proc.mjs'
import { startServices } from '../../scripts/lib/services.mjs'
import { DEMO_PEOPLE } from '../../seeds/01_people'

export interface Stack {
  /** the app's address, e.g. http://127.0.0.1:41234 */
  base: string
  /** a Knex pool on the bench database */
  db: Knex
  /** the NUXT_* settings that point an app server at this stack's services */
  env: Record<string, string>
  /** the session cookie of the demo person of `role` */
  cookieOf: (role: (typeof DEMO_PEOPLE)[number]['role']) => Promise<string>
}

/** Runs `work` against a fresh stack; `prepare` runs on the database before the server starts. */
export async function withStack<T>(work: (stack: Stack) => Promise<T>, prepare?: (db: Knex) => Promise<void>): Promise<T> {
  const tmp = mkdtempSync(path.join(os.tmpdir(), 'ionfolio-bench-'))
  chmodSync(tmp, 0o755)
  const ports = { postgres: await freePort(), s3: await freePort(), smtp: await freePort(), app: await freePort() }
  const services = await startServices({ storage: tmp, ports, database: 'ionfolio_bench', mail: 'spool' })
  let app: ReturnType<typeof startChild> | null = null
  const db = knexFactory({ client: 'pg', connection: services.adminDatabaseUrl, pool: { min: 0, max: 10 } })
  try {
    await dbTask(['migrate'], services.migrationEnv)
    await dbTask(['seed'], services.migrationEnv)
    if (prepare) await prepare(db)
    ensureBuild()
    const base = `http://127.0.0.1:${ports.app}`
    app = startChild(process.execPath, [path.join(ROOT, '.output', 'server', 'index.mjs')], {
      prefix: 'app',
      env: { NUXT_JOBS_ENABLED: 'false', ...process.env, ...services.env, NODE_ENV: 'production', HOST: '127.0.0.1', PORT: String(ports.app), NUXT_PUBLIC_BASE_URL: base },
    })
    await waitFor(async () => (await fetch(`${base}/api/health`)).ok, { timeoutMs: 60_000, what: 'the app server' })
    const cookieOf: Stack['cookieOf'] = async (role) => {
      const person = DEMO_PEOPLE.find((p) => p.role === role)!
      const r = await fetch(`${base}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json', origin: base }, body: JSON.stringify({ email: person.email, password: person.password }) })
      if (!r.ok) throw new Error(`could not sign in as ${role}: ${r.status}`)
      return r.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ')
    }
    return await work({ base, db, cookieOf, env: services.env })
  } finally {
    await db.destroy()
    if (app && app.exitCode === null) {
      app.kill('SIGTERM')
      await (app as unknown as { exited: Promise<number> }).exited
    }
    await services.stop()
    rmSync(tmp, { recursive: true, force: true })
  }
}

/** The p-th percentile (0–100) of `times`. */
export function percentile(times: number[], p: number): number {
  const sorted = [...times].sort((a, b) => a - b)
  return sorted[Math.max(0, Math.ceil((sorted.length * p) / 100) - 1)]!
}

/** Runs `main` and exits with its code, printing a failure plainly. */
export function runBench(main: () => Promise<number>): void {
  main().then(
    (code) => process.exit(code),
    (e: unknown) => {
      console.error(e instanceof Error ? e.message : e)
      process.exit(1)
    },
  )
}
