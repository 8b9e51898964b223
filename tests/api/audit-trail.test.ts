import { describe, it, expect, afterAll } from 'vitest'
import { execFile } from 'node:child_process'
import { promisify } from 'node:util'
import { mkdtemp, writeFile, rm } from 'node:fs/promises'
import os from 'node:os'
import path from 'node:path'
import { testDb, closeTestDb } from '../support/db'
import { everyone, signedIn, DEMO } from '../support/api'
import { createSample } from '../support/samples'
import { verifyAuditCsv } from '../../shared/audit/chain'

afterAll(closeTestDb)
const run = promisify(execFile)

describe('audit_log is append-only in the database', () => {
  it('refuses UPDATE, DELETE and TRUNCATE but takes INSERT', async () => {
    const db = testDb()
    const [row] = await db('audit_log').insert({ action: 'test.probe', entity_type: 'test' }).returning('*')
    expect(row.id).toBeDefined()
    await expect(db('audit_log').where({ id: row.id }).update({ action: 'test.rewritten' })).rejects.toThrow(/append-only/)
    await expect(db('audit_log').where({ id: row.id }).delete()).rejects.toThrow(/append-only/)
    await expect(db.raw('truncate audit_log')).rejects.toThrow(/append-only/)
    const still = await db('audit_log').where({ id: row.id }).first()
    expect(still.action).toBe('test.probe')
  })
})

describe('GET /api/audit reads as an auditor needs it', () => {
  it("tells one sample's whole story, found by its code or its name, as sentences with change lines", async () => {
    const { manager, auditor } = await everyone()
    const sample = await createSample(manager, { name: `Audit story foil ${Date.now()}` })
    const edit = await manager.patch(`/api/samples/${sample.id}`, { version: sample.version, name: `${sample.name} rolled`, massMg: 12.5 })
    expect(edit.status).toBe(200)

    const story = await auditor.get(`/api/audit?record=sample:${sample.id}`)
    expect(story.status).toBe(200)
    expect(story.body.items.map((i: { action: string }) => i.action)).toEqual(['sample.updated', 'sample.created'])
    const updated = story.body.items[0]
    expect(updated.sentence).toBe(`${DEMO.manager.name} changed sample ${sample.code} ${sample.name} rolled`)
    expect(updated.subject).toMatchObject({ type: 'sample', code: sample.code, href: `/samples/${sample.id}` })
    expect(updated.changes).toEqual(expect.arrayContaining([
      { field: 'name', label: 'name', before: sample.name, after: `${sample.name} rolled` },
      { field: 'massMg', label: 'mass (mg)', before: '—', after: '12.5' },
    ]))

    for (const term of [sample.code, sample.name.slice(0, 22)]) {
      const found = await auditor.get(`/api/audit?q=${encodeURIComponent(term)}`)
      expect(found.body.items.some((i: { entityId: string }) => i.entityId === sample.id), term).toBe(true)
    }
  })

  it('filters by any part of a name or e-mail and by kind; hides sign-ins unless asked', async () => {
    const auditor = await signedIn('auditor')
    const part = DEMO.manager.name.split(' ').at(-1)!.slice(1, 5)
    const byName = await auditor.get(`/api/audit?actor=${encodeURIComponent(part)}&pageSize=50`)
    expect(byName.body.items.length).toBeGreaterThan(0)
    expect(byName.body.items.every((i: { actorName: string }) => i.actorName.toLowerCase().includes(part.toLowerCase()))).toBe(true)

    const plain = await auditor.get('/api/audit?pageSize=200')
    expect(plain.body.items.some((i: { action: string }) => i.action.startsWith('auth.'))).toBe(false)
    const withSignIns = await auditor.get('/api/audit?pageSize=200&signIns=true')
    expect(withSignIns.body.items.some((i: { action: string }) => i.action === 'auth.sign-in')).toBe(true)

    const custody = await auditor.get('/api/audit?kind=sign-ins&pageSize=50')
    expect(custody.body.items.length).toBeGreaterThan(0)
    expect(custody.body.items.every((i: { action: string }) => i.action.startsWith('auth.'))).toBe(true)
    expect((await auditor.get('/api/audit?kind=everything')).status).toBe(400)
    expect((await auditor.get('/api/audit?record=sample')).status).toBe(400)
  })

  it('rejects a malformed date filter with the field named', async () => {
    const { auditor } = await everyone()
    const r = await auditor.get('/api/audit?from=yesterday')
    expect(r.status).toBe(400)
    expect(r.body.data.issues[0].path).toBe('from')
  })
})

describe('the audit CSV and its hash chain', () => {
  it('exports a chained file that the script and the shared check find intact, and a tampered one broken at its line', async () => {
    const manager = await signedIn('manager')
    const sample = await createSample(manager, { name: '=HYPERLINK("http://evil.example")' })
    const csv = await manager.get(`/api/audit?format=csv&record=sample:${sample.id}`)
    expect(csv.status).toBe(200)
    const text = csv.body as string
    expect(text.split('\r\n')[0]).toBe('seq,id,at,actor,action,record_type,record_id,record,changes,address,prev_hash,row_hash')
    expect(text).toContain(`name: — → =HYPERLINK(""http://evil.example"")`)
    const verdict = await verifyAuditCsv(text)
    expect(verdict).toMatchObject({ ok: true, rows: 1, lastHash: csv.headers.get('x-audit-chain-head') })
    // the export is itself audited, with the chain's head
    const db = testDb()
    const exported = await db('audit_log').where({ action: 'audit.exported' }).orderBy('id', 'desc').first()
    expect(exported.after.lastHash).toBe(csv.headers.get('x-audit-chain-head'))

    const dir = await mkdtemp(path.join(os.tmpdir(), 'audit-verify-'))
    try {
      const good = path.join(dir, 'good.csv')
      await writeFile(good, text)
      const ok = await run('npx', ['tsx', 'scripts/audit-verify.ts', good])
      expect(ok.stdout).toMatch(/complete and unaltered, 1 rows/)
      const bad = path.join(dir, 'bad.csv')
      await writeFile(bad, text.replace('sample.created', 'sample.seeded'))
      const err = await run('npx', ['tsx', 'scripts/audit-verify.ts', bad]).then(() => null, (e) => e)
      expect(err?.code).toBe(1)
      expect(err.stdout).toMatch(/NOT as exported, line 2: This row was changed/)
    } finally {
      await rm(dir, { recursive: true, force: true })
    }
  })
})
