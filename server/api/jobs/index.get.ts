import { CAN } from '#shared/auth/roles'
import { JOB_QUEUES, JOB_STATES, QUEUE } from '#shared/jobs'
import { ENGINE_VERSION } from '#shared/physics'
import { SCF_METHOD } from '#shared/physics/scf'
import { parseZRange, wantedSpecies } from '#shared/precompute-plan'

// The background jobs at a glance, for lab managers: per queue, how many are waiting, running,
// done and failed; the latest failures with their error; and how far the SCF precompute of this
// engine version has come. Read straight from pg-boss's tables, so any instance answers the same.
type Counts = Record<(typeof JOB_STATES)[number], number>
interface QueueView {
  name: string
  counts: Counts
  schedule: { name: string; cron: string; timezone: string | null } | null
  worked: boolean
}
interface Failure {
  id: string
  queue: string
  state: string
  retries: number
  at: string | null
  error: string | null
  species?: string[]
}

export default defineEventHandler(async (event): Promise<{ queues: QueueView[]; failures: Failure[]; precompute: { engineVersion: string; range: string; wanted: number; cached: number } }> => {
  requireRole(event, ...CAN.viewJobs)
  const db = useDb()
  const counts = await db.raw(`select name, state::text as state, count(*)::int as n from pgboss.job group by 1, 2`)
  const failures = await db.raw(
    `select id, name, state::text as state, retry_count, output, completed_on, data from pgboss.job where state = 'failed' or (state = 'retry' and output is not null) order by coalesce(completed_on, created_on) desc limit 20`,
  )
  const schedules = await db.raw(`select name, cron, timezone from pgboss.schedule order by name`)
  const range = parseZRange(String((useRuntimeConfig().jobs as { precompute: string }).precompute))
  const wanted = range ? wantedSpecies(range.from, range.to).length : 0
  const cached = await db('species_scf_cache').where({ method: SCF_METHOD, engine_version: ENGINE_VERSION }).count<{ n: string }[]>('* as n')
  return {
    queues: JOB_QUEUES.map((q) => ({
      name: q.name,
      counts: Object.fromEntries(JOB_STATES.map((s) => [s, counts.rows.find((r: { name: string; state: string }) => r.name === q.name && r.state === s)?.n ?? 0])) as Counts,
      schedule: schedules.rows.find((s: { name: string }) => s.name === q.name) ?? null,
      worked: true,
    })),
    failures: failures.rows.map((f: any) => ({
      id: f.id,
      queue: f.name,
      state: f.state,
      retries: f.retry_count,
      at: f.completed_on,
      error: typeof f.output?.message === 'string' ? f.output.message : f.output ? JSON.stringify(f.output).slice(0, 500) : null,
      species: f.name === QUEUE.precompute ? (f.data?.species ?? []).map((s: { z: number; charge: number }) => `${s.z}:${s.charge}`) : undefined,
    })),
    precompute: { engineVersion: ENGINE_VERSION, range: range ? `${range.from}-${range.to}` : 'off', wanted, cached: Number(cached[0]!.n) },
  }
})
