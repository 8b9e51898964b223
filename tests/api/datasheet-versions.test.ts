import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { createHash } from 'node:crypto'
import { everyone, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { createSample, objectsUnder } from '../support/samples'
import { issue } from '../support/certificates'

// Datasheets are replaced by new versions (the old kept and listed) and withdrawn (hidden, kept,
// audited), never deleted, and never withdrawn while a certificate in force lists them.
let c: Awaited<ReturnType<typeof everyone>>
let manager: Client
beforeAll(async () => {
  c = await everyone()
  manager = c.manager
})
afterAll(closeTestDb)

const pdf = (text: string) => Buffer.from(`%PDF-1.4\n% ${text}\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n`, 'latin1')
function form(bytes: Uint8Array, name: string): FormData {
  const f = new FormData()
  f.append('file', new Blob([Uint8Array.from(bytes)], { type: 'application/pdf' }), name)
  return f
}
const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10)
const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex')

describe('datasheet versions', () => {
  it('replaces a datasheet with a new version; the old one is kept, listed and downloadable', async () => {
    const s = await createSample(manager)
    const v1 = (await manager.post(`/api/samples/${s.id}/datasheets`, form(pdf('first'), 'Analysis.pdf'))).body
    expect(v1.version).toBe(1)
    const r = await manager.post(`/api/datasheets/${v1.id}/replace`, form(pdf('second'), 'Analysis rev B.pdf'))
    expect(r.status, JSON.stringify(r.body)).toBe(201)
    expect(r.body).toMatchObject({ version: 2, replacesId: v1.id, replacedAt: null, fileName: 'Analysis rev B.pdf', sha256: sha(pdf('second')) })
    const listed = (await c.technician.get(`/api/samples/${s.id}`)).body.datasheets
    expect(listed.map((d: any) => [d.id, d.version, !!d.replacedAt])).toEqual([[r.body.id, 2, false], [v1.id, 1, true]])
    const old = await c.auditor.get(`/api/datasheets/${v1.id}/download`)
    expect(old.status).toBe(200)
    expect(sha(Buffer.from(old.body as Buffer))).toBe(sha(pdf('first')))
    expect(await objectsUnder(`datasheets/${s.id}/`)).toHaveLength(2)
    const audit = await testDb()('audit_log').where({ entity_id: s.id, action: 'sample.datasheet-replaced' })
    expect(audit).toHaveLength(1)
    expect(audit[0]!.before.datasheet.id).toBe(v1.id)
    expect(audit[0]!.after.datasheet.id).toBe(r.body.id)
    // Only the newest version can be replaced: a second replacement of v1 is refused.
    const again = await manager.post(`/api/datasheets/${v1.id}/replace`, form(pdf('third'), 'Other.pdf'))
    expect(again.status).toBe(409)
    expect(again.body.message).toMatch(/already replaced/)
    expect(await objectsUnder(`datasheets/${s.id}/`)).toHaveLength(2)
  })

  it('withdraws a datasheet: hidden from the sample and new certificates, kept with its file, audited with the reason', async () => {
    const s = await createSample(manager, { recertifyBy: inDays(300) })
    const kept = (await manager.post(`/api/samples/${s.id}/datasheets`, form(pdf('keep'), 'Keep.pdf'))).body
    const gone = (await manager.post(`/api/samples/${s.id}/datasheets`, form(pdf('wrong sample'), 'Wrong.pdf'))).body
    const r = await manager.post(`/api/datasheets/${gone.id}/withdraw`, { reason: 'Belongs to another lot' })
    expect(r.status, JSON.stringify(r.body)).toBe(200)
    expect((await manager.get(`/api/samples/${s.id}`)).body.datasheets.map((d: any) => d.id)).toEqual([kept.id])
    const row = await testDb()('datasheets').where({ id: gone.id }).first()
    expect(row).toMatchObject({ withdrawn_reason: 'Belongs to another lot' })
    expect(row.withdrawn_at).not.toBeNull()
    expect(await objectsUnder(`datasheets/${s.id}/`)).toHaveLength(2)
    const [audit] = await testDb()('audit_log').where({ entity_id: s.id, action: 'sample.datasheet-withdrawn' })
    expect(audit!.after.reason).toBe('Belongs to another lot')
    const cert = await issue(manager, 'sample', s.id)
    const records = JSON.stringify(cert.payload ?? (await manager.get(`/api/certificates/${cert.id}`)).body.payload)
    expect(records).toContain(kept.sha256)
    expect(records).not.toContain(gone.sha256)
    expect((await manager.post(`/api/datasheets/${gone.id}/withdraw`, { reason: 'Twice' })).status).toBe(409)
  })

  it('refuses to withdraw a datasheet a certificate in force lists, until that certificate is revoked', async () => {
    const s = await createSample(manager, { recertifyBy: inDays(300) })
    const sheet = (await manager.post(`/api/samples/${s.id}/datasheets`, form(pdf('certified'), 'Certified.pdf'))).body
    const cert = await issue(manager, 'sample', s.id)
    const refused = await manager.post(`/api/datasheets/${sheet.id}/withdraw`, { reason: 'Trying anyway' })
    expect(refused.status).toBe(409)
    expect(refused.body.data).toEqual({ reason: 'listed-on-certificate', certificates: [cert.number] })
    expect((await testDb()('datasheets').where({ id: sheet.id }).first()).withdrawn_at).toBeNull()
    expect((await manager.post(`/api/certificates/${cert.id}/revoke`, { reason: 'Datasheet was for another lot' })).status).toBe(200)
    expect((await manager.post(`/api/datasheets/${sheet.id}/withdraw`, { reason: 'Datasheet was for another lot' })).status).toBe(200)
  })

  it('refuses a new version for a retired sample, as it refuses a first upload, and stores nothing', async () => {
    const s = await createSample(manager)
    const sheet = (await manager.post(`/api/samples/${s.id}/datasheets`, form(pdf('kept'), 'Kept.pdf'))).body
    const { version } = (await manager.get(`/api/samples/${s.id}`)).body
    expect((await manager.delete(`/api/samples/${s.id}?version=${version}`)).status).toBe(200)
    const r = await manager.post(`/api/datasheets/${sheet.id}/replace`, form(pdf('late'), 'Late.pdf'))
    expect(r.status).toBe(409)
    expect(r.body.message).toMatch(/retired/)
    expect(await testDb()('datasheets').where({ sample_id: s.id }).count('* as n').first()).toMatchObject({ n: '1' })
    expect((await objectsUnder(`datasheets/${s.id}/`)).length).toBe(1)
  })

  it('checks the reason, the datasheet and the role', async () => {
    const s = await createSample(manager)
    const sheet = (await manager.post(`/api/samples/${s.id}/datasheets`, form(pdf('x'), 'X.pdf'))).body
    const noReason = await manager.post(`/api/datasheets/${sheet.id}/withdraw`, { reason: '' })
    expect(noReason.status).toBe(400)
    expect(noReason.body.data.issues[0].path).toBe('reason')
    expect((await manager.post(`/api/datasheets/${crypto.randomUUID()}/withdraw`, { reason: 'No such sheet' })).status).toBe(404)
    expect((await c.technician.post(`/api/datasheets/${sheet.id}/withdraw`, { reason: 'Not mine to do' })).status).toBe(403)
    expect((await c.scientist.post(`/api/datasheets/${sheet.id}/replace`, form(pdf('y'), 'Y.pdf'))).status).toBe(403)
  })
})
