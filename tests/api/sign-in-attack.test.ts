import { describe, it, expect, afterAll } from 'vitest'
import { Client, signedIn, unique } from '../support/api'
import { waitForMail, allMail } from '../support/mail'
import { testDb, closeTestDb } from '../support/db'

afterAll(closeTestDb)

const tokenIn = (text: string, kind: 'invite' | 'reset-password') => {
  const m = text.match(new RegExp(`/${kind}/([A-Za-z0-9_-]{20,})`))
  if (!m) throw new Error(`no ${kind} link in the mail`)
  return m[1]!
}

/** A fresh person with a password, through the invitation flow as a manager would make them. */
async function newPerson(password = 'a long first passphrase') {
  const manager = await signedIn('manager')
  const email = `p-${unique()}@larchmere-lab.example`
  expect((await manager.post('/api/users', { email, name: 'Odile Brack', role: 'technician' })).status).toBe(201)
  const token = tokenIn((await waitForMail(email, /invitation/i)).text, 'invite')
  const person = new Client()
  const accepted = await person.post('/api/auth/accept-invitation', { token, password })
  expect(accepted.status).toBe(200)
  return { email, id: accepted.body.id as string, password, client: person, manager }
}

const auditCount = async (action: string, email: string) => Number((await testDb()('audit_log').where({ action }).whereRaw(`after->>'email' = ?`, [email]).count({ n: '*' }).first())!.n)

describe('sign-in under attack', () => {
  it('admits no more than 5 of 30 parallel wrong passwords for one account, and audits every one', async () => {
    const { email } = await newPerson()
    const replies = await Promise.all(Array.from({ length: 30 }, (_, i) => new Client().signIn(email, `wrong guess number ${i}`)))
    const statuses = replies.map((r) => r.status)
    expect(statuses.filter((s) => s === 401)).toHaveLength(5)
    expect(statuses.filter((s) => s === 429)).toHaveLength(25)
    expect(await auditCount('auth.sign-in-failed', email)).toBe(5)
    expect(await auditCount('auth.locked-out', email)).toBe(1)
    expect(await auditCount('auth.sign-in-refused', email)).toBe(25)
    expect(Number((await testDb()('sign_in_failures').where({ email }).count({ n: '*' }).first())!.n)).toBe(5)
  })

  it('lets the person in once the lock ends, keeps the failure rows, and locks longer the next time', async () => {
    const { email, password } = await newPerson()
    for (let i = 0; i < 5; i++) expect((await new Client().signIn(email, `wrong-${i}-password`)).status).toBe(401)
    const first = await new Client().signIn(email, password)
    expect(first.status).toBe(429)
    const firstWait = Number(first.headers.get('retry-after'))
    expect(firstWait).toBeGreaterThan(0)
    expect(firstWait).toBeLessThanOrEqual(60)
    // the lock's end, without waiting a minute
    await testDb()('sign_in_throttle').where({ key: `account:${email}` }).update({ locked_until: testDb().raw(`now() - interval '1 second'`) })
    expect((await new Client().signIn(email, password)).status).toBe(200)
    expect(Number((await testDb()('sign_in_failures').where({ email }).count({ n: '*' }).first())!.n)).toBe(5)

    for (let i = 0; i < 5; i++) expect((await new Client().signIn(email, `wrong-again-${i}`)).status).toBe(401)
    const second = await new Client().signIn(email, password)
    expect(second.status).toBe(429)
    expect(Number(second.headers.get('retry-after'))).toBeGreaterThan(60)
    expect(Number(second.headers.get('retry-after'))).toBeLessThanOrEqual(120)
  })
})

