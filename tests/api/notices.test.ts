import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone, unique } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { allMail, waitForMail } from '../support/mail'
import { createSample } from '../support/samples'
import { certifiableSample, dayFromNow, issue } from '../support/certificates'

let c: Awaited<ReturnType<typeof everyone>>
beforeAll(async () => {
  c = await everyone()
})
afterAll(closeTestDb)

const MANAGER = 'manager@larchmere-lab.example'
const TECHNICIAN = 'technician@larchmere-lab.example'
const mentioning = (text: string) => allMail().filter((m) => m.text.includes(text))

async function runNotices() {
  const r = await c.manager.post('/api/notices/run')
  expect(r.status, JSON.stringify(r.body)).toBe(200)
  return r.body as { recertification: number; overdue: number; certificates: number }
}

describe('the daily notices', () => {
  it('tells the managers once about a sample due for re-certification within 30 days', async () => {
    const s = await createSample(c.manager, { name: `Due soon ${unique()}`, recertifyBy: dayFromNow(10) })
    const later = await createSample(c.manager, { name: `Due later ${unique()}`, recertifyBy: dayFromNow(45) })
    const first = await runNotices()
    expect(first.recertification).toBeGreaterThanOrEqual(1)
    const mail = await waitForMail(MANAGER, /Re-certification (due|overdue)/)
    expect(mentioning(s.code)).toHaveLength(1)
    expect(mail.to).toContain(MANAGER)
    expect(mentioning(later.code)).toHaveLength(0)
    const m = mentioning(s.code)[0]!
    expect(m.html).toContain(`/samples/${s.id}`)
    expect(m.text).not.toMatch(/token|password/i)
    const second = await runNotices()
    expect(second.recertification).toBe(0)
    await new Promise((r) => setTimeout(r, 300))
    expect(mentioning(s.code)).toHaveLength(1)
    expect(await testDb()('notices').where({ kind: 'recertification_due', key: `${s.id}:${s.recertifyBy}` })).toHaveLength(1)
  })

  it('lists overdue samples apart from those due within 30 days', async () => {
    const late = await createSample(c.manager, { name: `Overdue ${unique()}`, recertifyBy: dayFromNow(-2) })
    const soon = await createSample(c.manager, { name: `Soon ${unique()}`, recertifyBy: dayFromNow(12) })
    await runNotices()
    await waitForMail(MANAGER, /Re-certification overdue/)
    const m = mentioning(late.code).find((x) => x.text.includes(soon.code))!
    expect(m.subject).toMatch(/overdue/)
    const overdueAt = m.text.indexOf('Overdue: the re-certify-by date has passed:')
    const soonAt = m.text.indexOf('Due within 30 days:')
    expect(overdueAt).toBeGreaterThanOrEqual(0)
    expect(soonAt).toBeGreaterThan(overdueAt)
    expect(m.text.indexOf(late.code)).toBeGreaterThan(overdueAt)
    expect(m.text.indexOf(late.code)).toBeLessThan(soonAt)
    expect(m.text.indexOf(soon.code)).toBeGreaterThan(soonAt)
  })

  it('notices again only when the re-certify-by date changes', async () => {
    const s = await createSample(c.manager, { name: `Moved date ${unique()}`, recertifyBy: dayFromNow(5) })
    await runNotices()
    await waitForMail(MANAGER, new RegExp(s.code.replace(/-/g, '\\-')))
    await c.manager.patch(`/api/samples/${s.id}`, { version: 1, recertifyBy: dayFromNow(20) })
    await runNotices()
    await new Promise((r) => setTimeout(r, 300))
    expect(mentioning(s.code)).toHaveLength(2)
  })

  it('tells the technician and the managers once about a check-out past its due date', async () => {
    const s = await createSample(c.manager, { name: `Out too long ${unique()}` })
    const out = await c.technician.post(`/api/samples/${s.id}/custody`, { action: 'check-out', version: 1, holder: { name: 'Visiting group', institution: 'Brelund University' }, run: 'Beam time 26-07', dueBack: dayFromNow(1) })
    expect(out.status).toBe(201)
    // Time passes: the check-out falls due yesterday.
    await testDb()('sample_checkouts').where({ sample_id: s.id }).update({ due_back: testDb().raw("current_date - 1") })
    const r = await runNotices()
    expect(r.overdue).toBeGreaterThanOrEqual(1)
    const mail = await waitForMail(TECHNICIAN, new RegExp(`Overdue: ${s.code}`))
    expect(mail.to).toEqual(expect.arrayContaining([TECHNICIAN, MANAGER]))
    expect(mail.text).toContain('Visiting group')
    expect(mail.text).toContain(`/scan/${s.code}`)
    await runNotices()
    await new Promise((r) => setTimeout(r, 300))
    expect(allMail().filter((m) => m.subject.startsWith(`Overdue: ${s.code}`))).toHaveLength(1)
  })

  it('tells the holder too when a check-out to a person of the lab is overdue', async () => {
    const s = await createSample(c.manager, { name: `Held too long ${unique()}` })
    const scientist = (await c.technician.get('/api/custody/people')).body.items.find((p: { role: string }) => p.role === 'scientist')
    expect((await c.technician.post(`/api/samples/${s.id}/custody`, { action: 'check-out', version: 1, holder: { userId: scientist.id }, run: 'Run 26-300', dueBack: dayFromNow(1) })).status).toBe(201)
    await testDb()('sample_checkouts').where({ sample_id: s.id }).update({ due_back: testDb().raw('current_date - 2') })
    await runNotices()
    const mail = await waitForMail('scientist@larchmere-lab.example', new RegExp(`Overdue: ${s.code}`))
    expect(mail.to).toEqual(expect.arrayContaining(['scientist@larchmere-lab.example', TECHNICIAN, MANAGER]))
  })

  it('sends a certificate notice that did not go out at issue, once', async () => {
    const s = await certifiableSample(c.manager)
    const cert = await issue(c.manager, 'sample', s.id)
    const subject = (m: { subject: string }) => m.subject.startsWith(`Certificate ${cert.number} issued`)
    await waitForMail('auditor@larchmere-lab.example', new RegExp(`Certificate ${cert.number} issued`))
    // As if the mail relay had been down at issue: no notice on record.
    await testDb()('notices').where({ kind: 'certificate_issued', key: cert.id }).delete()
    const r = await runNotices()
    expect(r.certificates).toBeGreaterThanOrEqual(1)
    await runNotices()
    await new Promise((resolve) => setTimeout(resolve, 300))
    expect(allMail().filter(subject)).toHaveLength(2)
  })

  it('is run on demand by a manager only', async () => {
    expect((await c.technician.post('/api/notices/run')).status).toBe(403)
    expect((await c.auditor.post('/api/notices/run')).status).toBe(403)
  })
})
