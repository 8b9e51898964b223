import { describe, it, expect } from 'vitest'
import path from 'node:path'
import { signedIn } from '../support/api'
import { startPostgres } from '../../scripts/lib/postgres.mjs'

describe('with the database down', () => {
  it('answers 503, and serves again with nothing lost when it comes back', async () => {
    const data = process.env.IONFOLIO_TEST_PG_DATA!
    const pg = startPostgres({ dir: path.dirname(data), port: Number(process.env.IONFOLIO_TEST_PG_PORT) })
    const manager = await signedIn('manager')
    const before = await manager.get('/api/users?pageSize=100')
    expect(before.status).toBe(200)

    pg.stop()
    try {
      const health = await manager.get('/api/health')
      expect(health.status).toBe(503)
      expect(health.body.database.ok).toBe(false)
      const users = await manager.get('/api/users')
      expect(users.status).toBe(503)
      expect(users.body.message).toMatch(/database/i)
      expect(Number(users.headers.get('retry-after'))).toBeGreaterThan(0)
    } finally {
      pg.start()
    }

    let after = await manager.get('/api/users?pageSize=100')
    for (let i = 0; i < 20 && after.status !== 200; i++) {
      await new Promise((r) => setTimeout(r, 250))
      after = await manager.get('/api/users?pageSize=100')
    }
    expect(after.status).toBe(200)
    expect(after.body.total).toBe(before.body.total)
  })
})

describe('with the database stopped in the middle of an import', () => {
  it('answers 503 with Retry-After, and not one row of the file is in the stock afterwards', async () => {
    const data = process.env.IONFOLIO_TEST_PG_DATA!
    const pg = startPostgres({ dir: path.dirname(data), port: Number(process.env.IONFOLIO_TEST_PG_PORT) })
    const manager = await signedIn('manager')
    const tag = `midimport${Date.now()}`
    const rows = Array.from({ length: 3000 }, (_, i) => `${tag} foil ${i},Nickel metal,foil,Ni 1`)
    const csv = ['name,material,form,composition', ...rows].join('\n')
    expect((await manager.post('/api/samples/import?dryRun=true', csv, { 'content-type': 'text/csv' })).body.valid).toBe(true)
    const importing = manager.post('/api/samples/import', csv, { 'content-type': 'text/csv' })
    // stop the database once the import is writing (its rows are not visible before it commits)
    await new Promise((r) => setTimeout(r, 1500))
    pg.stop()
    let reply
    try {
      reply = await importing
    } finally {
      pg.start()
    }
    expect(reply.status, JSON.stringify(reply.body)).toBe(503)
    expect(Number(reply.headers.get('retry-after'))).toBeGreaterThan(0)
    let count = -1
    for (let i = 0; i < 40 && count < 0; i++) {
      const r = await manager.get(`/api/samples?q=${tag}`)
      if (r.status === 200) count = r.body.total
      else await new Promise((res) => setTimeout(res, 250))
    }
    expect(count).toBe(0)
  })
})

