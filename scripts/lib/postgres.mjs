// A private PostgreSQL cluster from Debian's packages, on 127.0.0.1 and a port of our own.
// initdb refuses to run as root, so as root every server command goes through
// `runuser -u postgres --` on folders owned by postgres.
import { existsSync, mkdirSync, readdirSync, chownSync, chmodSync, accessSync, constants } from 'node:fs'
import { spawnSync } from 'node:child_process'
import { createHash } from 'node:crypto'
import path from 'node:path'
import { run, aptInstall, hasCommand } from './proc.mjs'

const asRoot = process.getuid?.() === 0

/** The folder holding initdb and pg_ctl, installing Debian's postgresql when none is found. */
export function postgresBin() {
  const find = () => {
    const root = '/usr/lib/postgresql'
    if (existsSync(root)) {
      const versions = readdirSync(root).filter((v) => existsSync(path.join(root, v, 'bin', 'initdb'))).sort((a, b) => Number(b) - Number(a))
      if (versions.length) return path.join(root, versions[0], 'bin')
    }
    if (hasCommand('initdb') && hasCommand('pg_ctl')) return path.dirname(spawnSync('sh', ['-c', 'command -v initdb'], { encoding: 'utf8' }).stdout.trim())
    return null
  }
  let bin = find()
  if (!bin) {
    aptInstall(['postgresql'])
    bin = find()
  }
  if (!bin) throw new Error('PostgreSQL is not installed and apt-get could not install it')
  return bin
}

function asPostgres(cmd, args, opts = {}) {
  return asRoot ? run('runuser', ['-u', 'postgres', '--', cmd, ...args], opts) : run(cmd, args, opts)
}

function postgresCanReach(dir) {
  if (!asRoot) {
    try { accessSync(dir, constants.W_OK | constants.X_OK); return true } catch { return false }
  }
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir], { stdio: 'ignore' }).status === 0
}

/**
 * Where the cluster lives: `preferred` when the postgres user can reach it, otherwise a folder
 * under /var/tmp named after the project path (CI may clone into a private home).
 */
export function clusterDir(preferred) {
  const parent = path.dirname(preferred)
  mkdirSync(parent, { recursive: true })
  if (postgresCanReach(parent)) return preferred
  const tag = createHash('sha256').update(preferred).digest('hex').slice(0, 12)
  const fallback = path.join('/var/tmp', `ionfolio-${tag}`, path.basename(preferred))
  mkdirSync(path.dirname(fallback), { recursive: true })
  chmodSync(path.dirname(fallback), 0o755)
  return fallback
}

function ownedByPostgres(dir, mode) {
  mkdirSync(dir, { recursive: true })
  if (asRoot) {
    const uid = Number(run('id', ['-u', 'postgres'], { quiet: true }).trim())
    const gid = Number(run('id', ['-g', 'postgres'], { quiet: true }).trim())
    chownSync(dir, uid, gid)
  }
  chmodSync(dir, mode)
}

/** Starts (creating on first use) a cluster in `dir` on 127.0.0.1:`port`; returns a handle. */
export function startPostgres({ dir, port }) {
  const bin = postgresBin()
  const data = path.join(dir, 'data')
  const sock = path.join(dir, 'run')
  if (asRoot) ownedByPostgres(dir, 0o755)
  else mkdirSync(dir, { recursive: true })
  ownedByPostgres(sock, 0o775)
  if (!existsSync(path.join(data, 'PG_VERSION'))) {
    ownedByPostgres(data, 0o700)
    asPostgres(path.join(bin, 'initdb'), ['-D', data, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], { quiet: true })
  }
  const opts = `-p ${port} -c listen_addresses=127.0.0.1 -c unix_socket_directories=${sock}`
  const status = spawnSync(asRoot ? 'runuser' : path.join(bin, 'pg_ctl'), asRoot ? ['-u', 'postgres', '--', path.join(bin, 'pg_ctl'), '-D', data, 'status'] : ['-D', data, 'status'], { stdio: 'ignore' })
  if (status.status !== 0) {
    asPostgres(path.join(bin, 'pg_ctl'), ['-D', data, '-l', path.join(dir, 'server.log'), '-w', '-t', '60', '-o', opts, 'start'], { quiet: true })
  }
  const handle = {
    bin,
    data,
    port,
    url: (database) => `postgres://postgres@127.0.0.1:${port}/${database}`,
    /** Runs one SQL statement through psql as the superuser. */
    psql: (sql, database = 'postgres') =>
      run(path.join(bin, 'psql'), ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', '-d', database, '-v', 'ON_ERROR_STOP=1', '-qAt', '-c', sql], { quiet: true }),
    ensureDatabase: (name) => {
      const exists = handle.psql(`select 1 from pg_database where datname = '${name}'`).trim() === '1'
      if (!exists) handle.psql(`create database "${name}"`)
    },
    stop: () => {
      try {
        asPostgres(path.join(bin, 'pg_ctl'), ['-D', data, '-m', 'fast', '-w', 'stop'], { quiet: true })
      } catch {
        // already stopped
      }
    },
    start: () => asPostgres(path.join(bin, 'pg_ctl'), ['-D', data, '-l', path.join(dir, 'server.log'), '-w', '-t', '60', '-o', opts, 'start'], { quiet: true }),
  }
  return handle
}
