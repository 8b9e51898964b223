import { describe, it, expect, beforeAll } from 'vitest'
import { randomUUID } from 'node:crypto'
import { everyone, type Client, type RoleName } from '../support/api'

type Who = RoleName | 'anonymous'
let clients: Record<Who, Client>
beforeAll(async () => {
  clients = await everyone()
})

// Expected status per caller for every route so far (DESIGN.md §2). Bodies are deliberately
// invalid where a route would otherwise write, so an allowed caller gets 400 (past the role
// check) and nothing is changed.
const MATRIX: Array<{ route: string; method: string; body?: unknown; expect: Record<Who, number> }> = [
  { method: 'GET', route: '/api/auth/me', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/health', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 200 } },
  { method: 'GET', route: '/api/users', expect: { manager: 200, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'POST', route: '/api/users', body: { email: 'x' }, expect: { manager: 400, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'PATCH', route: `/api/users/${randomUUID()}`, body: { role: 'auditor' }, expect: { manager: 404, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: '/api/audit', expect: { manager: 200, scientist: 403, technician: 403, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/audit?format=csv', expect: { manager: 200, scientist: 403, technician: 403, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/samples', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/samples?format=csv', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'POST', route: '/api/samples', body: { name: '' }, expect: { manager: 400, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: `/api/samples/${randomUUID()}`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'GET', route: '/api/samples/by-code/S-1999-999999', expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'PATCH', route: `/api/samples/${randomUUID()}`, body: { version: 1, name: 'x' }, expect: { manager: 404, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'DELETE', route: `/api/samples/${randomUUID()}?version=1`, expect: { manager: 404, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: `/api/samples/${randomUUID()}/history`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'POST', route: `/api/samples/${randomUUID()}/datasheets`, expect: { manager: 404, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: `/api/datasheets/${randomUUID()}/download`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'POST', route: `/api/datasheets/${randomUUID()}/replace`, expect: { manager: 404, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'POST', route: `/api/datasheets/${randomUUID()}/withdraw`, body: { reason: 'Not for this sample' }, expect: { manager: 404, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'POST', route: '/api/samples/import?dryRun=true', body: 'name,material,form\n', expect: { manager: 200, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'POST', route: '/api/samples/import', body: 'name,material,form\n', expect: { manager: 400, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: '/api/locations', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'POST', route: '/api/locations', body: { kind: 'attic' }, expect: { manager: 400, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: `/api/samples/${randomUUID()}/species`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'GET', route: '/api/overview', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/species/lookup?q=Fe', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/species/series?z=26', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/species/compare?element=Fe&from=0&to=2', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/species', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'POST', route: '/api/species', body: { species: '' }, expect: { manager: 400, scientist: 400, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: `/api/species/${randomUUID()}`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'POST', route: `/api/species/${randomUUID()}/samples`, body: { sampleId: randomUUID() }, expect: { manager: 404, scientist: 404, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'DELETE', route: `/api/species/${randomUUID()}/samples/${randomUUID()}`, expect: { manager: 404, scientist: 404, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: '/api/certificates', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'POST', route: '/api/certificates', body: { subjectType: 'crystal' }, expect: { manager: 400, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: `/api/certificates/${randomUUID()}`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'GET', route: `/api/certificates/${randomUUID()}/pdf`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'POST', route: `/api/certificates/${randomUUID()}/supersede`, body: { reason: '' }, expect: { manager: 400, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'POST', route: `/api/certificates/${randomUUID()}/revoke`, body: { reason: '' }, expect: { manager: 400, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: '/api/certificates/zip?from=2001-01-01&to=2001-01-02', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: `/api/public/verify/C-1999-999999?digest=${'0'.repeat(64)}`, expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 200 } },
  { method: 'POST', route: '/api/labels', body: { sampleIds: [] }, expect: { manager: 400, scientist: 403, technician: 400, auditor: 403, anonymous: 401 } },
  { method: 'POST', route: `/api/samples/${randomUUID()}/custody`, body: { action: 'teleport' }, expect: { manager: 400, scientist: 403, technician: 400, auditor: 403, anonymous: 401 } },
  { method: 'POST', route: `/api/samples/${randomUUID()}/custody`, body: { action: 'condition', version: 1, note: 'fine' }, expect: { manager: 404, scientist: 403, technician: 404, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: `/api/samples/${randomUUID()}/custody`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'GET', route: '/api/beam/charge-states?ion=Pb&energy=4.2&medium=C', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/beam/breeding?ion=Ne&electronEnergy=2000&currentDensity=100', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/beam/stock?z=6', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/beam/plans', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/beam/plans?format=csv', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'POST', route: '/api/beam/plans', body: { ion: '' }, expect: { manager: 400, scientist: 400, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: `/api/beam/plans/${randomUUID()}`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'GET', route: `/api/beam/plans/${randomUUID()}/rerun`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'POST', route: '/api/auth/password', body: {}, expect: { manager: 400, scientist: 400, technician: 400, auditor: 400, anonymous: 401 } },
  { method: 'POST', route: '/api/auth/password-reset', body: { email: 'x' }, expect: { manager: 400, scientist: 400, technician: 400, auditor: 400, anonymous: 400 } },
  { method: 'POST', route: '/api/auth/password-reset/complete', body: { token: 'x' }, expect: { manager: 400, scientist: 400, technician: 400, auditor: 400, anonymous: 400 } },
  { method: 'POST', route: `/api/users/${randomUUID()}/reset-password`, expect: { manager: 404, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: '/api/tokens', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 401 } },
  { method: 'POST', route: '/api/tokens', body: { name: '' }, expect: { manager: 400, scientist: 400, technician: 400, auditor: 400, anonymous: 401 } },
  { method: 'DELETE', route: `/api/tokens/${randomUUID()}`, expect: { manager: 404, scientist: 404, technician: 404, auditor: 404, anonymous: 401 } },
  { method: 'GET', route: '/api/openapi.json', expect: { manager: 200, scientist: 200, technician: 200, auditor: 200, anonymous: 200 } },
  { method: 'GET', route: '/api/jobs', expect: { manager: 200, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: '/api/checkouts?scope=overdue', expect: { manager: 200, scientist: 403, technician: 200, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: '/api/checkouts?scope=everything', expect: { manager: 400, scientist: 403, technician: 400, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: '/api/custody/people?q=a', expect: { manager: 200, scientist: 403, technician: 200, auditor: 403, anonymous: 401 } },
  { method: 'POST', route: '/api/notices/run', expect: { manager: 200, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'GET', route: '/api/inventory', expect: { manager: 200, scientist: 403, technician: 403, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/inventory?format=csv', expect: { manager: 200, scientist: 403, technician: 403, auditor: 200, anonymous: 401 } },
  { method: 'GET', route: '/api/licence-limits', expect: { manager: 200, scientist: 403, technician: 403, auditor: 200, anonymous: 401 } },
  { method: 'PUT', route: '/api/licence-limits', body: { nuclide: 'Nonsense-1', limitBq: 1 }, expect: { manager: 400, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
  { method: 'DELETE', route: `/api/licence-limits/${randomUUID()}`, expect: { manager: 404, scientist: 403, technician: 403, auditor: 403, anonymous: 401 } },
]

const cases = MATRIX.flatMap((m) => (Object.keys(m.expect) as Who[]).map((who) => [m.method, m.route, who, m.expect[who], m.body] as const))

describe('every route, every role', () => {
  it.each(cases)('%s %s as %s → %i', async (method, route, who, status, body) => {
    const r = await clients[who].request(method, route, body)
    expect(r.status).toBe(status)
  })
})
