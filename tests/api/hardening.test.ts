import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import http from 'node:http'
import { readdirSync, readlinkSync } from 'node:fs'
import { parse } from 'csv-parse/sync'
import { stringify } from 'csv-stringify/sync'
import { Client, signedIn, unique } from '../support/api'
import { testBaseUrl } from '../support/env'
import { testDb, closeTestDb } from '../support/db'
import { createSample } from '../support/samples'

let manager: Client
beforeAll(async () => {
  manager = await signedIn('manager')
})
afterAll(closeTestDb)

/** Open files of any process on this machine whose path names an upload's temporary file. */
function openUploadFiles(): string[] {
  const found: string[] = []
  for (const pid of readdirSync('/proc').filter((d) => /^\d+$/.test(d))) {
    let fds: string[] = []
    try {
      fds = readdirSync(`/proc/${pid}/fd`)
    } catch {
      continue
    }
    for (const fd of fds) {
      try {
        const target = readlinkSync(`/proc/${pid}/fd/${fd}`)
        if (target.includes('ionfolio-upload-')) found.push(target)
      } catch {
        // the descriptor closed meanwhile
      }
    }
  }
  return found
}

function tmpUploads(): string[] {
  return readdirSync(process.env.TMPDIR ?? '/tmp').filter((f) => f.startsWith('ionfolio-upload-'))
}

describe('body size limits answer 413 before reading the rest', () => {
  it('refuses an oversized body by its declared length on an anonymous route and a signed-in one', async () => {
    const big = JSON.stringify({ email: 'a@b.example', password: 'x'.repeat(40_000) })
    const anon = await new Client().post('/api/auth/sign-in', big, { 'content-type': 'application/json' })
    expect(anon.status).toBe(413)
    const huge = JSON.stringify({ name: 'x'.repeat(1_200_000) })
    const signed = await manager.post('/api/samples', huge, { 'content-type': 'application/json' })
    expect(signed.status).toBe(413)
  })
})

describe('NUL characters and year 0000 are a 400 naming the field', () => {
  it.each([
    ['a body text', { name: 'Nickel\u0000foil' }, 'name'],
    ['a body date', { receivedOn: '0000-03-01' }, 'receivedOn'],
    ['a nested value', { components: [{ z: 28, massNumber: null, fraction: 1, basis: 'atom\u0000' }] }, 'components.0.basis'],
  ])('in %s', async (_what, over, path) => {
    const r = await manager.post('/api/samples', { name: 'x', material: 'Ni', form: 'foil', components: [{ z: 28, massNumber: null, fraction: 1, basis: 'atom' }], ...over })
    expect(r.status).toBe(400)
    expect(r.body.data.issues[0].path).toBe(path)
  })

  it('in query strings', async () => {
    const q = await manager.get('/api/samples?q=ab%00cd')
    expect(q.status).toBe(400)
    expect(q.body.data.issues[0].path).toBe('q')
    const d = await manager.get('/api/audit?from=0000-01-01')
    expect(d.status).toBe(400)
    expect(d.body.data.issues[0].path).toBe('from')
  })

  it('in CSV cells, in the dry run and the real import alike', async () => {
    const csv = 'name,material,form,received_on\nGood foil,Ni,foil,2026-01-02\nBad foil,Ni,foil,0000-01-02\nNul foil,N\u0000i,foil,\n'
    const dry = await manager.post('/api/samples/import?dryRun=true', csv, { 'content-type': 'text/csv' })
    expect(dry.status).toBe(200)
    expect(dry.body.errors).toEqual([
      { line: 3, column: 'received_on', message: expect.stringMatching(/year 0000/) },
      { line: 4, column: 'material', message: expect.stringMatching(/NUL/) },
    ])
    const real = await manager.post('/api/samples/import', csv, { 'content-type': 'text/csv' })
    expect(real.status).toBe(400)
  })

  it('refuses numbers whose derived quantities would overflow', async () => {
    const r = await manager.post('/api/samples', { name: 'Thick', material: 'Ni', form: 'foil', thickness: 1e300, bulkDensity: 8.9, components: [{ z: 28, massNumber: null, fraction: 1, basis: 'atom' }] })
    expect(r.status).toBe(400)
    expect(r.body.data.issues[0].path).toBe('thickness')
  })
})

