import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { createHash } from 'node:crypto'
import { parse } from 'csv-parse/sync'
import { Client, everyone } from '../support/api'
import { closeTestDb } from '../support/db'
import { readZip } from '../support/zip'
import { certifiableSample, issue } from '../support/certificates'

let c: Awaited<ReturnType<typeof everyone>>
beforeAll(async () => {
  c = await everyone()
})
afterAll(closeTestDb)

/** Asks the public route as a stranger: no session, an address of its own. */
async function verify(number: string, digest?: string) {
  const r = await new Client().get(`/api/public/verify/${encodeURIComponent(number)}${digest === undefined ? '' : `?digest=${encodeURIComponent(digest)}`}`)
  expect(r.status).toBe(200)
  // Without the matching digest the answer is one word; with it, what the certificate itself says.
  expect(Object.keys(r.body)).toEqual(r.body.status === 'unknown' ? ['status'] : ['status', 'certified', 'pdfSha256'])
  return r.body.status as string
}

const tamper = (digest: string) => (digest[0] === 'a' ? 'b' : 'a') + digest.slice(1)

describe('the public verification route', () => {
  let current: any
  let superseded: any
  let revoked: any
  beforeAll(async () => {
    const a = await certifiableSample(c.manager)
    superseded = await issue(c.manager, 'sample', a.id)
    current = (await c.manager.post(`/api/certificates/${superseded.id}/supersede`, { reason: 'Lot number corrected' })).body
    const b = await certifiableSample(c.manager)
    revoked = await issue(c.manager, 'sample', b.id)
    expect((await c.manager.post(`/api/certificates/${revoked.id}/revoke`, { reason: 'Issued for the wrong sample' })).status).toBe(200)
  })

  it('answers genuine, superseded and revoked for the right number and digest', async () => {
    expect(await verify(current.number, current.sha256)).toBe('genuine')
    expect(await verify(superseded.number, superseded.sha256)).toBe('superseded')
    expect(await verify(revoked.number, revoked.sha256)).toBe('revoked')
  })

  it('after a match, shows the certified values from the frozen payload and the issued PDF\'s SHA-256', async () => {
    const r = await new Client().get(`/api/public/verify/${encodeURIComponent(current.number)}?digest=${current.sha256}`)
    const pdf = (await c.auditor.get(`/api/certificates/${current.id}/pdf`)).body as Buffer
    expect(r.body.pdfSha256).toBe(createHash('sha256').update(pdf).digest('hex'))
    const certified = r.body.certified
    expect(certified).toMatchObject({ number: current.number, version: 2, title: 'Certificate of a target sample' })
    expect(certified.subject).toMatch(new RegExp(`^${current.subjectLabel.split(' ')[0]} · `))
    const values = Object.fromEntries(certified.values.map((v: { label: string; value: string }) => [v.label, v.value]))
    // certifiableSample: 500 ± 15 µg/cm², ⁵⁸Ni at 99.61 ± 0.05 % enrichment, 2.5 mg (tests/support/certificates.ts).
    expect(values['Areal density']).toBe('500 ± 15 µg/cm²')
    expect(values['Mass']).toBe('2.5 mg')
    expect(Object.entries(values).find(([k]) => k.includes('fraction'))![1]).toContain('enrichment 99.61 ± 0.05 %')
    expect(certified.validUntil).not.toBe('—')
  })

  it('never answers genuine for a digest that does not match', async () => {
    expect(await verify(current.number, tamper(current.sha256))).toBe('unknown')
    expect(await verify(current.number, superseded.sha256)).toBe('unknown')
    expect(await verify(revoked.number, tamper(revoked.sha256))).toBe('unknown')
    expect(await verify(current.number, '')).toBe('unknown')
    expect(await verify(current.number)).toBe('unknown')
    expect(await verify(current.number, current.sha256.toUpperCase())).toBe('genuine')
  })

  it('answers unknown for a number never issued, and for anything that is not a number', async () => {
    expect(await verify('C-1999-999999', current.sha256)).toBe('unknown')
    expect(await verify('not-a-certificate', current.sha256)).toBe('unknown')
    expect(await verify('C-2026-0000001'.repeat(5), 'x'.repeat(500))).toBe('unknown')
  })

  it('needs no sign-in, and is not cached', async () => {
    const r = await new Client().get(`/api/public/verify/${current.number}?digest=${current.sha256}`)
    expect(r.headers.get('cache-control')).toBe('no-store')
    expect(r.headers.get('set-cookie')).toBeNull()
  })

  it('limits one address to 30 checks a minute', async () => {
    const stranger = new Client()
    const statuses: number[] = []
    for (let i = 0; i < 31; i++) statuses.push((await stranger.get(`/api/public/verify/C-1999-000001?digest=${'0'.repeat(64)}`)).status)
    expect(statuses.slice(0, 30).every((s) => s === 200)).toBe(true)
    const last = await stranger.get('/api/public/verify/C-1999-000001')
    expect(last.status).toBe(429)
    expect(Number(last.headers.get('retry-after'))).toBeGreaterThan(0)
    expect((await new Client().get('/api/public/verify/C-1999-000001')).status).toBe(200)
  })
})

describe('the zip of a period', () => {
  it('streams every PDF issued in the period with a manifest of their digests', async () => {
    const s = await certifiableSample(c.manager)
    const cert = await issue(c.manager, 'sample', s.id)
    const today = new Date().toISOString().slice(0, 10)
    const r = await c.auditor.get(`/api/certificates/zip?from=${today}&to=${today}`)
    expect(r.status).toBe(200)
    expect(r.headers.get('content-type')).toBe('application/zip')
    expect(r.headers.get('content-disposition')).toContain(`ionfolio-certificates-${today}_to_${today}.zip`)
    const files = readZip(r.body as Buffer)
    const listed = (await c.auditor.get(`/api/certificates?from=${today}&to=${today}&pageSize=200`)).body.items
    expect([...files.keys()].filter((n) => n.endsWith('.pdf')).sort()).toEqual(listed.map((i: any) => `${i.number}-v${i.version}.pdf`).sort())
    const mine = files.get(`${cert.number}-v1.pdf`)!
    expect(createHash('sha256').update(mine).digest('hex')).toBe(cert.pdfSha256)
    const manifest = parse(files.get('manifest.csv')!.toString('utf8'), { columns: true }) as Record<string, string>[]
    expect(manifest.find((m) => m.number === cert.number)).toMatchObject({ version: '1', status: 'issued', content_sha256: cert.sha256, pdf_sha256: cert.pdfSha256 })
    expect(manifest).toHaveLength(listed.length)
  })

  it('holds only the manifest for a period without certificates', async () => {
    const r = await c.auditor.get('/api/certificates/zip?from=2001-01-01&to=2001-12-31')
    expect([...readZip(r.body as Buffer).keys()]).toEqual(['manifest.csv'])
  })

  it('refuses a period that ends before it starts', async () => {
    const r = await c.auditor.get('/api/certificates/zip?from=2026-02-01&to=2026-01-01')
    expect(r.status).toBe(400)
  })
})
