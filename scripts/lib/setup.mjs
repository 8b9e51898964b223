// Installing what is missing and building only when the sources changed.
import { existsSync, statSync, readdirSync, readFileSync, writeFileSync, mkdirSync } from 'node:fs'
import { createHash } from 'node:crypto'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { run, aptInstall, startChild } from './proc.mjs'

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..')

/** Runs `npm ci` when node_modules is missing or older than package-lock.json. */
export function ensureNodeModules() {
  const marker = path.join(ROOT, 'node_modules', '.package-lock.json')
  const lock = path.join(ROOT, 'package-lock.json')
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return
  console.log('Installing npm packages (npm ci)…')
  run('npm', ['ci', '--no-audit', '--no-fund'], { cwd: ROOT })
}

/** Installs Debian packages for the commands that are missing (e.g. { '/usr/bin/chromium': 'chromium' }). */
export function ensureDebianTools(map) {
  const missing = [...new Set(Object.entries(map).filter(([file]) => !existsSync(file)).map(([, pkg]) => pkg))]
  if (missing.length) aptInstall(missing)
}

const BUILD_INPUTS = ['app', 'server', 'shared', 'public', 'modules', 'nuxt.config.ts', 'tailwind.config.ts', 'package-lock.json']

function hashTree(hash, target) {
  if (!existsSync(target)) return
  const st = statSync(target)
  if (st.isDirectory()) {
    for (const name of readdirSync(target).sort()) hashTree(hash, path.join(target, name))
  } else {
    hash.update(path.relative(ROOT, target))
    hash.update(readFileSync(target))
  }
}

/** Builds the app with `nuxt build` unless .output was built from exactly these sources. */
export function ensureBuild({ force = false } = {}) {
  const hash = createHash('sha256')
  for (const input of BUILD_INPUTS) hashTree(hash, path.join(ROOT, input))
  const digest = hash.digest('hex')
  const stamp = path.join(ROOT, '.output', '.ionfolio-build')
  if (!force && existsSync(stamp) && readFileSync(stamp, 'utf8') === digest && existsSync(path.join(ROOT, '.output', 'server', 'index.mjs'))) {
    console.log('The build is up to date')
    return
  }
  console.log('Building the app (nuxt build)…')
  run('npx', ['nuxt', 'build'], { cwd: ROOT, env: { ...process.env, NODE_ENV: 'production' } })
  mkdirSync(path.dirname(stamp), { recursive: true })
  writeFileSync(stamp, digest)
}

/**
 * Runs the database chores script (migrate, seed) with tsx against the database in `env`;
 * resolves when it is done and rejects when it fails. It does not block this process: the object
 * store runs in here, and the seeds upload their datasheets to it.
 */
export async function dbTask(args, env) {
  const child = startChild(process.execPath, ['--import', 'tsx', path.join(ROOT, 'scripts', 'db.ts'), ...args], { cwd: ROOT, env: { ...process.env, ...env }, stdio: 'inherit' })
  const code = await child.exited
  if (code !== 0) throw new Error(`scripts/db.ts ${args.join(' ')} exited with ${code}`)
}