describe('uploads', () => {
  it('answers a multipart request without a boundary with 400', async () => {
    const s = await createSample(manager)
    const r = await manager.post(`/api/samples/${s.id}/datasheets`, 'hello', { 'content-type': 'multipart/form-data' })
    expect(r.status).toBe(400)
    expect(r.body.message).toMatch(/boundary/)
  })

  it('refuses an upload to a retired sample', async () => {
    const s = await createSample(manager)
    expect((await manager.delete(`/api/samples/${s.id}?version=1`)).status).toBe(200)
    const f = new FormData()
    f.append('file', new Blob(['a,b\n1,2\n'], { type: 'text/csv' }), 'x.csv')
    const r = await manager.post(`/api/samples/${s.id}/datasheets`, f)
    expect(r.status).toBe(409)
    expect(await testDb()('datasheets').where({ sample_id: s.id })).toEqual([])
  })

  it('leaves no temporary file, no open handle and no pending request when the client aborts', async () => {
    const s = await createSample(manager)
    const before = tmpUploads()
    const url = new URL(`${testBaseUrl()}/api/samples/${s.id}/datasheets`)
    const boundary = '----ionfolio-abort-test'
    const head = `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.csv"\r\nContent-Type: text/csv\r\n\r\n`
    await new Promise<void>((resolve) => {
      const req = http.request({ host: url.hostname, port: url.port, path: url.pathname, method: 'POST', headers: { cookie: manager.cookie, origin: testBaseUrl(), 'x-forwarded-for': manager.address, 'content-type': `multipart/form-data; boundary=${boundary}`, 'content-length': String(10_000_000) } })
      req.on('error', () => resolve())
      req.write(head)
      for (let i = 0; i < 50; i++) req.write(`${'a,b,c\n'.repeat(1000)}`)
      setTimeout(() => {
        req.destroy()
        resolve()
      }, 500)
    })
    // the server notices the socket closed; give it a moment
    await expect.poll(() => openUploadFiles(), { timeout: 5000 }).toEqual([])
    await expect.poll(() => tmpUploads().filter((f) => !before.includes(f)), { timeout: 5000 }).toEqual([])
    expect(await testDb()('datasheets').where({ sample_id: s.id })).toEqual([])
    // and the server still answers
    expect((await manager.get(`/api/samples/${s.id}`)).status).toBe(200)
  })
})

