import { describe, it, expect, afterAll } from 'vitest'
import { signedIn } from '../support/api'
import { testDb, closeTestDb } from '../support/db'

afterAll(closeTestDb)

describe('GET /api/overview', () => {
  it('counts the stock by status and lists what is due within 30 days, soonest first', async () => {
    const r = await (await signedIn('technician')).get('/api/overview')
    expect(r.status).toBe(200)
    const db = testDb()
    const total = Number((await db('samples').count({ n: '*' }).first())!.n)
    expect(r.body.samples.total).toBe(total)
    const available = Number((await db('samples').where({ status: 'available' }).count({ n: '*' }).first())!.n)
    expect(r.body.samples.byStatus.available).toBe(available)
    const dates = r.body.due.map((d: { recertifyBy: string }) => d.recertifyBy)
    expect([...dates].sort()).toEqual(dates)
    const in30 = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10)
    expect(dates.every((d: string) => d <= in30)).toBe(true)
    // The demo stock holds samples overdue (a 208Pb target) and due soon (a 58Ni foil).
    expect(r.body.due.some((d: { overdue: boolean }) => d.overdue)).toBe(true)
    expect(r.body.due.some((d: { overdue: boolean }) => !d.overdue)).toBe(true)
  })
})
