import { describe, it, expect, afterAll } from 'vitest'
import { createHash } from 'node:crypto'
import { Client, DEMO, signedIn, unique } from '../support/api'
import { testDb, closeTestDb } from '../support/db'
import { waitForMail } from '../support/mail'
import { bearer, createToken } from '../support/tokens'

afterAll(closeTestDb)

async function freshPerson(role: string): Promise<{ client: Client; id: string }> {
  const manager = await signedIn('manager')
  const email = `token-${unique()}@larchmere-lab.example`
  await manager.post('/api/users', { email, name: 'Token Probe', role })
  const invite = /\/invite\/([A-Za-z0-9_-]{20,})/.exec((await waitForMail(email)).text)![1]!
  const client = new Client()
  const accepted = await client.post('/api/auth/accept-invitation', { token: invite, password: 'a long enough passphrase' })
  return { client, id: accepted.body.id }
}

describe('personal API tokens', () => {
  it('shows the secret once, stores only its SHA-256, and lists the token with its last use', async () => {
    const scientist = await signedIn('scientist')
    const { id, secret } = await createToken(scientist, 'read', `notebook ${unique()}`)
    expect(secret).toMatch(/^ionf_[A-Za-z0-9_-]{43}$/)
    const row = await testDb()('api_tokens').where({ id }).first()
    expect(row.secret_hash).toBe(createHash('sha256').update(secret).digest('hex'))
    expect(JSON.stringify(row)).not.toContain(secret)

    const me = await bearer(secret, 'GET', '/api/auth/me', undefined, '198.51.100.7')
    expect(me.status).toBe(200)
    expect(me.body.role).toBe('scientist')
    const listed = (await scientist.get('/api/tokens')).body.items.find((t: any) => t.id === id)
    expect(listed.secret).toBeUndefined()
    expect(listed.lastUsedAddress).toBe('198.51.100.7')
    expect(listed.lastUsedAt).not.toBeNull()

    const audit = await testDb()('audit_log').where({ entity_type: 'api_token', entity_id: id }).orderBy('id').select('action', 'after')
    expect(audit.map((a) => a.action)).toEqual(['token.created', 'token.used-from-new-address'])
    // The same address again is not news; a second address is.
    await bearer(secret, 'GET', '/api/auth/me', undefined, '198.51.100.7')
    await bearer(secret, 'GET', '/api/auth/me', undefined, '198.51.100.8')
    const again = await testDb()('audit_log').where({ entity_type: 'api_token', entity_id: id, action: 'token.used-from-new-address' }).select('after')
    expect(again.map((a) => a.after.address).sort()).toEqual(['198.51.100.7', '198.51.100.8'])
  })

  it('narrows the role by scope: a read token cannot write, a read-write token writes without an Origin header', async () => {
    const manager = await signedIn('manager')
    const read = await createToken(manager, 'read')
    const write = await createToken(manager, 'read-write')
    expect((await bearer(read.secret, 'GET', '/api/samples')).status).toBe(200)
    const refused = await bearer(read.secret, 'POST', '/api/locations', { kind: 'room', name: `Bay ${unique()}` })
    expect(refused.status).toBe(403)
    expect(refused.body.message).toMatch(/only read/)
    const code = `TK-${unique()}`.slice(0, 20).toUpperCase()
    const made = await bearer(write.secret, 'POST', '/api/locations', { kind: 'room', code, name: 'Token bay' })
    expect(made.status).toBe(201)
    const audited = await testDb()('audit_log').where({ action: 'location.created', entity_id: made.body.id }).first()
    expect(audited.actor_email).toBe(DEMO.manager.email)
    // A scientist's read-write token is still a scientist: no more than the role.
    const scientist = await signedIn('scientist')
    const sw = await createToken(scientist, 'read-write')
    expect((await bearer(sw.secret, 'POST', '/api/locations', { kind: 'room', name: 'x' })).status).toBe(403)
  })

  it('still asks cookie requests for their Origin', async () => {
    const manager = await signedIn('manager')
    const r = await manager.request('POST', '/api/locations', { kind: 'room', name: 'x' }, { origin: 'https://elsewhere.example' })
    expect(r.status).toBe(403)
  })

  it('refuses tokens in the query string with a 400 that says where they go', async () => {
    const manager = await signedIn('manager')
    const { secret } = await createToken(manager, 'read')
    for (const q of [`token=${secret}`, `access_token=${secret}`]) {
      const r = await new Client().get(`/api/samples?${q}`)
      expect(r.status).toBe(400)
      expect(r.body.message).toMatch(/Authorization header/)
    }
  })

  it('refuses a malformed, unknown, expired or revoked token with 401, and a token cannot mint tokens', async () => {
    expect((await bearer('ionf_nothing', 'GET', '/api/auth/me')).status).toBe(401)
    const anon = new Client()
    expect((await anon.request('GET', '/api/auth/me', undefined, { authorization: 'Basic abc' })).status).toBe(401)
    const tech = await signedIn('technician')
    const t = await createToken(tech, 'read-write')
    expect((await bearer(t.secret, 'POST', '/api/tokens', { name: 'child', scope: 'read', expiresOn: '2099-01-01' })).status).toBe(403)
    expect((await bearer(t.secret, 'GET', '/api/auth/me')).status).toBe(200)
    expect((await tech.delete(`/api/tokens/${t.id}`)).status).toBe(200)
    expect((await bearer(t.secret, 'GET', '/api/auth/me')).status).toBe(401)
    const actions = await testDb()('audit_log').where({ entity_type: 'api_token', entity_id: t.id }).pluck('action')
    expect(actions).toContain('token.revoked')

    const old = await createToken(tech, 'read')
    await testDb()('api_tokens').where({ id: old.id }).update({ expires_on: '2020-01-01' })
    // The cache may hold it (30 s); a revocation announcement is what ends a token early, an
    // expiry is checked against the cached date on every request.
    await testDb().raw(`select pg_notify('ionfolio_session_events', ?)`, [`t:${old.id}`])
    await new Promise((r) => setTimeout(r, 200))
    expect((await bearer(old.secret, 'GET', '/api/auth/me')).status).toBe(401)
  })

  it('validates the body: scope, a future expiry at most a year away', async () => {
    const c = await signedIn('auditor')
    const tooLate = new Date(Date.now() + 400 * 86_400_000).toISOString().slice(0, 10)
    for (const body of [{ name: 'x', scope: 'admin', expiresOn: '2099-01-01' }, { name: 'x', scope: 'read', expiresOn: tooLate }, { name: 'x', scope: 'read', expiresOn: '2001-01-01' }, { name: '', scope: 'read', expiresOn: '2099-01-01' }]) {
      const r = await c.post('/api/tokens', body)
      expect(r.status).toBe(400)
      expect(r.body.data.issues.length).toBeGreaterThan(0)
    }
  })

  it('stops a deactivated person\'s token at once', async () => {
    const { client, id } = await freshPerson('technician')
    const t = await createToken(client, 'read')
    expect((await bearer(t.secret, 'GET', '/api/samples')).status).toBe(200)
    expect((await bearer(t.secret, 'GET', '/api/samples')).status).toBe(200)
    const manager = await signedIn('manager')
    expect((await manager.patch(`/api/users/${id}`, { active: false })).status).toBe(200)
    expect((await bearer(t.secret, 'GET', '/api/samples')).status).toBe(401)
  })

  it('lets a manager see and revoke every token; others see only their own and get 404 for the rest', async () => {
    const auditor = await signedIn('auditor')
    const t = await createToken(auditor, 'read', `stocktake ${unique()}`)
    const scientist = await signedIn('scientist')
    expect((await scientist.get('/api/tokens')).body.items.some((x: any) => x.id === t.id)).toBe(false)
    expect((await scientist.delete(`/api/tokens/${t.id}`)).status).toBe(404)
    const manager = await signedIn('manager')
    const seen = (await manager.get('/api/tokens')).body.items.find((x: any) => x.id === t.id)
    expect(seen.owner.email).toBe(DEMO.auditor.email)
    expect((await manager.delete(`/api/tokens/${t.id}`)).status).toBe(200)
    expect((await bearer(t.secret, 'GET', '/api/auth/me')).status).toBe(401)
  })

  it('limits the rate per token', async () => {
    const c = await signedIn('auditor')
    const t = await createToken(c, 'read')
    // NUXT_TOKEN_RATE_LIMIT is set low for the test server (scripts/test.mjs).
    const limit = Number(process.env.IONFOLIO_TEST_TOKEN_RATE_LIMIT)
    expect(limit).toBeGreaterThan(0)
    let last = 0
    for (let i = 0; i <= limit; i++) last = (await bearer(t.secret, 'GET', '/api/auth/me')).status
    expect(last).toBe(429)
    // Another token of the same person has its own allowance.
    const other = await createToken(c, 'read')
    expect((await bearer(other.secret, 'GET', '/api/auth/me')).status).toBe(200)
  })
})
