import { describe, it, expect, beforeAll } from 'vitest'
import { readdirSync } from 'node:fs'
import path from 'node:path'
import { Client, signedIn, unique } from '../support/api'
import { waitForMail } from '../support/mail'
import { createSample } from '../support/samples'
import { seededRandom } from '../../shared/samples/propagation'

// Random bodies and query strings at every route of the server (its route files, as the route
// table is built from them), from a seeded generator: a failure names the seed and the request,
// and FUZZ_SEED=<seed> replays the same run. The claim under test: no input gets a 500.
const SEED = Number(process.env.FUZZ_SEED ?? 20261211)
const REQUESTS = Number(process.env.FUZZ_REQUESTS ?? 2400)


/** Every API route file as [method, pattern], e.g. ['PATCH', '/api/samples/[id]']. */
function routeTable(): Array<[string, string]> {
  const root = path.resolve('server/api')
  const out: Array<[string, string]> = []
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, e.name)
      if (e.isDirectory()) walk(full)
      else if (e.name.endsWith('.ts')) {
        const m = /^(.*?)(?:\.(get|post|patch|put|delete))?\.ts$/.exec(e.name)!
        const rel = path.relative(root, path.join(dir, m[1]!)).split(path.sep).filter((s) => s !== 'index')
        out.push([(m[2] ?? 'get').toUpperCase(), `/api/${rel.join('/')}`.replace(/\/$/, '')])
      }
    }
  }
  walk(root)
  return out.sort()
}

const KEYS = ['q', 'page', 'pageSize', 'sort', 'format', 'from', 'to', 'version', 'dryRun', 'digest', 'token', 'z', 'element', 'charge', 'action', 'kind', 'record', 'actor', 'signIns', 'status', 'form', 'isotope', 'place', 'caution', 'due', 'species', 'list', 'sequence', 'subjectType', 'layout', 'email', 'password', 'name', 'role', 'active', 'sampleId', 'sampleIds', 'components', 'reason', 'note', 'amount', 'unit', 'locationId', 'kindOf', 'currentPassword', 'newPassword', 'resend', 'subjectId', 'copies', 'dueBack', 'holder', 'run']

describe(`fuzzing every route (seed ${SEED})`, () => {
  let clients: Client[] = []
  let manager: Client
  let fuzzEmail = ''
  const fuzzPassword = 'fuzzing manager passphrase'
  let ids: string[] = []

  beforeAll(async () => {
    // A manager of its own, so lock-outs the fuzzing earns touch nobody else.
    const lead = await signedIn('manager')
    fuzzEmail = `fuzz-${unique()}@larchmere-lab.example`
    expect((await lead.post('/api/users', { email: fuzzEmail, name: 'Fuzz Manager', role: 'manager' })).status).toBe(201)
    const token = /\/invite\/([A-Za-z0-9_-]{20,})/.exec((await waitForMail(fuzzEmail, /invitation/i)).text)![1]!
    manager = new Client()
    expect((await manager.post('/api/auth/accept-invitation', { token, password: fuzzPassword })).status).toBe(200)
    const s = await createSample(manager, { name: 'Fuzz target' })
    ids = [s.id, '00000000-0000-0000-0000-000000000000', 'not-an-id', 'S-2026-000001', '%00', 'C-2026-000001', 'x'.repeat(300)]
    clients = [manager, new Client()]
  })

  it(`sends ${REQUESTS} random requests and gets no 500`, async () => {
    const rand = seededRandom(SEED)
    const pick = <T,>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)]!
    const int = (n: number) => Math.floor(rand() * n)
    const scalar = (): unknown =>
      pick<() => unknown>([
        () => '',
        () => 'x\u0000y',
        () => '0000-01-01',
        () => '2026-02-30',
        () => '9999-12-31',
        () => 'Fe13+',
        () => 'Ca-48 0.2 enr 97.8±0.2%; C 0.2; O 0.6',
        () => '=cmd|"/c calc"!A1',
        () => '\u202e\ud83d\ude00 ünïcödé',
        () => 'a'.repeat(int(5000)),
        () => -1,
        () => 0,
        () => 1e308,
        () => -1e-320,
        () => 2 ** 53 + 1,
        () => int(200),
        () => rand(),
        () => true,
        () => null,
        () => pick(ids),
        () => fuzzEmail,
        () => [],
        () => ['a', 1, null],
        () => ({ z: int(130), massNumber: int(400), fraction: rand() * 2, basis: pick(['atom', 'mass', 'x']) }),
      ])()
    const body = (): unknown => {
      const r = rand()
      if (r < 0.1) return undefined
      if (r < 0.2) return pick(['{', 'null', '[]', '"str"', '{"a":', 'garbage\u0000', '1e999', '{"__proto__":{"x":1}}'])
      if (r < 0.3) return Array.from({ length: int(4) }, scalar)
      const o: Record<string, unknown> = {}
      for (let i = int(8); i > 0; i--) o[pick(KEYS)] = rand() < 0.15 ? { [pick(KEYS)]: scalar() } : rand() < 0.1 ? Array.from({ length: int(3) }, () => ({ z: int(120), fraction: rand(), basis: 'atom' })) : scalar()
      return o
    }
    const query = (): string => {
      const p = new URLSearchParams()
      for (let i = int(5); i > 0; i--) {
        const v = scalar()
        p.append(pick(KEYS), typeof v === 'object' ? JSON.stringify(v) : String(v))
      }
      const s = p.toString()
      return s ? `?${rand() < 0.05 ? `${s}&%ZZ=%` : s}` : ''
    }

    const routes = routeTable()
    expect(routes.length).toBeGreaterThan(40)
    const failures: string[] = []
    const statuses = new Map<number, number>()
    let n = 0
    const worker = async () => {
      while (n < REQUESTS) {
        const i = n++
        const [method, pattern] = routes[i % routes.length]!
        const url = pattern.replace(/\[\.\.\.[a-z]+\]/gi, () => pick(['x', 'a/b/c', '%00'])).replace(/\[[a-zA-Z]+\]/g, () => encodeURIComponent(pick(ids))) + query()
        const client = pick(clients)
        const b = method === 'GET' ? undefined : body()
        const payload = b === undefined ? undefined : typeof b === 'string' ? b : JSON.stringify(b)
        let status = 0
        try {
          const r = await client.request(method, url, payload, payload !== undefined ? { 'content-type': 'application/json' } : {})
          status = r.status
        } catch (e) {
          failures.push(`#${i} ${method} ${url} threw ${(e as Error).message}`)
          continue
        }
        statuses.set(status, (statuses.get(status) ?? 0) + 1)
        if (status >= 500) failures.push(`#${i} ${method} ${url} body ${String(payload).slice(0, 200)} → ${status}`)
        if (url.startsWith('/api/auth/sign-out') && client === manager) await manager.signIn(fuzzEmail, fuzzPassword)
      }
    }
    await Promise.all([worker(), worker(), worker(), worker()])
    expect(n).toBeGreaterThanOrEqual(REQUESTS)
    expect(failures, `seed ${SEED}; statuses ${JSON.stringify([...statuses])}`).toEqual([])
  }, 120_000)
})