describe('changing and resetting a password', () => {
  it('changes a password with the current one and ends the other sessions only', async () => {
    const { email, password, client } = await newPerson()
    const other = new Client()
    expect((await other.signIn(email, password)).status).toBe(200)
    const wrong = await client.post('/api/auth/password', { currentPassword: 'not the password', newPassword: 'a brand new passphrase' })
    expect(wrong.status).toBe(400)
    expect(wrong.body.data.issues[0].path).toBe('currentPassword')
    const ok = await client.post('/api/auth/password', { currentPassword: password, newPassword: 'a brand new passphrase' })
    expect(ok.status).toBe(200)
    expect(ok.body.otherSessionsEnded).toBe(1)
    expect((await client.get('/api/auth/me')).status).toBe(200)
    expect((await other.get('/api/auth/me')).status).toBe(401)
    expect((await new Client().signIn(email, password)).status).toBe(401)
    expect((await new Client().signIn(email, 'a brand new passphrase')).status).toBe(200)
    expect((await new Client().post('/api/auth/password', { currentPassword: 'x', newPassword: 'y'.repeat(12) })).status).toBe(401)
  })

  it('answers a reset request the same for a known and an unknown address, and the link works once for an hour', async () => {
    const { email, client, id } = await newPerson()
    const unknown = await new Client().post('/api/auth/password-reset', { email: `nobody-${unique()}@larchmere-lab.example` })
    const known = await new Client().post('/api/auth/password-reset', { email })
    expect(known.status).toBe(202)
    expect(unknown.status).toBe(known.status)
    expect(unknown.body).toEqual(known.body)

    const token = tokenIn((await waitForMail(email, /password/i)).text, 'reset-password')
    const row = await testDb()('password_resets').where({ user_id: id }).orderBy('created_at', 'desc').first()
    expect(new Date(row.expires_at).getTime() - new Date(row.created_at).getTime()).toBeCloseTo(3600_000, -4)
    const set = await new Client().post('/api/auth/password-reset/complete', { token, password: 'reset passphrase here' })
    expect(set.status).toBe(200)
    expect((await client.get('/api/auth/me')).status).toBe(401) // every session ended
    expect((await new Client().post('/api/auth/password-reset/complete', { token, password: 'another passphrase' })).status).toBe(404)
    expect((await new Client().signIn(email, 'reset passphrase here')).status).toBe(200)

    // an expired link
    await testDb()('password_resets').where({ user_id: id }).update({ created_at: testDb().raw(`now() - interval '2 hours'`) })
    expect((await new Client().post('/api/auth/password-reset', { email })).status).toBe(202)
    const late = tokenIn((await waitForMail(email, /password/i)).text, 'reset-password')
    expect(late).not.toBe(token)
    await testDb()('password_resets').where({ user_id: id }).whereNull('used_at').update({ expires_at: testDb().raw(`now() - interval '1 second'`) })
    expect((await new Client().post('/api/auth/password-reset/complete', { token: late, password: 'too late passphrase' })).status).toBe(410)
  })

  it('lets a manager re-invite a deactivated person: setting the password brings the account back', async () => {
    const { email, id, manager } = await newPerson()
    expect((await manager.patch(`/api/users/${id}`, { active: false })).status).toBe(200)
    const before = allMail().length
    const sent = await manager.post(`/api/users/${id}/reset-password`)
    expect(sent.status).toBe(200)
    expect(sent.body.reactivates).toBe(true)
    const mail = await waitForMail(email, /password/i)
    expect(allMail().length).toBeGreaterThan(before)
    const token = tokenIn(mail.text, 'reset-password')
    expect((await new Client().post('/api/auth/password-reset/complete', { token, password: 'welcome back passphrase' })).status).toBe(200)
    expect((await new Client().signIn(email, 'welcome back passphrase')).status).toBe(200)
    const audit = await testDb()('audit_log').where({ entity_id: id }).whereIn('action', ['user.reset-sent', 'auth.password-reset']).pluck('action')
    expect(audit.sort()).toEqual(['auth.password-reset', 'user.reset-sent'])
  })

  it('says a person is already invited and sends again only when asked', async () => {
    const manager = await signedIn('manager')
    const email = `twice-${unique()}@larchmere-lab.example`
    const body = { email, name: 'Wim Harrow', role: 'scientist' }
    expect((await manager.post('/api/users', body)).status).toBe(201)
    const firstToken = tokenIn((await waitForMail(email, /invitation/i)).text, 'invite')
    const again = await manager.post('/api/users', body)
    expect(again.status).toBe(409)
    expect(again.body.message).toBe('This person is already invited')
    expect(again.body.data.reason).toBe('invited')
    expect(allMail().filter((m) => m.to.includes(email))).toHaveLength(1)
    const resent = await manager.post('/api/users', { ...body, resend: true })
    expect(resent.status).toBe(201)
    await expect.poll(() => allMail().filter((m) => m.to.includes(email)).length).toBe(2)
    expect((await new Client().get(`/api/auth/invitation?token=${firstToken}`)).status).toBe(404)
  })
})
