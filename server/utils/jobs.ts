import { hostname } from 'node:os'
import PgBoss from 'pg-boss'
import { ENGINE_VERSION } from '#shared/physics'
import { QUEUE } from '#shared/jobs'

// Background work shared by every app instance through PostgreSQL (pg-boss 10). Each instance
// starts pg-boss with `migrate: false` (the schema and queues are made by migrations, as the
// owner), works every queue, and a job is fetched by exactly one instance (SKIP LOCKED).
//   precompute       one job per batch of species of this engine version, enqueued at start-up
//                    when the SCF cache is incomplete; retried on failure; cached species skipped
//   notices-daily    the daily notices, on a cron schedule that pg-boss fires once per tick
//   object-store-reconcile  the store reconciliation (the storage:reconcile task: it only reports),
//                    on its own schedule, once per tick

let boss: PgBoss | null = null
export const INSTANCE = `${hostname()}:${process.pid}:${process.env.PORT ?? ''}`

/** Solves the batch's species not yet cached; answers what this instance solved and skipped. */
async function precomputeBatch(data: PrecomputeData): Promise<{ instance: string; solved: string[]; skipped: string[] }> {
  if (data.engineVersion !== ENGINE_VERSION) return { instance: INSTANCE, solved: [], skipped: data.species.map((s) => `${s.z}:${s.charge}`) }
  const done = await cachedScfKeys(useDb())
  const solved: string[] = []
  const skipped: string[] = []
  await Promise.all(
    data.species.map(async ({ z, charge }) => {
      const key = `${z}:${charge}`
      if (done.has(key)) return skipped.push(key)
      await computeScf(z, charge)
      solved.push(key)
    }),
  )
  return { instance: INSTANCE, solved: solved.sort(), skipped: skipped.sort() }
}

/** Enqueues the batches that still have uncached species; the same batch is never queued twice. */
export async function enqueuePrecompute(b: PgBoss, range: string, size: number): Promise<number> {
  const jobs = precomputeJobs(await cachedScfKeys(useDb()), range, size)
  if (jobs.length) await b.insert(jobs)
  return jobs.length
}

/** Starts pg-boss and the workers (Nitro plugin). */
export async function startJobs(): Promise<void> {
  const config = useRuntimeConfig().jobs as { enabled: boolean | string; precompute: string; precomputeBatch: number | string; noticesCron: string; reconcileCron: string; pollSeconds: number | string }
  if (String(config.enabled) === 'false') return
  const b = new PgBoss({ connectionString: String(useRuntimeConfig().databaseUrl), max: 3, migrate: false, application_name: 'ionfolio-jobs' })
  b.on('error', (e) => console.error('Job queue:', e instanceof Error ? e.message : e))
  await b.start()
  boss = b
  const poll = { pollingIntervalSeconds: Math.max(0.5, Number(config.pollSeconds) || 2), batchSize: 1 }
  await b.work<PrecomputeData>(QUEUE.precompute, poll, async ([job]) => precomputeBatch(job!.data))
  await b.work(QUEUE.notices, poll, async () => ({ instance: INSTANCE, ...(await runDailyNotices()) }))
  await b.schedule(QUEUE.notices, String(config.noticesCron), {}, { tz: 'UTC' })
  await b.work(QUEUE.reconcile, poll, async () => ({ instance: INSTANCE, ...((await runTask('storage:reconcile')).result as object) }))
  if (String(config.reconcileCron) === 'off') await b.unschedule(QUEUE.reconcile)
  else await b.schedule(QUEUE.reconcile, String(config.reconcileCron), {}, { tz: 'UTC' })
  const queued = await enqueuePrecompute(b, String(config.precompute), Math.max(1, Number(config.precomputeBatch) || 8))
  if (queued) console.log(`${queued} precompute batch(es) of engine ${ENGINE_VERSION} wanted (each is queued once, whichever instance asks)`)
}

/** Stops taking jobs; a job under way is given a moment to finish, else it is retried elsewhere. */
export async function stopJobs(): Promise<void> {
  const b = boss
  boss = null
  await b?.stop({ graceful: true, timeout: 10_000, wait: true }).catch(() => {})
}
