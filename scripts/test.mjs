// `npm test`: every test, against services of its own. Starts a throwaway PostgreSQL cluster,
// object store and SMTP spool under a fresh temporary folder, migrates and seeds it, builds and
// starts the app, runs vitest (arguments pass through, e.g. `npm test -- --project unit`), then
// stops it all. The demo's data under storage/ is never touched.
import { mkdtempSync, chmodSync, rmSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { ensureNodeModules, ensureDebianTools, ensureBuild, dbTask, ROOT } from './lib/setup.mjs'
import { freePort, startChild, waitFor } from './lib/proc.mjs'

const args = process.argv.slice(2)
const unitOnly = args.includes('--project') && args[args.indexOf('--project') + 1] === 'unit' && args.filter((a) => a === '--project').length === 1

ensureNodeModules()
const runVitest = (extra, env) => startChild(process.execPath, [path.join(ROOT, 'node_modules', 'vitest', 'vitest.mjs'), 'run', ...extra], { cwd: ROOT, env: { ...process.env, ...env }, stdio: 'inherit' }).exited

// The api and e2e projects share one server and database, so the projects run one after another
// (unit first: it is fastest and needs nothing). Explicit vitest arguments replace the sequence.
async function vitest(env) {
  if (args.length) return runVitest(args, env)
  let worst = await startChild('npx', ['nuxt', 'typecheck'], { cwd: ROOT, stdio: 'inherit' }).exited
  if (worst) console.error('Type check failed (nuxt typecheck)')
  for (const project of ['unit', 'api', 'e2e']) worst = Math.max(worst, await runVitest(['--project', project], env))
  return worst
}

// the unit tests compare the relativistic solver with ld1.x (Debian quantum-espresso)
ensureDebianTools({ '/usr/bin/ld1.x': 'quantum-espresso' })
if (unitOnly) process.exit(await runVitest(args, {}))

ensureDebianTools({ '/usr/bin/chromium': 'chromium', '/usr/bin/pdftoppm': 'poppler-utils', '/usr/bin/pdftotext': 'poppler-utils', '/usr/bin/pdfsig': 'poppler-utils', '/usr/bin/zbarimg': 'zbar-tools', '/usr/bin/ld1.x': 'quantum-espresso' })
const { startServices } = await import('./lib/services.mjs')

const tmp = mkdtempSync(path.join(os.tmpdir(), 'ionfolio-test-'))
chmodSync(tmp, 0o755)
const ports = { postgres: await freePort(), s3: await freePort(), smtp: await freePort(), app: await freePort() }
const services = await startServices({ storage: tmp, ports, database: 'ionfolio_test', mail: 'spool' })
let app = null
let code = 1
try {
  await dbTask(['migrate'], services.migrationEnv)
  await dbTask(['seed'], services.migrationEnv)
  ensureBuild()
  const baseUrl = `http://127.0.0.1:${ports.app}`
  const appEnv = {
    ...services.env,
    NODE_ENV: 'production',
    HOST: '127.0.0.1',
    PORT: String(ports.app),
    NUXT_PUBLIC_BASE_URL: baseUrl,
    // Tests vary X-Forwarded-For to act as different client addresses for the rate limits.
    NUXT_TRUST_PROXY: 'true',
    // A low per-token limit, so tests/api/tokens.test.ts can reach it.
    NUXT_TOKEN_RATE_LIMIT: '60',
    // No job workers on the shared test server (no precompute of the whole periodic table, no
    // schedule): tests/api/jobs.test.ts starts two instances of its own that share the jobs.
    NUXT_JOBS_ENABLED: 'false',
  }
  app = startChild(process.execPath, [path.join(ROOT, '.output', 'server', 'index.mjs')], { prefix: 'app', env: { ...process.env, ...appEnv } })
  await waitFor(async () => (await fetch(`${baseUrl}/api/health`)).ok, { timeoutMs: 60_000, what: 'the app server' })
  code = await vitest({
    ...services.env,
    IONFOLIO_TEST_BASE_URL: baseUrl,
    IONFOLIO_TEST_MAIL_DIR: services.mailer.spool,
    // Fixtures and fault set-ups use the superuser; tests/api/db-privileges.test.ts uses the app's login.
    IONFOLIO_TEST_ADMIN_DATABASE_URL: services.adminDatabaseUrl,
    IONFOLIO_TEST_OWNER_DATABASE_URL: services.migrationEnv.IONFOLIO_MIGRATION_DATABASE_URL,
    IONFOLIO_TEST_PG_DATA: services.pg.data,
    IONFOLIO_TEST_PG_PORT: String(ports.postgres),
    IONFOLIO_TEST_TMP: tmp,
    IONFOLIO_TEST_TOKEN_RATE_LIMIT: appEnv.NUXT_TOKEN_RATE_LIMIT,
  })
} catch (e) {
  console.error(e.message)
  code = 1
} finally {
  if (app && app.exitCode === null) {
    app.kill('SIGTERM')
    await app.exited
  }
  await services.stop()
  if (!process.env.IONFOLIO_KEEP_TEST_DATA) rmSync(tmp, { recursive: true, force: true })
}
process.exit(code)
