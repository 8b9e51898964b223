// `npm run bench:precompute [-- --z 1-18]`: the SCF precompute through the job queue, on one app
// instance and then on two against the same database, in the same run. Each run starts from an
// empty cache for the range; once every instance is up, the bench queues the batches the app would
// queue (server/utils/precompute-jobs.ts) and times from there to the last batch done (pg-boss's
// own timestamps), so an instance's start-up is not counted. Target: two take at most 0.6× of one.
// Each instance runs in a session of its own: Linux's autogroup scheduling shares the CPU between
// sessions, so two servers started from one session would split one share, unlike two servers on
// two hosts (the deployment this measures). On a busy shared machine the ratio still varies.
import PgBoss from 'pg-boss'
import { cachedScfKeys } from '../server/utils/scf-cache'
import { precomputeJobs } from '../server/utils/precompute-jobs'
import { ENGINE_VERSION } from '../shared/physics'
import { parseZRange, wantedSpecies } from '../shared/precompute-plan'
import { startInstances } from '../tests/support/instances'
import { runBench, withStack, type Stack } from './lib/stack'

const zArg = process.argv.indexOf('--z')
const RANGE = zArg >= 0 ? process.argv[zArg + 1]! : '1-22'
const TARGET = 0.6
const BATCH = 8

async function timed(stack: Stack, instances: number): Promise<{ seconds: number; byInstance: Record<string, number>; busy: Record<string, number> }> {
  const z = parseZRange(RANGE)!
  await stack.db('species_scf_cache').whereBetween('z', [z.from, z.to]).andWhere({ engine_version: ENGINE_VERSION }).delete()
  await stack.db.raw(`delete from pgboss.job where name = 'precompute'`)
  const started = await startInstances(instances, { ...stack.env, NUXT_JOBS_ENABLED: 'true', NUXT_JOBS_PRECOMPUTE: 'off', NUXT_JOBS_POLL_SECONDS: '0.5', NUXT_JOBS_NOTICES_CRON: '15 6 * * *' }, { ownSession: true })
  const boss = new PgBoss({ connectionString: stack.env.NUXT_DATABASE_URL!, migrate: false, supervise: false, schedule: false, max: 2 })
  try {
    await boss.start()
    await boss.insert(precomputeJobs(await cachedScfKeys(stack.db), RANGE, BATCH))
    for (;;) {
      const r = await stack.db.raw(`select count(*) filter (where state = 'completed')::int as done, count(*)::int as total from pgboss.job where name = 'precompute'`)
      const { done, total } = r.rows[0]
      if (total > 0 && done === total) break
      const failed = await stack.db.raw(`select count(*)::int as n from pgboss.job where name = 'precompute' and state = 'failed'`)
      if (failed.rows[0].n) throw new Error('a precompute batch failed: see /jobs')
      await new Promise((res) => setTimeout(res, 500))
    }
    const span = await stack.db.raw(`select extract(epoch from max(completed_on) - min(created_on))::float as s from pgboss.job where name = 'precompute'`)
    const outputs = await stack.db.raw(`select output, extract(epoch from completed_on - started_on)::float as busy from pgboss.job where name = 'precompute'`)
    const byInstance: Record<string, number> = {}
    const busy: Record<string, number> = {}
    for (const { output, busy: b } of outputs.rows) {
      byInstance[output.instance] = (byInstance[output.instance] ?? 0) + output.solved.length
      busy[output.instance] = (busy[output.instance] ?? 0) + b
    }
    return { seconds: span.rows[0].s, byInstance, busy }
  } finally {
    await boss.stop({ graceful: false }).catch(() => {})
    await started.stop()
  }
}

async function main(): Promise<number> {
  return withStack(async (stack) => {
    const z = parseZRange(RANGE)!
    const species = wantedSpecies(z.from, z.to).length
    const one = await timed(stack, 1)
    const two = await timed(stack, 2)
    const ratio = two.seconds / one.seconds
    const ok = ratio <= TARGET
    console.log(`
SCF precompute through the job queue, elements ${RANGE} (${species} species with a NIST reference), batches of ${BATCH}
  one instance    ${one.seconds.toFixed(1)} s   solved per instance: ${Object.values(one.byInstance).join(', ')}   busy in jobs: ${Object.values(one.busy).map((b) => `${b.toFixed(1)} s`).join(', ')}
  two instances   ${two.seconds.toFixed(1)} s   solved per instance: ${Object.values(two.byInstance).join(', ')}   busy in jobs: ${Object.values(two.busy).map((b) => `${b.toFixed(1)} s`).join(', ')}
  ratio two / one ${ratio.toFixed(2)}
  target: ratio <= ${TARGET}   ${ok ? 'PASS' : 'FAIL'}`)
    return ok ? 0 : 1
  })
}

runBench(main)
