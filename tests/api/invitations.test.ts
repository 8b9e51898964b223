import { describe, it, expect, afterAll } from 'vitest'
import { Client, signedIn, unique } from '../support/api'
import { waitForMail } from '../support/mail'
import { testDb, closeTestDb } from '../support/db'

afterAll(closeTestDb)

function linkToken(text: string): string {
  const m = text.match(/\/invite\/([A-Za-z0-9_-]{20,})/)
  if (!m) throw new Error('no invitation link in the mail')
  return m[1]!
}

describe('inviting a person, end to end through the SMTP fake', () => {
  it('invites, mails a one-time link, sets the password, changes the role and deactivates', async () => {
    const manager = await signedIn('manager')
    const email = `new-${unique()}@larchmere-lab.example`

    const invited = await manager.post('/api/users', { email, name: 'Ada Quennell', role: 'scientist' })
    expect(invited.status).toBe(201)

    const mail = await waitForMail(email, /invitation/i)
    expect(mail.subject).toMatch(/Ionfolio/)
    expect(mail.html).toContain('/invite/')
    const token = linkToken(mail.text)
    // Only the hash of the token is stored.
    const row = await testDb()('invitations').where({ email }).first()
    expect(row.token_hash).not.toContain(token)
    expect(row.token_hash).toMatch(/^[0-9a-f]{64}$/)
    expect(new Date(row.expires_at).getTime() - new Date(row.created_at).getTime()).toBeCloseTo(72 * 3600_000, -5)

    const guest = new Client()
    const preview = await guest.get(`/api/auth/invitation?token=${token}`)
    expect(preview.status).toBe(200)
    expect(preview.body).toMatchObject({ email, name: 'Ada Quennell', role: 'scientist' })

    const short = await guest.post('/api/auth/accept-invitation', { token, password: 'too-short' })
    expect(short.status).toBe(400)
    expect(short.body.data.issues[0].message).toMatch(/12 characters/)

    const accepted = await guest.post('/api/auth/accept-invitation', { token, password: 'a long enough passphrase' })
    expect(accepted.status).toBe(200)
    const me = await guest.get('/api/auth/me')
    expect(me.body).toMatchObject({ email, role: 'scientist' })

    const again = await new Client().post('/api/auth/accept-invitation', { token, password: 'another long passphrase' })
    expect(again.status).toBe(404)

    const userId = me.body.id as string
    const promoted = await manager.patch(`/api/users/${userId}`, { role: 'technician' })
    expect(promoted.status).toBe(200)
    expect((await guest.get('/api/auth/me')).body.role).toBe('technician')

    const off = await manager.patch(`/api/users/${userId}`, { active: false })
    expect(off.status).toBe(200)
    expect((await guest.get('/api/auth/me')).status).toBe(401)
    expect((await new Client().signIn(email, 'a long enough passphrase')).status).toBe(401)

    const actions = (await testDb()('audit_log').where({ entity_id: userId }).orWhere({ entity_id: row.id }).orderBy('id')).map((r) => r.action)
    expect(actions).toEqual(expect.arrayContaining(['user.invited', 'user.joined', 'user.role-changed', 'user.deactivated']))
  })

  it('refuses an expired invitation with 410', async () => {
    const manager = await signedIn('manager')
    const email = `late-${unique()}@larchmere-lab.example`
    await manager.post('/api/users', { email, name: 'Late Comer', role: 'auditor' })
    const token = linkToken((await waitForMail(email)).text)
    // invitations is an ordinary table: ageing a row here stands in for 72 hours passing.
    await testDb()('invitations').where({ email }).update({ expires_at: new Date(Date.now() - 1000) })
    const r = await new Client().post('/api/auth/accept-invitation', { token, password: 'a long enough passphrase' })
    expect(r.status).toBe(410)
  })

  it('refuses to invite an e-mail that already has an account, and keeps a manager from locking themselves out', async () => {
    const manager = await signedIn('manager')
    const dup = await manager.post('/api/users', { email: 'scientist@larchmere-lab.example', name: 'Twin', role: 'scientist' })
    expect(dup.status).toBe(409)
    const me = (await manager.get('/api/auth/me')).body
    const self = await manager.patch(`/api/users/${me.id}`, { active: false })
    expect(self.status).toBe(400)
  })
})
