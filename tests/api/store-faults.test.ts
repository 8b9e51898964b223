import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { Client, signedIn } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { createSample, objectsUnder } from '../support/samples'
import { certifiableSample, issue } from '../support/certificates'
import { freePort, frozenServer, slowProxy, startInstance } from '../support/instance'

// Each fault is real: a second app instance on the same database is pointed at a port where
// nothing listens (a stopped store), at a server that accepts connections and never answers (a
// frozen store), or through a proxy that delivers every request 3 s late (a slow store).
// Its store time limit is 1 s, so the answers come quickly.
const TIMEOUT_MS = 1_000
let manager: Client
let certId: string
beforeAll(async () => {
  manager = await signedIn('manager')
  certId = (await issue(manager, 'sample', (await certifiableSample(manager)).id)).id
})
afterAll(closeTestDb)

/** A client of `base` carrying the manager's session (sessions live in the shared database). */
function asManager(base: string): Client {
  const client = new Client(base)
  client.cookie = manager.cookie
  return client
}

function datasheetForm(name: string) {
  const f = new FormData()
  f.append('file', new Blob([Buffer.from('isotope,enrichment\n58,99.6\n')]), name)
  return f
}

describe.each([
  ['stopped', async () => ({ port: await freePort(), close: async () => {} })],
  ['frozen', frozenServer],
])('a %s object store', (_what, makeStore) => {
  let store: { port: number; close: () => Promise<void> }
  let app: Awaited<ReturnType<typeof startInstance>>
  beforeAll(async () => {
    store = await makeStore()
    app = await startInstance({ NUXT_S3_PORT: String(store.port), NUXT_S3_TIMEOUT_MS: String(TIMEOUT_MS) })
  })
  afterAll(async () => {
    await app?.stop()
    await store?.close()
  })

  it('makes /api/health answer 503 within its bound, asking afresh each time', async () => {
    const started = Date.now()
    const r = await fetch(`${app.base}/api/health`)
    expect(r.status).toBe(503)
    expect((await r.json()).storage.ok).toBe(false)
    expect(Date.now() - started).toBeLessThan(5_000)
  })

  it('answers a certificate download 503 with Retry-After, not silence', async () => {
    const started = Date.now()
    const r = await asManager(app.base).get(`/api/certificates/${certId}/pdf`)
    expect(r.status).toBe(503)
    expect(r.headers.get('retry-after')).toBe('30')
    expect(r.body.message).toBe('The file store is not answering; try again shortly')
    expect(Date.now() - started).toBeLessThan(10 * TIMEOUT_MS)
  })

  it('refuses an upload with 503 or 502 and records nothing', async () => {
    const s = await createSample(manager)
    const r = await asManager(app.base).post(`/api/samples/${s.id}/datasheets`, datasheetForm('coa.csv'))
    expect([502, 503]).toContain(r.status)
    expect(await testDb()('datasheets').where({ sample_id: s.id })).toEqual([])
  })
})

describe('a store that answers only after the app gave up', () => {
  it('leaves no row, and the object that lands late is removed', async () => {
    const proxy = await slowProxy(Number(process.env.NUXT_S3_PORT))
    const app = await startInstance({ NUXT_S3_PORT: String(proxy.port), NUXT_S3_TIMEOUT_MS: String(TIMEOUT_MS) })
    try {
      // A first upload at full speed: the store works through the proxy.
      const warm = await createSample(manager)
      expect((await asManager(app.base).post(`/api/samples/${warm.id}/datasheets`, datasheetForm('warm.csv'))).status).toBe(201)

      proxy.delayMs = 3 * TIMEOUT_MS
      const s = await createSample(manager)
      const r = await asManager(app.base).post(`/api/samples/${s.id}/datasheets`, datasheetForm('late.csv'))
      expect(r.status).toBe(503)
      expect(r.headers.get('retry-after')).toBe('30')
      // The late write reaches the store ~3 s after it was sent; the removals the app sent
      // after giving up arrive after it. Watch the store until well past the second removal.
      let sawLateObject = false
      const until = Date.now() + 12 * TIMEOUT_MS
      while (Date.now() < until) {
        if ((await objectsUnder(`datasheets/${s.id}/`)).length) sawLateObject = true
        await new Promise((res) => setTimeout(res, 150))
      }
      console.info(`late object seen in the store before its removal: ${sawLateObject}`)
      expect(await objectsUnder(`datasheets/${s.id}/`)).toEqual([])
      expect(await testDb()('datasheets').where({ sample_id: s.id })).toEqual([])
    } finally {
      await app.stop()
      await proxy.close()
    }
  })
})
