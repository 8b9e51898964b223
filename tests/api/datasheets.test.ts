import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { createHash } from 'node:crypto'
import { mkdirSync, rmSync, writeFileSync } from 'node:fs'
import path from 'node:path'
import { everyone, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { createSample, objectsUnder } from '../support/samples'

let c: Awaited<ReturnType<typeof everyone>>
let manager: Client
beforeAll(async () => {
  c = await everyone()
  manager = c.manager
})
afterAll(closeTestDb)

const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n', 'latin1')
const PNG = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52])

function form(bytes: Uint8Array, name: string, type = 'application/octet-stream'): FormData {
  const f = new FormData()
  f.append('file', new Blob([Uint8Array.from(bytes)], { type }), name)
  return f
}

/** Nothing of an upload remains for this sample: no row, no object. */
async function nothingLeft(sampleId: string) {
  expect(await testDb()('datasheets').where({ sample_id: sampleId })).toEqual([])
  expect(await objectsUnder(`datasheets/${sampleId}/`)).toEqual([])
}

describe('datasheet upload', () => {
  it('stores an allowed file, records its SHA-256, and serves it through the app, checked against that digest', async () => {
    const s = await createSample(manager)
    const r = await manager.post(`/api/samples/${s.id}/datasheets`, form(PDF, 'Certificat d’analyse.pdf', 'application/pdf'))
    expect(r.status, JSON.stringify(r.body)).toBe(201)
    expect(r.body).toMatchObject({ sampleId: s.id, fileName: 'Certificat d’analyse.pdf', contentType: 'application/pdf', size: PDF.length, uploadedBy: 'Maren Okafor' })
    expect(r.body.sha256).toBe(createHash('sha256').update(PDF).digest('hex'))
    const row = await testDb()('datasheets').where({ id: r.body.id }).first()
    expect(await objectsUnder(`datasheets/${s.id}/`)).toEqual([row.object_key])
    const audit = await testDb()('audit_log').where({ entity_id: s.id, action: 'sample.datasheet-added' })
    expect(audit).toHaveLength(1)
    expect((await manager.get(`/api/samples/${s.id}`)).body.datasheets.map((d: { id: string }) => d.id)).toEqual([r.body.id])

    for (const who of ['technician', 'auditor'] as const) {
      const file = await c[who].get(`/api/datasheets/${r.body.id}/download`)
      expect(file.status).toBe(200)
      expect(file.body).toEqual(PDF)
      expect(file.headers.get('content-type')).toBe('application/pdf')
      expect(file.headers.get('x-content-sha256')).toBe(r.body.sha256)
      expect(file.headers.get('content-disposition')).toContain("filename*=UTF-8''Certificat%20d%E2%80%99analyse.pdf")
    }
  })

  it.each([
    ['a CSV', Buffer.from('isotope,enrichment\n58,99.6\n'), 'isotopes.csv', 'text/csv'],
    ['plain text with a byte-order mark', Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from('Handling note: ±0.2 µg/cm²\r\n')]), 'note.txt', 'text/plain'],
    ['a PNG', PNG, 'scan.PNG', 'image/png'],
    ['a JPEG', Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16, 0x4a, 0x46, 0x49, 0x46]), 'photo.jpeg', 'image/jpeg'],
  ])('accepts %s', async (_what, bytes, name, type) => {
    const s = await createSample(manager)
    const r = await manager.post(`/api/samples/${s.id}/datasheets`, form(bytes, name))
    expect(r.status, JSON.stringify(r.body)).toBe(201)
    expect(r.body.contentType).toBe(type)
  })

  it('refuses a file over 25 MB and keeps nothing', async () => {
    const s = await createSample(manager)
    const big = Buffer.alloc(25 * 1024 * 1024 + 4096, 0x20)
    PDF.copy(big)
    const r = await manager.post(`/api/samples/${s.id}/datasheets`, form(big, 'huge.pdf'))
    expect(r.status).toBe(413)
    expect(r.body.message).toMatch(/25 MB/)
    await nothingLeft(s.id)
  })

  it.each([
    ['a PDF named .png', PDF, 'scan.png', 415, /not PNG/],
    ['a PNG named .pdf', PNG, 'certificate.pdf', 415, /not PDF/],
    ['binary bytes named .txt', Buffer.from([0x41, 0x00, 0x42, 0x07]), 'note.txt', 415, /not plain text/],
    ['invalid UTF-8 named .csv', Buffer.from([0x61, 0x2c, 0xc3, 0x28, 0x0a]), 'table.csv', 415, /not CSV/],
    ['a type not on the list', Buffer.from('MZ...'), 'tool.exe', 415, /not accepted/],
    ['an empty file', Buffer.alloc(0), 'empty.pdf', 400, /empty/],
  ])('refuses %s and keeps nothing', async (_what, bytes, name, status, message) => {
    const s = await createSample(manager)
    const r = await manager.post(`/api/samples/${s.id}/datasheets`, form(bytes, name, 'application/pdf'))
    expect(r.status).toBe(status)
    expect(r.body.message).toMatch(message)
    await nothingLeft(s.id)
  })

  it('refuses an upload from a role that may not add datasheets', async () => {
    const s = await createSample(manager)
    const r = await c.scientist.post(`/api/samples/${s.id}/datasheets`, form(PDF, 'x.pdf'))
    expect(r.status).toBe(403)
    await nothingLeft(s.id)
  })
})

describe('when a store fails', () => {
  // The object store really fails: the stand-in keeps each object as a file under
  // <storage>/objects/<bucket>/<key>, and a plain file put where this sample's folder must go makes
  // its write fail (the store answers 500), exactly as a full or broken disk would. Nothing in the
  // app knows about it. The file is removed afterwards.
  it('writes no row when the object store refuses the file', async () => {
    const s = await createSample(manager)
    const folder = path.join(process.env.IONFOLIO_TEST_TMP!, 'objects', process.env.NUXT_S3_BUCKET ?? 'ionfolio', 'datasheets')
    mkdirSync(folder, { recursive: true })
    const blocker = path.join(folder, s.id)
    writeFileSync(blocker, 'not a folder')
    try {
      const r = await manager.post(`/api/samples/${s.id}/datasheets`, form(PDF, 'coa.pdf'))
      expect(r.status).toBe(502)
      expect(r.body.message).toMatch(/nothing was saved/)
      expect(await testDb()('datasheets').where({ sample_id: s.id })).toEqual([])
    } finally {
      rmSync(blocker, { force: true })
    }
    await nothingLeft(s.id)
    const again = await manager.post(`/api/samples/${s.id}/datasheets`, form(PDF, 'coa.pdf'))
    expect(again.status).toBe(201)
  })

  // The database really refuses the row: a trigger, installed for this test only, rejects an
  // insert with this file name. The stored object must then be removed again.
  it('removes the stored object when the database refuses the row', async () => {
    const s = await createSample(manager)
    const db = testDb()
    await db.raw(`
      create or replace function test_refuse_datasheet() returns trigger language plpgsql as $$
      begin
        if new.original_name = 'refused-by-database.pdf' then raise exception 'refused for the test'; end if;
        return new;
      end $$;
      create trigger test_refuse_datasheet before insert on datasheets for each row execute function test_refuse_datasheet();
    `)
    try {
      const r = await manager.post(`/api/samples/${s.id}/datasheets`, form(PDF, 'refused-by-database.pdf'))
      expect(r.status).toBe(500)
    } finally {
      await db.raw('drop trigger if exists test_refuse_datasheet on datasheets; drop function if exists test_refuse_datasheet()')
    }
    await nothingLeft(s.id)
  })
})
