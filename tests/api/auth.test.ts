import { describe, it, expect, afterAll } from 'vitest'
import { Client, DEMO, signedIn, unique } from '../support/api'
import { testDb, closeTestDb } from '../support/db'

afterAll(closeTestDb)

describe('sign-in', () => {
  it.each(Object.values(DEMO).map((p) => [p.role, p] as const))('signs in the demo %s and answers who they are', async (role, person) => {
    const c = new Client()
    const r = await c.signIn(person.email, person.password)
    expect(r.status).toBe(200)
    expect(r.body).toMatchObject({ email: person.email, role })
    expect(r.body).not.toHaveProperty('password_hash')
    const me = await c.get('/api/auth/me')
    expect(me.status).toBe(200)
    expect(me.body.role).toBe(role)
  })

  it('sets an HttpOnly, SameSite=Lax session cookie', async () => {
    const res = await new Client().signIn(DEMO.scientist.email, DEMO.scientist.password)
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith('ionfolio_session='))!
    expect(cookie).toMatch(/HttpOnly/i)
    expect(cookie).toMatch(/SameSite=Lax/i)
    // Served over plain http locally, so not Secure; over https it is (cookieSecure from the base URL).
    expect(cookie).not.toMatch(/;\s*Secure/i)
  })

  it('accepts the e-mail in any case and with spaces around it', async () => {
    const r = await new Client().signIn(`  ${DEMO.auditor.email.toUpperCase()} `, DEMO.auditor.password)
    expect(r.status).toBe(200)
  })

  it('gives the same answer for a wrong password and for an unknown e-mail', async () => {
    const wrong = await new Client().signIn(DEMO.manager.email, 'not the password at all')
    const unknown = await new Client().signIn(`nobody-${unique()}@larchmere-lab.example`, 'whatever-password')
    expect(wrong.status).toBe(401)
    expect(unknown.status).toBe(401)
    expect(wrong.body.message).toBe(unknown.body.message)
    expect(wrong.headers.getSetCookie().some((c) => /ionfolio_session=[^;]+/.test(c) && !/ionfolio_session=;/.test(c))).toBe(false)
  })

  it('answers 401 to /me when signed out, and after sign-out', async () => {
    expect((await new Client().get('/api/auth/me')).status).toBe(401)
    const c = await signedIn('technician')
    const out = await c.post('/api/auth/sign-out')
    expect(out.status).toBe(204)
    expect((await c.get('/api/auth/me')).status).toBe(401)
  })

  it('records each sign-in in the audit trail', async () => {
    const c = new Client()
    const before = new Date()
    await c.signIn(DEMO.scientist.email, DEMO.scientist.password)
    const rows = await testDb()('audit_log').where({ action: 'auth.sign-in', actor_email: DEMO.scientist.email }).where('at', '>=', new Date(before.getTime() - 1000))
    expect(rows.length).toBeGreaterThanOrEqual(1)
    expect(rows.at(-1).address).toBe(c.address)
  })
})

describe('bad input', () => {
  it('answers a malformed JSON body with a clear 400', async () => {
    const r = await new Client().request('POST', '/api/auth/sign-in', '{"email": ', { 'content-type': 'application/json' })
    expect(r.status).toBe(400)
    expect(r.body.message).toMatch(/not valid JSON/)
    expect(JSON.stringify(r.body)).not.toMatch(/at .*\.mjs/)
  })

  it('lists the problems of an invalid body in data.issues', async () => {
    const r = await new Client().post('/api/auth/sign-in', { email: 'not-an-email', password: '' })
    expect(r.status).toBe(400)
    const paths = r.body.data.issues.map((i: { path: string }) => i.path)
    expect(paths).toEqual(expect.arrayContaining(['email', 'password']))
  })

  it('refuses a state-changing request without our Origin', async () => {
    const c = new Client()
    const r = await c.post('/api/auth/sign-in', { email: DEMO.manager.email, password: DEMO.manager.password }, { origin: 'https://elsewhere.example' })
    expect(r.status).toBe(403)
  })

  it('answers an unknown API route with JSON 404 and a wrong method with 405', async () => {
    const c = await signedIn('manager')
    const missing = await c.get('/api/no-such-thing')
    expect(missing.status).toBe(404)
    expect(missing.headers.get('content-type')).toMatch(/json/)
    const wrong = await c.delete('/api/users')
    expect(wrong.status).toBe(405)
    expect(wrong.headers.get('allow')).toBe('GET, POST')
  })
})

describe('failed sign-in limits (5 in 15 minutes)', () => {
  it('blocks an account after 5 failures, even from new addresses and with the right password', async () => {
    const email = DEMO.auditor.email
    try {
      for (let i = 0; i < 5; i++) expect((await new Client().signIn(email, `wrong-${i}-password`)).status).toBe(401)
      const blocked = await new Client().signIn(email, DEMO.auditor.password)
      expect(blocked.status).toBe(429)
      expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(0)
      expect(Number(blocked.headers.get('retry-after'))).toBeLessThanOrEqual(15 * 60)
    } finally {
      // Leave the demo auditor usable for the other tests: lift the lock (the failure rows stay).
      await testDb()('sign_in_throttle').where({ key: `account:${email}` }).update({ attempts: 0, locked_until: null })
    }
  })

  it('blocks an address after 5 failures across different accounts', async () => {
    const c = new Client()
    for (let i = 0; i < 5; i++) expect((await c.signIn(`someone-${unique()}@larchmere-lab.example`, 'wrong-password')).status).toBe(401)
    const blocked = await c.signIn(DEMO.scientist.email, DEMO.scientist.password)
    expect(blocked.status).toBe(429)
    const elsewhere = await new Client().signIn(DEMO.scientist.email, DEMO.scientist.password)
    expect(elsewhere.status).toBe(200)
  })
})
