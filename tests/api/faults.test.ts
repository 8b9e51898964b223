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
