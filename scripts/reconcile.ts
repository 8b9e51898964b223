// `npm run reconcile [-- --fix] [--json] [--older-than SECONDS]`: compares the object store with the rows that point
// into it, with the app's own settings (NUXT_DATABASE_URL, NUXT_S3_*). Lists objects nothing points
// at and rows whose object is missing; `--fix` removes the orphan objects older than an hour
// (or --older-than) and nothing else. Exits 1 while anything is left to look at.
import knexFactory from 'knex'
import { Client } from 'minio'
import config from '../knex.config'
import { reconcileStore } from '../server/utils/store-reconcile'

const args = process.argv.slice(2)
const fix = args.includes('--fix')
const json = args.includes('--json')
const olderThan = args.includes('--older-than') ? Number(args[args.indexOf('--older-than') + 1]) : 3600
if (!Number.isFinite(olderThan) || olderThan < 0) {
  console.error('--older-than takes a number of seconds, e.g. --older-than 3600')
  process.exit(2)
}
const env = process.env
const useSSL = env.NUXT_S3_USE_SSL === 'true'
const store = new Client({
  endPoint: env.NUXT_S3_END_POINT ?? '127.0.0.1',
  port: Number(env.NUXT_S3_PORT ?? 9300),
  useSSL,
  accessKey: env.NUXT_S3_ACCESS_KEY ?? 'S3RVER',
  secretKey: env.NUXT_S3_SECRET_KEY ?? 'S3RVER',
  region: env.NUXT_S3_REGION ?? 'us-east-1',
  pathStyle: env.NUXT_S3_PATH_STYLE !== 'false',
})
const bucket = env.NUXT_S3_BUCKET ?? 'ionfolio'
const db = knexFactory(config)

try {
  const r = await reconcileStore(db, store, bucket, { fix, graceMs: olderThan * 1000 })
  const left = r.missing.length + r.orphans.length - r.removed.length
  if (json) {
    console.log(JSON.stringify({ objects: r.objects, references: r.references, orphans: r.orphans.map((o) => o.key), missing: r.missing, recent: r.recent.map((o) => o.key), removed: r.removed }))
  } else {
    console.log(`${r.objects} object(s) in the bucket, ${r.references} row(s) pointing into it`)
    for (const o of r.orphans) console.log(`  nothing points at: ${o.key} (${o.size} bytes, ${o.lastModified?.toISOString() ?? 'date unknown'})${r.removed.includes(o.key) ? ' — removed' : ''}`)
    for (const m of r.missing) console.log(`  object missing for ${m.table} ${m.id}: ${m.key}`)
    if (r.recent.length) console.log(`  ${r.recent.length} object(s) too young to judge without a row yet (an upload may be under way): left alone`)
    if (!left) console.log('Nothing to look at.')
    else if (r.orphans.length && !fix) console.log('Run with --fix to remove the objects nothing points at (rows are never touched).')
  }
  process.exitCode = left ? 1 : 0
} catch (e) {
  console.error('Reconciliation failed:', e instanceof Error ? e.message : e)
  process.exitCode = 2
} finally {
  await db.destroy()
}
