// `npm start`: install what is missing, start PostgreSQL, the object store and the mail inbox,
// migrate, seed the demo laboratory on first run, build, and serve. Ctrl-C stops everything.
import path from 'node:path'
import { ensureNodeModules, ensureBuild, dbTask, ROOT } from './lib/setup.mjs'
import { portInUse, startChild, waitFor } from './lib/proc.mjs'

const PORTS = {
  app: Number(process.env.PORT ?? 3300),
  postgres: Number(process.env.IONFOLIO_PG_PORT ?? 55432),
  s3: Number(process.env.IONFOLIO_S3_PORT ?? 9300),
  smtp: Number(process.env.IONFOLIO_SMTP_PORT ?? 2526),
  mailWeb: Number(process.env.IONFOLIO_MAIL_WEB_PORT ?? 8026),
}
const STORAGE = path.join(ROOT, 'storage')

ensureNodeModules()
const { startServices } = await import('./lib/services.mjs')

for (const [name, port] of Object.entries({ app: PORTS.app, s3: PORTS.s3, smtp: PORTS.smtp, mailWeb: PORTS.mailWeb })) {
  if (await portInUse(port)) {
    console.error(`Port ${port} (${name}) is already in use: is Ionfolio already running? Stop it, or set a different port (see README).`)
    process.exit(1)
  }
}

console.log('Starting PostgreSQL, the object store and the mail inbox…')
const services = await startServices({ storage: STORAGE, ports: PORTS, database: 'ionfolio', mail: 'inbox' })
let app = null
let stopping = false
async function stop(code = 0) {
  if (stopping) return
  stopping = true
  console.log('\nStopping…')
  for (const child of [app]) {
    if (child && child.exitCode === null) {
      child.kill('SIGTERM')
      await child.exited
    }
  }
  await services.stop()
  process.exit(code)
}
process.on('SIGINT', () => stop(0))
process.on('SIGTERM', () => stop(0))

try {
  await dbTask(['migrate'], services.migrationEnv)
  await dbTask(['seed'], services.migrationEnv)
  ensureBuild()
} catch (e) {
  console.error(e.message)
  await stop(1)
}

const baseUrl = `http://localhost:${PORTS.app}`
app = startChild(process.execPath, [path.join(ROOT, '.output', 'server', 'index.mjs')], {
  prefix: 'app',
  env: { ...process.env, ...services.env, NODE_ENV: 'production', HOST: '127.0.0.1', PORT: String(PORTS.app), NUXT_PUBLIC_BASE_URL: baseUrl },
})
app.exited.then((code) => {
  if (!stopping) {
    console.error(`The app server stopped (exit ${code})`)
    stop(code || 1)
  }
})
await waitFor(async () => (await fetch(`http://127.0.0.1:${PORTS.app}/api/health`)).ok, { timeoutMs: 60_000, what: 'the app server' })

// The app itself queues the SCF-cache precompute of a new engine version (server/utils/jobs.ts):
// its job workers solve it in the background, shared with any other instance on the same database.

console.log(`
  Ionfolio is running at   ${baseUrl}
  Mail inbox (demo):       ${services.mailer.url}
  Sign-ins are in README.md (demo only). Press Ctrl-C to stop.
`)
