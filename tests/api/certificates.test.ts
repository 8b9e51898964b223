import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { createHash } from 'node:crypto'
import { everyone, unique, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { allMail, waitForMail } from '../support/mail'
import { objectsUnder } from '../support/samples'
import { pdfPages, pdfText } from '../support/pdf'
import { certifiableSample, independentDigest, issue, pdfOf } from '../support/certificates'

let c: Awaited<ReturnType<typeof everyone>>
let manager: Client
beforeAll(async () => {
  c = await everyone()
  manager = c.manager
})
afterAll(closeTestDb)

const AUDITOR = 'auditor@larchmere-lab.example'
// The contents ISO Guide 31:2015 (clause 5, from memory) asks of a certificate, as we word them.
const SAMPLE_HEADINGS = ['Description of the material', 'Intended use', 'Property values', 'Method of determination', 'Metrological traceability', 'Period of validity', 'Storage and handling', 'Hazards and cautions', 'Issued by', 'Verification']
const oneLine = (s: string) => s.replace(/\s+/g, ' ')

describe('issuing a sample certificate', () => {
  let sample: any
  let cert: any
  beforeAll(async () => {
    sample = await certifiableSample(manager, { name: `Łódź nickel-58 foil ${unique()}` })
    cert = await issue(manager, 'sample', sample.id)
  })

  it('answers the certificate with a fresh number, version 1, status issued', async () => {
    expect(cert.number).toMatch(/^C-\d{4}-\d{6}$/)
    expect(cert).toMatchObject({ version: 1, status: 'issued', subjectType: 'sample', subjectId: sample.id, issuedBy: 'Maren Okafor', validUntil: sample.recertifyBy })
    expect(cert.verifyUrl).toBe(`${process.env.IONFOLIO_TEST_BASE_URL}/verify/${cert.number}?digest=${cert.sha256}`)
  })

  it('freezes the payload whose SHA-256 is the stored digest', async () => {
    const row = await testDb()('certificates').where({ id: cert.id }).first()
    expect(row.sha256).toBe(cert.sha256)
    expect(independentDigest(row.payload)).toBe(row.sha256)
    const detail = await c.auditor.get(`/api/certificates/${cert.id}`)
    expect(detail.status).toBe(200)
    expect(independentDigest(detail.body.payload)).toBe(cert.sha256)
  })

  it('prints the same digest in the PDF, with the headings and the values', async () => {
    const pdf = await pdfOf(c.auditor, cert.id)
    expect(createHash('sha256').update(pdf).digest('hex')).toBe(cert.pdfSha256)
    const text = oneLine(await pdfText(pdf))
    const printed = [...text.matchAll(/SHA-256 ([0-9a-f]{64})/g)].map((m) => m[1])
    expect(printed.length).toBeGreaterThanOrEqual(1)
    expect(new Set(printed)).toEqual(new Set([cert.sha256]))
    for (const h of SAMPLE_HEADINGS) expect(text).toContain(h)
    expect(text).toContain('Larchmere Ion Beam Laboratory')
    expect(text).toContain(`${cert.number} version 1`)
    expect(text).toContain(sample.code)
    expect(text).toContain(sample.name)
    expect(text).toContain('500 ± 15')
    expect(text).toContain('µg/cm²')
    expect(text).toContain('99.610 ± 0.050 %')
    expect(text).toContain('H317 May cause an allergic skin reaction')
    expect(text).toMatch(/institution's safety officers direct/)
    expect(text).toContain('Maren Okafor, Lab manager')
    const pages = (await pdfPages(pdf)).pages
    expect(text).toContain(`Page 1 of ${pages}`)
    expect(text).toContain(`Page ${pages} of ${pages}`)
  })

  it('stores the PDF in the object store under the key the row names', async () => {
    const row = await testDb()('certificates').where({ id: cert.id }).first()
    expect(await objectsUnder(row.object_key)).toEqual([row.object_key])
  })

  it('mails every active auditor once, with a link to the page and no secret in it', async () => {
    const mail = await waitForMail(AUDITOR, new RegExp(`Certificate ${cert.number} issued`))
    expect(mail.text).toContain(`/certificates/${cert.id}`)
    expect(mail.html).toContain(`/certificates/${cert.id}`)
    expect(mail.text).toContain(cert.sha256)
    expect(mail.text).not.toMatch(/token|password|session/i)
    await new Promise((r) => setTimeout(r, 300))
    expect(allMail().filter((m) => m.subject.includes(cert.number))).toHaveLength(1)
  })

  it('refuses a second certificate for a subject that has a current one', async () => {
    const r = await manager.post('/api/certificates', { subjectType: 'sample', subjectId: sample.id })
    expect(r.status).toBe(409)
    expect(r.body.data.current).toMatchObject({ id: cert.id, number: cert.number })
  })

  it('never changes once issued: the database refuses edits and deletion', async () => {
    const db = testDb()
    await expect(db('certificates').where({ id: cert.id }).update({ payload: JSON.stringify({ forged: true }) })).rejects.toThrow(/never changes/)
    await expect(db('certificates').where({ id: cert.id }).update({ sha256: '0'.repeat(64) })).rejects.toThrow(/never changes/)
    await expect(db('certificates').where({ id: cert.id }).delete()).rejects.toThrow(/never deleted/)
    expect((await db('certificates').where({ id: cert.id }).first()).sha256).toBe(cert.sha256)
  })
})

describe('correcting and revoking', () => {
  it('supersedes: a new version for the same subject, the old one marked, in one go', async () => {
    const sample = await certifiableSample(manager, { name: `Correction foil ${unique()}` })
    const v1 = await issue(manager, 'sample', sample.id)
    const fixed = await manager.patch(`/api/samples/${sample.id}`, { version: sample.version, arealDensity: 512, arealDensityUncertainty: 10 })
    expect(fixed.status).toBe(200)
    const r = await manager.post(`/api/certificates/${v1.id}/supersede`, { reason: 'Areal density re-weighed' })
    expect(r.status, JSON.stringify(r.body)).toBe(201)
    const v2 = r.body
    expect(v2).toMatchObject({ version: 2, status: 'issued', subjectId: sample.id, supersedes: { id: v1.id, number: v1.number }, correctionReason: 'Areal density re-weighed' })
    expect(v2.number).not.toBe(v1.number)
    const old = (await c.auditor.get(`/api/certificates/${v1.id}`)).body
    expect(old).toMatchObject({ status: 'superseded', supersededBy: { id: v2.id, number: v2.number } })
    const text = oneLine(await pdfText(await pdfOf(c.auditor, v2.id)))
    expect(text).toContain(`replaces certificate ${v1.number} version 1`)
    expect(text).toContain('Areal density re-weighed')
    expect(text).toContain('512 ± 10')
    const audit = await testDb()('audit_log').whereIn('entity_id', [v1.id, v2.id]).orderBy('id').select('action', 'entity_id')
    expect(audit).toEqual([
      { action: 'certificate.issued', entity_id: v1.id },
      { action: 'certificate.superseded', entity_id: v1.id },
      { action: 'certificate.issued', entity_id: v2.id },
    ])
    const again = await manager.post(`/api/certificates/${v1.id}/supersede`, { reason: 'Once more' })
    expect(again.status).toBe(409)
  })

  it('revokes with who and why; a revoked certificate cannot be revoked or superseded again', async () => {
    const sample = await certifiableSample(manager, { name: `Revoked foil ${unique()}` })
    const cert = await issue(manager, 'sample', sample.id)
    const r = await manager.post(`/api/certificates/${cert.id}/revoke`, { reason: 'Foil found torn at inspection' })
    expect(r.status).toBe(200)
    expect(r.body).toMatchObject({ status: 'revoked', revokedBy: 'Maren Okafor', revokeReason: 'Foil found torn at inspection' })
    expect(r.body.revokedAt).toBeTruthy()
    expect((await manager.post(`/api/certificates/${cert.id}/revoke`, { reason: 'twice' })).status).toBe(409)
    expect((await manager.post(`/api/certificates/${cert.id}/supersede`, { reason: 'too late' })).status).toBe(409)
    await waitForMail(AUDITOR, new RegExp(`Certificate ${cert.number} revoked`))
    // After a revocation the subject may be certified afresh, as the next version.
    const next = await issue(manager, 'sample', sample.id)
    expect(next.version).toBe(2)
    expect(next.supersedes).toBeNull()
  })

  it('wants a reason for both', async () => {
    const r = await manager.post(`/api/certificates/${crypto.randomUUID()}/revoke`, { reason: '' })
    expect(r.status).toBe(400)
    expect(r.body.data.issues[0].path).toBe('reason')
  })
})

describe('what cannot be certified', () => {
  it('refuses a retired sample, and stores nothing', async () => {
    const sample = await certifiableSample(manager)
    expect((await manager.delete(`/api/samples/${sample.id}?version=1`)).status).toBe(200)
    const before = (await objectsUnder('certificates/')).length
    const r = await manager.post('/api/certificates', { subjectType: 'sample', subjectId: sample.id })
    expect(r.status).toBe(409)
    expect(r.body.message).toBe('A retired sample cannot be certified')
    expect((await objectsUnder('certificates/')).length).toBe(before)
    expect(await testDb()('certificates').where({ subject_id: sample.id })).toEqual([])
  })

  it('refuses a sample without a re-certify-by date ahead', async () => {
    const none = await certifiableSample(manager, { recertifyBy: null })
    expect((await manager.post('/api/certificates', { subjectType: 'sample', subjectId: none.id })).body.message).toMatch(/re-certify-by date first/)
    const past = await certifiableSample(manager, { receivedOn: '2020-01-01', recertifyBy: '2021-01-01' })
    expect((await manager.post('/api/certificates', { subjectType: 'sample', subjectId: past.id })).body.message).toMatch(/has passed/)
  })

  it('answers 404 for a subject that does not exist', async () => {
    expect((await manager.post('/api/certificates', { subjectType: 'sample', subjectId: crypto.randomUUID() })).status).toBe(404)
    expect((await manager.post('/api/certificates', { subjectType: 'species', subjectId: crypto.randomUUID() })).status).toBe(404)
  })
})

describe('a species certificate', () => {
  it('certifies the newest result with each method, its citation, the engine and the reference', async () => {
    const recorded = await c.scientist.post('/api/species', { species: 'Fe13+' })
    expect([200, 201]).toContain(recorded.status)
    const cert = await issue(manager, 'species', recorded.body.id)
    const payload = (await c.auditor.get(`/api/certificates/${cert.id}`)).body.payload
    expect(payload.subject.resultId).toBe(recorded.body.result.id)
    const text = oneLine(await pdfText(await pdfOf(c.auditor, cert.id)))
    for (const h of ['Computed data are estimates', 'Method of computation', 'Property values', 'Metrological traceability', 'Period of validity']) expect(text).toContain(h)
    expect(text).toContain('Fe13+')
    expect(text).toContain('1s2 2s2 2p6 3s2 3p1')
    expect(text).toContain(`engine ${recorded.body.result.engine}`)
    for (const m of payload.method.methods) {
      expect(text).toContain(m.name)
      expect(text).toContain(m.citation.slice(0, 30))
    }
    // The reference value printed is the one frozen in the record (NIST ASD, as the engine carries it).
    const ref = recorded.body.result.record.ionisationEnergy.reference
    expect(text).toContain(ref.eV.toFixed(1))
    expect(text).toContain('NIST ASD')
    expect(independentDigest(payload)).toBe(cert.sha256)
  })
})

describe('finding certificates', () => {
  it('lists with search, filters, sort and paging', async () => {
    const sample = await certifiableSample(manager, { name: `Listed foil ${unique()}` })
    const cert = await issue(manager, 'sample', sample.id)
    const byNumber = await c.auditor.get(`/api/certificates?q=${cert.number}`)
    expect(byNumber.body.items.map((i: any) => i.id)).toEqual([cert.id])
    const byCode = await c.technician.get(`/api/certificates?q=${sample.code}`)
    expect(byCode.body.items.map((i: any) => i.id)).toEqual([cert.id])
    const today = new Date().toISOString().slice(0, 10)
    const period = await c.auditor.get(`/api/certificates?from=${today}&to=${today}&subjectType=sample&status=issued&pageSize=200`)
    expect(period.body.items.map((i: any) => i.id)).toContain(cert.id)
    expect(period.body.items.every((i: any) => i.status === 'issued' && i.subjectType === 'sample')).toBe(true)
    const before = await c.auditor.get('/api/certificates?to=2020-01-01')
    expect(before.body.total).toBe(0)
    const sorted = await c.auditor.get('/api/certificates?sort=number&pageSize=200')
    const numbers = sorted.body.items.map((i: any) => i.number)
    expect(numbers).toEqual([...numbers].sort())
    const paged = await c.auditor.get('/api/certificates?pageSize=1&page=2')
    expect(paged.body).toMatchObject({ page: 2, pageSize: 1 })
    expect(paged.body.total).toBeGreaterThan(1)
    expect((await c.auditor.get('/api/certificates?sort=bogus')).status).toBe(400)
  })

  it('shows the newest certificates on the overview', async () => {
    const sample = await certifiableSample(manager)
    const cert = await issue(manager, 'sample', sample.id)
    const overview = (await c.scientist.get('/api/overview')).body
    expect(overview.certificates[0]).toMatchObject({ id: cert.id, number: cert.number, status: 'issued', subjectLabel: `${sample.code} ${sample.name}` })
    expect(overview.certificates.length).toBeLessThanOrEqual(5)
  })
})

describe('the object store and the rows agree', () => {
  it('holds exactly one object per certificate row, and no object that no row names', async () => {
    const rows = await testDb()('certificates').select('object_key')
    expect((await objectsUnder('certificates/')).sort()).toEqual(rows.map((r) => r.object_key).sort())
  })
})
