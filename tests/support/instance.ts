import { spawn } from 'node:child_process'
import net from 'node:net'
import path from 'node:path'

/** A free TCP port on 127.0.0.1. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer()
    s.once('error', reject)
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo
      s.close(() => resolve(port))
    })
  })
}

/**
 * A second instance of the built app on the test run's database and mail, with settings of its
 * own (`env`): how a test points the app at a store that is stopped, frozen or slow without
 * touching the instance every other test uses. Stop it with `stop()`.
 */
export async function startInstance(env: Record<string, string>): Promise<{ base: string; stop: () => Promise<void> }> {
  const port = await freePort()
  const base = `http://127.0.0.1:${port}`
  const child = spawn(process.execPath, [path.resolve('.output/server/index.mjs')], {
    env: { ...process.env, NODE_ENV: 'production', HOST: '127.0.0.1', PORT: String(port), NUXT_PUBLIC_BASE_URL: base, NUXT_TRUST_PROXY: 'true', ...env },
    stdio: ['ignore', 'ignore', 'inherit'],
  })
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()))
  const until = Date.now() + 30_000
  for (;;) {
    if (child.exitCode !== null) throw new Error('the second app instance stopped at start')
    const up = await fetch(`${base}/api/auth/me`).then(() => true, () => false)
    if (up) break
    if (Date.now() > until) throw new Error('the second app instance did not start')
    await new Promise((r) => setTimeout(r, 200))
  }
  return {
    base,
    stop: async () => {
      if (child.exitCode === null) child.kill('SIGTERM')
      await exited
    },
  }
}

/** A TCP server that accepts connections and never answers: a frozen store. */
export async function frozenServer(): Promise<{ port: number; close: () => Promise<void> }> {
  const sockets = new Set<net.Socket>()
  const server = net.createServer((s) => {
    sockets.add(s)
    s.on('error', () => {})
    s.on('close', () => sockets.delete(s))
  })
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()))
  return {
    port: (server.address() as net.AddressInfo).port,
    close: () => new Promise((r) => {
      for (const s of sockets) s.destroy()
      server.close(() => r())
    }),
  }
}

/**
 * A TCP proxy to `target` that passes every byte a client sends on `delayMs` later (0 at first;
 * set it on the handle at any time), and passes it on even when the client has given up
 * meanwhile: a store so slow that a write arrives after the app stopped waiting for it.
 */
export async function slowProxy(target: number): Promise<{ port: number; delayMs: number; close: () => Promise<void> }> {
  const sockets = new Set<net.Socket>()
  const handle = { port: 0, delayMs: 0, close: async () => {} }
  const server = net.createServer((client) => {
    const upstream = net.connect(target, '127.0.0.1')
    sockets.add(client)
    sockets.add(upstream)
    let pending = 0
    let clientGone = false
    const endWhenFlushed = () => {
      if (clientGone && pending === 0) setTimeout(() => upstream.destroy(), 2_000)
    }
    client.on('error', () => {})
    upstream.on('error', () => {})
    client.on('data', (d) => {
      pending++
      setTimeout(() => {
        if (!upstream.destroyed) upstream.write(d)
        pending--
        endWhenFlushed()
      }, handle.delayMs)
    })
    upstream.on('data', (d) => {
      if (!client.destroyed) client.write(d)
    })
    client.on('close', () => {
      clientGone = true
      endWhenFlushed()
    })
    upstream.on('close', () => client.destroy())
  })
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()))
  handle.port = (server.address() as net.AddressInfo).port
  handle.close = () => new Promise((r) => {
    for (const s of sockets) s.destroy()
    server.close(() => r())
  })
  return handle
}
