// Small process helpers for the start and test scripts. Node built-ins only: these run before
// `npm ci` has installed anything.
import { spawn, spawnSync } from 'node:child_process'
import net from 'node:net'

/** Runs a command to completion, inheriting output unless `quiet`; throws on a non-zero exit. */
export function run(cmd, args, { quiet = false, env, cwd, input } = {}) {
  const r = spawnSync(cmd, args, {
    stdio: input !== undefined ? ['pipe', quiet ? 'pipe' : 'inherit', quiet ? 'pipe' : 'inherit'] : quiet ? 'pipe' : 'inherit',
    env: env ?? process.env,
    cwd,
    input,
    encoding: 'utf8',
  })
  if (r.error) throw r.error
  if (r.status !== 0) {
    const detail = quiet ? `\n${r.stdout ?? ''}${r.stderr ?? ''}` : ''
    throw new Error(`${cmd} ${args.join(' ')} exited with ${r.status}${detail}`)
  }
  return r.stdout ?? ''
}

/** True when `cmd` is on the PATH. */
export function hasCommand(cmd) {
  return spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0
}

/** A TCP port that was free a moment ago on 127.0.0.1. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const srv = net.createServer()
    srv.unref()
    srv.on('error', reject)
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address()
      srv.close(() => resolve(port))
    })
  })
}

/** True when something accepts connections on 127.0.0.1:port. */
export function portInUse(port) {
  return new Promise((resolve) => {
    const sock = net.connect({ host: '127.0.0.1', port })
    sock.once('connect', () => { sock.destroy(); resolve(true) })
    sock.once('error', () => resolve(false))
  })
}

/** Polls `check` until it resolves truthy or `timeoutMs` passes. */
export async function waitFor(check, { timeoutMs = 30_000, intervalMs = 100, what = 'service' } = {}) {
  const until = Date.now() + timeoutMs
  let lastError
  while (Date.now() < until) {
    try {
      if (await check()) return
    } catch (e) {
      lastError = e
    }
    await new Promise((r) => setTimeout(r, intervalMs))
  }
  throw new Error(`timed out waiting for ${what}${lastError ? `: ${lastError.message}` : ''}`)
}

/** Starts a long-running child with prefixed output; resolves its exit code when it ends. */
export function startChild(cmd, args, { env, cwd, prefix, stdio } = {}) {
  const child = spawn(cmd, args, { env: env ?? process.env, cwd, stdio: stdio ?? ['ignore', 'pipe', 'pipe'] })
  if (!stdio) {
    const tag = prefix ? `[${prefix}] ` : ''
    const pipe = (stream, out) => {
      let buf = ''
      stream.on('data', (d) => {
        buf += d
        const lines = buf.split('\n')
        buf = lines.pop()
        for (const l of lines) out.write(tag + l + '\n')
      })
    }
    pipe(child.stdout, process.stdout)
    pipe(child.stderr, process.stderr)
  }
  child.exited = new Promise((resolve) => child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0))))
  return child
}

/** Installs Debian packages with apt-get (as root, or through sudo), updating the lists once. */
let aptUpdated = false
export function aptInstall(packages) {
  const asRoot = process.getuid?.() === 0
  const apt = (args) => (asRoot ? run('apt-get', args, { env }) : run('sudo', ['-n', 'apt-get', ...args], { env }))
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' }
  console.log(`Installing Debian packages: ${packages.join(' ')}`)
  if (!aptUpdated) {
    apt(['update', '-qq'])
    aptUpdated = true
  }
  apt(['install', '-y', '-qq', ...packages])
}
