import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone, unique, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { createSample, sampleBody } from '../support/samples'

let c: Awaited<ReturnType<typeof everyone>>
let manager: Client
beforeAll(async () => {
  c = await everyone()
  manager = c.manager
})
afterAll(closeTestDb)

const auditOf = (id: string) => testDb()('audit_log').where({ entity_type: 'sample', entity_id: id }).orderBy('id')

describe('a sample from registration to retirement', () => {
  it('registers a sample with a fresh code, and audits it', async () => {
    const a = await createSample(manager, { name: `Alpha ${unique()}` })
    const b = await createSample(manager, { name: `Beta ${unique()}` })
    expect(a.code).toMatch(/^S-\d{4}-\d{6}$/)
    expect(Number(b.code.slice(7))).toBeGreaterThan(Number(a.code.slice(7)))
    expect(a.version).toBe(1)
    expect(a.components).toEqual([{ z: 28, massNumber: null, fraction: 1, basis: 'atom', enrichmentPercent: null, fractionUncertainty: null, enrichmentUncertainty: null }])
    expect(a.hazardKinds).toEqual([])
    const audit = await auditOf(a.id)
    expect(audit.map((r) => r.action)).toEqual(['sample.created'])
    expect(audit[0]!.after.code).toBe(a.code)
    expect(audit[0]!.before).toBeNull()
  })

  it('reads it by id and by code, for every role', async () => {
    const s = await createSample(manager)
    for (const who of ['manager', 'scientist', 'technician', 'auditor'] as const) {
      const byId = await c[who].get(`/api/samples/${s.id}`)
      expect(byId.status).toBe(200)
      expect(byId.body.code).toBe(s.code)
      expect(byId.body.datasheets).toEqual([])
      const byCode = await c[who].get(`/api/samples/by-code/${s.code.toLowerCase()}`)
      expect(byCode.status).toBe(200)
      expect(byCode.body.id).toBe(s.id)
    }
  })

  it('changes it against the version read, and answers 409 with the current record when stale', async () => {
    const s = await createSample(manager)
    const first = await manager.patch(`/api/samples/${s.id}`, { version: 1, name: 'Renamed foil', status: 'in_use' })
    expect(first.status).toBe(200)
    expect(first.body).toMatchObject({ name: 'Renamed foil', status: 'in_use', version: 2, arealDensity: 500 })
    const stale = await manager.patch(`/api/samples/${s.id}`, { version: 1, name: 'Lost edit' })
    expect(stale.status).toBe(409)
    expect(stale.body.data.current).toMatchObject({ id: s.id, name: 'Renamed foil', version: 2 })
    expect((await manager.get(`/api/samples/${s.id}`)).body.name).toBe('Renamed foil')
    const audit = await auditOf(s.id)
    expect(audit.map((r) => r.action)).toEqual(['sample.created', 'sample.updated'])
    expect(audit[1]!.before).toMatchObject({ name: s.name, version: 1 })
    expect(audit[1]!.after).toMatchObject({ name: 'Renamed foil', version: 2 })
  })

  it('tells every role the history of a sample: who changed which field', async () => {
    const s = await createSample(manager, { name: 'Before' })
    await manager.patch(`/api/samples/${s.id}`, { version: 1, name: 'After', arealDensity: 480 })
    for (const who of ['scientist', 'technician', 'auditor'] as const) {
      const r = await c[who].get(`/api/samples/${s.id}/history`)
      expect(r.status).toBe(200)
      expect(r.body.items.map((i: { action: string }) => i.action)).toEqual(['sample.updated', 'sample.created'])
      expect(r.body.items[0]).toMatchObject({ actor: 'Maren Okafor', changes: [{ field: 'name', label: 'name', before: 'Before', after: 'After' }, { field: 'arealDensity', label: 'areal density (µg/cm²)', before: '500', after: '480' }] })
    }
  })

  it('replaces the composition only when one is sent', async () => {
    const s = await createSample(manager)
    const r = await manager.patch(`/api/samples/${s.id}`, {
      version: 1,
      components: [
        { z: 28, massNumber: 58, fraction: 0.7, basis: 'atom', enrichmentPercent: 99.5 },
        { z: 28, massNumber: 60, fraction: 0.3, basis: 'atom' },
      ],
    })
    expect(r.status).toBe(200)
    expect(r.body.components.map((x: { massNumber: number }) => x.massNumber)).toEqual([58, 60])
    const rows = await testDb()('sample_components').where({ sample_id: s.id }).orderBy('position')
    expect(rows.map((x) => [x.mass_number, x.fraction, x.enrichment_pct])).toEqual([[58, 0.7, 99.5], [60, 0.3, null]])
  })

  it('retires instead of deleting, hides retired samples from the default list, and restores on request', async () => {
    const tag = unique()
    const s = await createSample(manager, { name: `Retiree ${tag}` })
    const unversioned = await manager.delete(`/api/samples/${s.id}`)
    expect(unversioned.status).toBe(400)
    expect(unversioned.body.data.issues[0].path).toBe('version')
    const retired = await manager.delete(`/api/samples/${s.id}?version=1`)
    expect(retired.status).toBe(200)
    expect(retired.body).toMatchObject({ status: 'retired', version: 2 })
    expect(retired.body.retiredAt).toBeTruthy()
    expect(await testDb()('samples').where({ id: s.id }).first()).toBeTruthy()
    expect((await manager.get(`/api/samples?q=${tag}`)).body.total).toBe(0)
    expect((await manager.get(`/api/samples?q=${tag}&status=retired`)).body.total).toBe(1)
    const edit = await manager.patch(`/api/samples/${s.id}`, { version: 2, name: 'Edited while retired' })
    expect(edit.status).toBe(409)
    const back = await manager.patch(`/api/samples/${s.id}`, { version: 2, status: 'available' })
    expect(back.status).toBe(200)
    expect(back.body).toMatchObject({ status: 'available', retiredAt: null, version: 3 })
    expect((await auditOf(s.id)).map((r) => r.action)).toEqual(['sample.created', 'sample.retired', 'sample.restored'])
  })

  it('refuses to retire against a stale version', async () => {
    const s = await createSample(manager)
    await manager.patch(`/api/samples/${s.id}`, { version: 1, name: 'Moved on' })
    const r = await manager.delete(`/api/samples/${s.id}?version=1`)
    expect(r.status).toBe(409)
    expect(r.body.data.current.status).toBe('available')
  })
})

