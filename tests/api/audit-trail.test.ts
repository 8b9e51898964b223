import { describe, it, expect, afterAll } from 'vitest'
import { testDb, closeTestDb } from '../support/db'
import { everyone } from '../support/api'

afterAll(closeTestDb)

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

describe('GET /api/audit', () => {
  it('filters by action and exports CSV with a header row', async () => {
    const { manager } = await everyone()
    const list = await manager.get('/api/audit?action=auth.sign-in&pageSize=5')
    expect(list.status).toBe(200)
    expect(list.body.items.length).toBeGreaterThan(0)
    expect(list.body.items.every((i: { action: string }) => i.action === 'auth.sign-in')).toBe(true)
    const csv = await manager.get('/api/audit?action=auth.sign-in&format=csv')
    expect(csv.status).toBe(200)
    expect(csv.headers.get('content-type')).toMatch(/text\/csv/)
    const lines = (csv.body as string).trim().split('\n')
    expect(lines[0]).toBe('id,at,actor,action,entity_type,entity_id,before,after,address')
    expect(lines.length).toBe(list.body.total + 1)
  })

  it('rejects a malformed date filter with the field named', async () => {
    const { auditor } = await everyone()
    const r = await auditor.get('/api/audit?from=yesterday')
    expect(r.status).toBe(400)
    expect(r.body.data.issues[0].path).toBe('from')
  })
})
