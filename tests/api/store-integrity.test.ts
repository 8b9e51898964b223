import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { createHash } from 'node:crypto'
import { execFile } from 'node:child_process'
import { promisify } from 'node:util'
import { everyone, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { waitForMail } from '../support/mail'
import { createSample, objectStore, objectsUnder } from '../support/samples'
import { certifiableSample, issue } from '../support/certificates'

let c: Awaited<ReturnType<typeof everyone>>
let manager: Client
beforeAll(async () => {
  c = await everyone()
  manager = c.manager
})
afterAll(closeTestDb)

const MANAGER = 'manager@larchmere-lab.example'
const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex')

/** Replaces a stored object behind the app's back, as anyone holding the store's keys could. */
async function overwrite(key: string, bytes: Buffer) {
  const { client, bucket } = objectStore()
  await client.putObject(bucket, key, bytes, bytes.length)
}
async function stored(key: string): Promise<Buffer> {
  const { client, bucket } = objectStore()
  const chunks: Buffer[] = []
  for await (const chunk of await client.getObject(bucket, key)) chunks.push(chunk as Buffer)
  return Buffer.concat(chunks)
}

async function mismatchAudits(entityId: string) {
  return testDb()('audit_log').where({ action: 'storage.mismatch', entity_id: entityId }).orderBy('id')
}

describe('a certificate PDF altered in the store', () => {
  let cert: any
  let genuine: Buffer
  beforeAll(async () => {
    cert = await issue(manager, 'sample', (await certifiableSample(manager)).id)
    const row = await testDb()('certificates').where({ id: cert.id }).first()
    cert.key = row.object_key
    genuine = await stored(row.object_key)
    expect(sha(genuine)).toBe(row.pdf_sha256)
  })

  it('serves the genuine file with its recorded digest', async () => {
    const r = await c.auditor.get(`/api/certificates/${cert.id}/pdf`)
    expect(r.status).toBe(200)
    expect(Buffer.compare(r.body, genuine)).toBe(0)
    expect(r.headers.get('x-content-sha256')).toBe(sha(genuine))
  })

  it('is refused with 502, an audit row and a mail to the managers; never streamed', async () => {
    // Same length, one byte changed: a forgery the size check alone would miss.
    const forged = Buffer.from(genuine)
    forged[Math.floor(forged.length / 2)] ^= 0x01
    await overwrite(cert.key, forged)
    try {
      const r = await c.auditor.get(`/api/certificates/${cert.id}/pdf`)
      expect(r.status).toBe(502)
      expect(r.body.message).toBe('The stored file does not match its record, so it was not served. The lab managers have been told.')
      expect(r.headers.get('x-content-sha256')).toBeNull()
      const audits = await mismatchAudits(cert.id)
      expect(audits.length).toBeGreaterThanOrEqual(1)
      expect(audits.at(-1).after).toMatchObject({ objectKey: cert.key, sha256OnRecord: sha(genuine), sha256Found: sha(forged) })
      const mail = await waitForMail(MANAGER, new RegExp(`Stored file altered or missing: certificate ${cert.number}`))
      expect(mail.text).toContain(sha(forged))

      const zip = await manager.get(`/api/certificates/zip?from=${cert.issuedAt.slice(0, 10)}&to=${cert.issuedAt.slice(0, 10)}`)
      expect(zip.status).toBe(502)
      expect(zip.headers.get('content-type')).toMatch(/json/)
    } finally {
      await overwrite(cert.key, genuine)
    }
    expect((await c.auditor.get(`/api/certificates/${cert.id}/pdf`)).status).toBe(200)
  })

  it('is refused the same way when the object is gone', async () => {
    const { client, bucket } = objectStore()
    await client.removeObject(bucket, cert.key)
    try {
      const r = await c.auditor.get(`/api/certificates/${cert.id}/pdf`)
      expect(r.status).toBe(502)
      expect((await mismatchAudits(cert.id)).at(-1).after.sha256Found).toBeNull()
    } finally {
      await overwrite(cert.key, genuine)
    }
  })
})

describe('a datasheet altered in the store', () => {
  it('is downloaded through the app when genuine and refused when not', async () => {
    const s = await createSample(manager)
    const bytes = Buffer.from('isotope,enrichment\n58,99.6\n')
    const f = new FormData()
    f.append('file', new Blob([bytes]), 'isotopes.csv')
    const up = await manager.post(`/api/samples/${s.id}/datasheets`, f)
    expect(up.status).toBe(201)
    const ok = await c.technician.get(`/api/datasheets/${up.body.id}/download`)
    expect(ok.status).toBe(200)
    expect(ok.body).toBe(bytes.toString())
    expect(ok.headers.get('content-disposition')).toContain('isotopes.csv')
    const [key] = await objectsUnder(`datasheets/${s.id}/`)
    await overwrite(key!, Buffer.from('isotope,enrichment\n58,12.3\n'))
    const bad = await c.technician.get(`/api/datasheets/${up.body.id}/download`)
    expect(bad.status).toBe(502)
    expect(bad.body.message).toMatch(/does not match its record/)
    expect(await mismatchAudits(up.body.id)).toHaveLength(1)
    await waitForMail(MANAGER, /Stored file altered or missing: datasheet isotopes\.csv/)
    // A longer object is refused without reading past the recorded size.
    await overwrite(key!, Buffer.concat([bytes, Buffer.alloc(1024 * 1024, 0x41)]))
    const longer = await c.technician.get(`/api/datasheets/${up.body.id}/download`)
    expect(longer.status).toBe(502)
    expect((await mismatchAudits(up.body.id)).at(-1).after).toMatchObject({ oversized: true, sha256Found: null })
    await overwrite(key!, bytes)
  })
})

describe('the local store stand-in', () => {
  const base = () => `http://127.0.0.1:${process.env.NUXT_S3_PORT}/${process.env.NUXT_S3_BUCKET ?? 'ionfolio'}`
  it.each([
    ['list the bucket', 'GET', ''],
    ['read an object', 'GET', '/datasheets/anything'],
    ['write an object', 'PUT', '/forged-by-anyone'],
    ['delete an object', 'DELETE', '/datasheets/anything'],
  ])('refuses an unsigned request to %s', async (_what, method, suffix) => {
    const r = await fetch(base() + suffix, { method, body: method === 'PUT' ? 'x' : undefined })
    expect(r.status).toBe(403)
    expect(await r.text()).toContain('<Code>AccessDenied</Code>')
  })

  it('still serves signed requests and presigned links', async () => {
    const { client, bucket } = objectStore()
    await client.putObject(bucket, 'tests/presigned-probe', Buffer.from('probe'), 5)
    const url = await client.presignedGetObject(bucket, 'tests/presigned-probe', 60)
    expect(await (await fetch(url)).text()).toBe('probe')
    await client.removeObject(bucket, 'tests/presigned-probe')
  })
})

describe('npm run reconcile', () => {
  const run = async (...args: string[]) => {
    const r = await promisify(execFile)(process.execPath, ['--import', 'tsx', 'scripts/reconcile.ts', '--json', ...args], { env: process.env }).catch((e) => e)
    return { code: r.code ?? 0, report: JSON.parse(r.stdout) }
  }

  it('lists objects nothing points at and rows whose object is missing; --fix removes only the orphans', async () => {
    const { client, bucket } = objectStore()
    const orphan = `datasheets/orphan-${Date.now()}`
    await client.putObject(bucket, orphan, Buffer.from('left behind'), 11)
    const s = await createSample(manager)
    const f = new FormData()
    f.append('file', new Blob([Buffer.from('a note\n')]), 'note.txt')
    const up = await manager.post(`/api/samples/${s.id}/datasheets`, f)
    const [key] = await objectsUnder(`datasheets/${s.id}/`)
    const keep = await stored(key!)
    await client.removeObject(bucket, key!)
    try {
      const young = await run()
      expect(young.code).toBe(1)
      expect(young.report.orphans).not.toContain(orphan)
      expect(young.report.recent).toContain(orphan)
      expect(young.report.missing).toContainEqual({ table: 'datasheets', id: up.body.id, key })

      const fixed = await run('--fix', '--older-than', '0')
      expect(fixed.report.orphans).toContain(orphan)
      expect(fixed.report.removed).toContain(orphan)
      expect(await objectsUnder(orphan)).toEqual([])
      // Rows are never touched, and neither are objects some row points at.
      expect(await testDb()('datasheets').where({ id: up.body.id })).toHaveLength(1)
      expect(fixed.report.removed.filter((k: string) => !fixed.report.orphans.includes(k))).toEqual([])
    } finally {
      await overwrite(key!, keep)
    }
    const clean = await run()
    expect(clean.report.missing).toEqual([])
  })
})
