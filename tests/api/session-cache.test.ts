import { describe, it, expect, afterAll } from 'vitest'
import { Client, signedIn, unique } from '../support/api'
import { testDb, closeTestDb } from '../support/db'
import { waitForMail } from '../support/mail'

afterAll(closeTestDb)

async function freshPerson(role: string): Promise<{ client: Client; id: string }> {
  const manager = await signedIn('manager')
  const email = `cache-${unique()}@larchmere-lab.example`
  await manager.post('/api/users', { email, name: 'Cache Probe', role })
  const token = /\/invite\/([A-Za-z0-9_-]{20,})/.exec((await waitForMail(email)).text)![1]!
  const client = new Client()
  const accepted = await client.post('/api/auth/accept-invitation', { token, password: 'a long enough passphrase' })
  return { client, id: accepted.body.id }
}

describe('the session cache follows announcements from any instance', () => {
  it('forgets a person whose sessions another instance ended (NOTIFY)', async () => {
    const { client, id } = await freshPerson('scientist')
    expect((await client.get('/api/auth/me')).status).toBe(200)
    expect((await client.get('/api/auth/me')).status).toBe(200)
    // What another app instance does when it deactivates someone: delete the sessions and
    // announce it in the same transaction.
    await testDb().transaction(async (trx) => {
      await trx('sessions').where({ user_id: id }).delete()
      await trx.raw('select pg_notify(?, ?)', ['ionfolio_session_events', `u:${id}`])
    })
    let status = 200
    for (let i = 0; i < 20 && status === 200; i++) {
      status = (await client.get('/api/auth/me')).status
      if (status === 200) await new Promise((r) => setTimeout(r, 50))
    }
    expect(status).toBe(401)
  })

  it('applies a role change at once, so the old role\'s rights end with it', async () => {
    const { client, id } = await freshPerson('manager')
    expect((await client.get('/api/users')).status).toBe(200)
    const manager = await signedIn('manager')
    expect((await manager.patch(`/api/users/${id}`, { role: 'technician' })).status).toBe(200)
    expect((await client.get('/api/users')).status).toBe(403)
    expect((await client.get('/api/auth/me')).body.role).toBe('technician')
  })

  it('ends a signed-out session everywhere', async () => {
    const c = await signedIn('auditor')
    const cookie = c.cookie
    expect((await c.get('/api/auth/me')).status).toBe(200)
    await c.post('/api/auth/sign-out')
    const replay = new Client()
    replay.cookie = cookie
    expect((await replay.get('/api/auth/me')).status).toBe(401)
  })
})
