import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone, unique } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { allMail } from '../support/mail'
import { createSample } from '../support/samples'
import { dayFromNow } from '../support/certificates'
import { startInstances, type Instances } from '../support/instances'
import { batches, wantedSpecies } from '../../shared/precompute-plan'
import { ENGINE_VERSION } from '../../shared/physics'

// Two more app instances against the one test database share the background work: the
// precompute of the SCF cache for a few light elements and the daily notices (on a cron that
// fires every minute here). The shared test server runs no job workers (scripts/test.mjs).
const RANGE = { from: 1, to: 8 }
let instances: Instances | null = null
let c: Awaited<ReturnType<typeof everyone>>
let dueCode = ''

beforeAll(async () => {
  c = await everyone()
  const db = testDb()
  // The cache of these elements is emptied and their old jobs dropped, so this run must solve them.
  await db('species_scf_cache').whereBetween('z', [RANGE.from, RANGE.to]).andWhere({ engine_version: ENGINE_VERSION }).delete()
  await db.raw(`delete from pgboss.job where name in ('precompute', 'notices-daily')`)
  dueCode = (await createSample(c.manager, { name: `Shared notice ${unique()}`, recertifyBy: dayFromNow(9) })).code
  instances = await startInstances(2, {
    NUXT_JOBS_ENABLED: 'true',
    NUXT_JOBS_PRECOMPUTE: `${RANGE.from}-${RANGE.to}`,
    NUXT_JOBS_PRECOMPUTE_BATCH: '3',
    NUXT_JOBS_POLL_SECONDS: '0.5',
    NUXT_JOBS_NOTICES_CRON: '* * * * *',
  })
}, 120_000)

afterAll(async () => {
  await instances?.stop()
  // Put the schedule back, so nothing fires every minute after this file.
  await testDb().raw(`delete from pgboss.schedule where name = 'notices-daily'`)
  await closeTestDb()
})

async function until<T>(what: string, check: () => Promise<T | null | undefined | false>, timeoutMs: number): Promise<T> {
  const end = Date.now() + timeoutMs
  while (Date.now() < end) {
    const v = await check()
    if (v) return v
    await new Promise((r) => setTimeout(r, 500))
  }
  throw new Error(`timed out waiting for ${what}`)
}

describe('background jobs shared by two instances', () => {
  it('solves each species of the precompute exactly once, on both instances', async () => {
    const jobs = await until(
      'every precompute batch to finish',
      async () => {
        const rows = await testDb().raw(`select state, output from pgboss.job where name = 'precompute'`)
        return rows.rows.length && rows.rows.every((r: { state: string }) => r.state === 'completed') ? rows.rows : null
      },
      90_000,
    )
    const solved: string[] = jobs.flatMap((j: any) => j.output.solved)
    const wanted = wantedSpecies(RANGE.from, RANGE.to).map((s) => `${s.z}:${s.charge}`)
    // Both instances asked for every batch at start-up; each batch was queued once.
    expect(jobs.length).toBe(batches(wantedSpecies(RANGE.from, RANGE.to), 3).length)
    expect(solved.length).toBe(wanted.length)
    expect(new Set(solved).size).toBe(solved.length)
    expect([...solved].sort()).toEqual([...wanted].sort())
    // Both instances took batches.
    expect(new Set(jobs.map((j: any) => j.output.instance)).size).toBe(2)
    const cached = await testDb()('species_scf_cache').whereBetween('z', [RANGE.from, RANGE.to]).andWhere({ engine_version: ENGINE_VERSION }).count<{ count: string }[]>('* as count')
    expect(Number(cached[0]!.count)).toBe(wanted.length)
  }, 120_000)

  it('sends each daily notice once, from one instance per schedule tick', async () => {
    await until('the scheduled notices to mention the due sample', async () => allMail().some((m) => m.text.includes(dueCode)), 150_000)
    // Give the other instance time to (wrongly) run the same tick too.
    await new Promise((r) => setTimeout(r, 5_000))
    const r = await testDb().raw(`select date_trunc('minute', created_on) as minute, count(*)::int as n from pgboss.job where name = 'notices-daily' group by 1`)
    expect(r.rows.length).toBeGreaterThanOrEqual(1)
    for (const run of r.rows) expect(run.n).toBe(1)
    expect(allMail().filter((m) => m.text.includes(dueCode))).toHaveLength(1)
  }, 180_000)
})