describe('safer output', () => {
  it('neutralises formula cells in the CSV export, and the import reads them back unchanged', async () => {
    const tag = unique()
    const tricky = { name: `=HYPERLINK("http://x.example","${tag}")`, supplier: '+1', lot: '-', backing: '@carbon', notes: '-2+3 notes' }
    await createSample(manager, { ...tricky, material: `Nickel ${tag}` })
    const csv = (await manager.get(`/api/samples?q=${tag}&format=csv`)).body as string
    const rows = parse(csv, { columns: true }) as Record<string, string>[]
    expect(rows).toHaveLength(1)
    expect(rows[0]!.name.startsWith("'=")).toBe(true)
    expect(rows[0]!.backing).toBe("'@carbon")
    expect(rows[0]!.notes).toBe("'-2+3 notes")
    expect(rows[0]!.supplier).toBe('+1')
    expect(rows[0]!.lot).toBe('-')
    // import the export as it is (without the code, which the import hands out afresh)
    const again = stringify(rows.map((r) => ({ ...r, code: '', material: `Nickel ${tag} again` })), { header: true })
    const dry = await manager.post('/api/samples/import?dryRun=true', again, { 'content-type': 'text/csv' })
    expect(dry.body.valid, JSON.stringify(dry.body.errors)).toBe(true)
    const real = await manager.post('/api/samples/import', again, { 'content-type': 'text/csv' })
    expect(real.status).toBe(201)
    const back = (await manager.get(`/api/samples/${real.body.created[0].id}`)).body
    expect(back).toMatchObject(tricky)
  })

  it('sends security headers on pages and API answers', async () => {
    const page = await fetch(`${testBaseUrl()}/sign-in`)
    const csp = page.headers.get('content-security-policy') ?? ''
    expect(csp).toContain("frame-ancestors 'none'")
    expect(csp).toMatch(/script-src 'self'( 'sha256-[A-Za-z0-9+/=]+')*/)
    expect(csp).not.toContain('unsafe-eval')
    expect(page.headers.get('x-content-type-options')).toBe('nosniff')
    expect(page.headers.get('referrer-policy')).toBe('same-origin')
    const api = await manager.get('/api/auth/me')
    expect(api.headers.get('x-content-type-options')).toBe('nosniff')
    expect(api.headers.get('content-security-policy')).toContain("default-src 'none'")
  })

  it('gives the session cookie the life of the session', async () => {
    const c = new Client()
    const r = await c.post('/api/auth/sign-in', { email: 'manager@larchmere-lab.example', password: 'demo-manager-2026' })
    const cookie = r.headers.getSetCookie().find((x) => x.startsWith('ionfolio_session='))!
    const maxAge = Number(/Max-Age=(\d+)/i.exec(cookie)?.[1])
    const session = await testDb()('sessions').where({ id: c.cookie.split('=')[1] }).first()
    const sessionSeconds = (new Date(session.expires_at).getTime() - Date.now()) / 1000
    expect(Math.abs(maxAge - sessionSeconds)).toBeLessThan(60)
  })

  it('compares the whole origin (scheme, host, port) with the configured address', async () => {
    const base = new URL(testBaseUrl())
    const otherPort = `${base.protocol}//${base.hostname}:${Number(base.port) + 1}`
    const otherScheme = `https://${base.host}`
    for (const origin of [otherPort, otherScheme, 'null', `${base.protocol}//evil.example:${base.port}`]) {
      const r = await manager.request('POST', '/api/notices/run', undefined, { origin })
      expect(r.status, origin).toBe(403)
    }
    expect((await manager.request('POST', '/api/notices/run', undefined, { origin: base.origin })).status).toBe(200)
  })

  it('changes nothing and bumps no version on an empty PATCH', async () => {
    const s = await createSample(manager)
    const r = await manager.patch(`/api/samples/${s.id}`, { version: 1 })
    expect(r.status).toBe(200)
    expect(r.body.version).toBe(1)
    const same = await manager.patch(`/api/samples/${s.id}`, { version: 1, name: s.name })
    expect(same.body.version).toBe(1)
    const rows = await testDb()('audit_log').where({ entity_id: s.id }).pluck('action')
    expect(rows).toEqual(['sample.created'])
  })
})

// Last in the file: the client's connection is left in the middle of a body the server will not
// read, and fetch's pool would otherwise hand that connection to the next request.
describe('a chunked body without a declared length', () => {
  it('is refused with 413 once it passes the limit', async () => {
    const chunk = new TextEncoder().encode('x'.repeat(8192))
    let sent = 0
    const body = new ReadableStream<Uint8Array>({
      pull(c) {
        if (sent++ < 200) c.enqueue(chunk)
        else c.close()
      },
    })
    const res = await fetch(`${testBaseUrl()}/api/auth/password-reset`, { method: 'POST', body, headers: { 'content-type': 'application/json', origin: testBaseUrl() }, duplex: 'half' } as RequestInit)
    expect(res.status).toBe(413)
    expect((await res.json()).data.limitBytes).toBe(16 * 1024)
  })
})