describe('what a sample must be', () => {
  const issues = (r: { body: { data?: { issues: { path: string; message: string }[] } } }) => r.body.data?.issues ?? []

  it('rejects fractions that do not add up to 1, showing the sum', async () => {
    const r = await manager.post('/api/samples', sampleBody({ components: [{ z: 28, massNumber: null, fraction: 0.5, basis: 'atom' }, { z: 6, massNumber: null, fraction: 0.3, basis: 'atom' }] }))
    expect(r.status).toBe(400)
    expect(issues(r)).toContainEqual({ path: 'components', message: expect.stringContaining('0.8000') })
  })

  it('names an unknown hazard code, and accepts combined and EU-suffixed ones', async () => {
    const bad = await manager.post('/api/samples', sampleBody({ hazardStatements: 'H300 H999' }))
    expect(bad.status).toBe(400)
    expect(issues(bad)[0]).toMatchObject({ path: 'hazardStatements', message: expect.stringContaining('H999') })
    const good = await createSample(manager, { hazardStatements: 'H300+H330, h350I' })
    expect(good.hazardStatements).toEqual(['H300', 'H330', 'H350i'])
    expect(good.hazardKinds).toEqual(['toxic'])
  })

  it('asks a radioactive sample for its nuclide and activity, and refuses them on a non-radioactive one', async () => {
    const r = await manager.post('/api/samples', sampleBody({ radioactive: true }))
    expect(issues(r).map((i) => i.path).sort()).toEqual(['activityBq', 'nuclide'])
    const r2 = await manager.post('/api/samples', sampleBody({ nuclide: 'U-238' }))
    expect(issues(r2).map((i) => i.path)).toEqual(['nuclide'])
    const ok = await createSample(manager, { radioactive: true, nuclide: '238u', activityBq: 12, components: [{ z: 92, massNumber: 238, fraction: 1, basis: 'atom' }] })
    expect(ok.nuclide).toBe('U-238')
    expect(ok.hazardKinds).toContain('radioactive')
  })

  it('refuses an isotope that does not exist, a storage place that does not exist, and unknown fields', async () => {
    const iso = await manager.post('/api/samples', sampleBody({ components: [{ z: 28, massNumber: 99, fraction: 1, basis: 'atom' }] }))
    expect(issues(iso)[0]).toMatchObject({ path: 'components.0.massNumber', message: expect.stringContaining('99Ni') })
    const place = await manager.post('/api/samples', sampleBody({ locationId: '00000000-0000-4000-8000-000000000000' }))
    expect(issues(place)).toEqual([{ path: 'locationId', message: expect.any(String) }])
    const extra = await manager.post('/api/samples', sampleBody({ code: 'S-2000-000001' }))
    expect(extra.status).toBe(400)
  })

  it('checks the merged record on a partial change', async () => {
    const s = await createSample(manager, { arealDensity: 500, arealDensityUncertainty: 10 })
    const r = await manager.patch(`/api/samples/${s.id}`, { version: 1, arealDensity: null })
    expect(r.status).toBe(400)
    expect(issues(r)[0]!.path).toBe('arealDensityUncertainty')
  })
})
