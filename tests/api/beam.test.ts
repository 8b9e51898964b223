import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone } from '../support/api'
import { testDb, closeTestDb } from '../support/db'

let c: Awaited<ReturnType<typeof everyone>>
beforeAll(async () => {
  c = await everyone()
})
afterAll(closeTestDb)

describe('GET /api/beam/charge-states and /api/beam/breeding', () => {
  it('answers the strip question with the contract fields for every role', async () => {
    const r = await c.technician.get('/api/beam/charge-states?ion=208Pb27%2B&energy=4.2&medium=C&arealDensity=20')
    expect(r.status).toBe(200)
    expect(r.body).toMatchObject({ ion: '208Pb27+', energyMeVPerU: 4.2, medium: 'C' })
    expect(r.body.models.map((m: { model: string }) => m.model)).toEqual(['schiwietz-grande-2001', 'schiwietz-grande-2004', 'nikolaev-dmitriev-1968', 'sayer-1977', 'baron-1993'])
    expect(r.body.notApplicable).toEqual([])
    expect(r.body.rigidity.length).toBeGreaterThan(5)
    expect(r.body.energyLoss.estimated).toBe(true)
  })

  it('accepts total MeV and MeV/nucleon and shows the conversion', async () => {
    const r = await c.auditor.get('/api/beam/charge-states?ion=48Ca10%2B&energy=240&unit=MeV&medium=N2')
    expect(r.status).toBe(200)
    expect(r.body.energy.totalMeV).toBe(240)
    expect(r.body.energy.mevPerU).toBeCloseTo(240 / r.body.ionDetail.ionMassU, 9)
    expect(r.body.mediumDetail.phase).toBe('gas')
  })

  it.each([
    ['ion=Qq&energy=1&medium=C', 'ion'],
    ['ion=Pb&energy=-3&medium=C', 'energy'],
    ['ion=Pb&energy=fast&medium=C', 'energy'],
    ['ion=Pb&energy=1&medium=Zz9', 'medium'],
    ['ion=Pb&energy=1&medium=C&unit=keV', 'unit'],
    ['ion=Pb&energy=1', 'medium'],
  ])('a bad query (%s) is a 400 naming %s', async (query, field) => {
    const r = await c.scientist.get(`/api/beam/charge-states?${query}`)
    expect(r.status).toBe(400)
    expect(r.body.data.issues.map((i: { path: string }) => i.path)).toContain(field)
  })

  it('a solid-only formula is listed as not applicable for a gas stripper, with its reason', async () => {
    const r = await c.scientist.get('/api/beam/charge-states?ion=12C1-&energy=0.21&medium=Ar&gas=true')
    expect(r.status).toBe(200)
    expect(r.body.models.map((m: { model: string }) => m.model)).not.toContain('schiwietz-grande-2004')
    expect(r.body.notApplicable).toEqual([{ model: 'schiwietz-grande-2004', source: expect.stringContaining('2004'), reason: expect.stringMatching(/solid strippers only/) }])
  })

  // Edges: a proton, bare nuclei, the lowest and highest energies accepted; every number finite.
  it.each([
    'ion=1H1%2B&energy=1&medium=C',
    'ion=H&energy=0.000001&medium=Au&arealDensity=1',
    'ion=208Pb82%2B&energy=999&medium=C&arealDensity=50',
    'ion=238U92%2B&energy=0.01&medium=He&gas=true',
    'ion=Og&energy=5&medium=CH2',
  ])('%s answers 200 with no NaN or infinity anywhere', async (query) => {
    const r = await c.scientist.get(`/api/beam/charge-states?${query}`)
    expect(r.status).toBe(200)
    // JSON writes NaN and ±Infinity as null: no number field of the answer may be null.
    const holesIn = (x: unknown): boolean => x === null || (typeof x === 'number' && !Number.isFinite(x)) || (typeof x === 'object' && Object.values(x as object).some(holesIn))
    for (const part of ['models', 'rigidity', 'energy', 'energyLoss', 'ionDetail', 'mediumDetail']) expect(holesIn(r.body[part] ?? {}), part).toBe(false)
    for (const m of r.body.models) expect(m.fractions.reduce((a: number, f: { fraction: number }) => a + f.fraction, 0)).toBeCloseTo(1, 9)
  })

  it.each([
    ['ion=Pb&energy=5000&medium=C', 'energy'],
    ['ion=Pb&energy=1e400&medium=C', 'energy'],
    ['ion=Pb&energy=Infinity&medium=C', 'energy'],
    ['ion=Pb%00&energy=1&medium=C', 'ion'],
    ['ion=Pb&energy=1&medium=C%00', 'medium'],
    ['ion=Pb83%2B&energy=1&medium=C', 'ion'],
    ['ion=Pb&energy=1&medium=C&arealDensity=0', 'arealDensity'],
  ])('an absurd query (%s) is a 400 naming %s, never a 500', async (query, field) => {
    const r = await c.scientist.get(`/api/beam/charge-states?${query}`)
    expect(r.status).toBe(400)
    expect(JSON.stringify(r.body.data.issues)).toContain(field)
  })

  it('answers the breed question with steps and breeding factors', async () => {
    const r = await c.scientist.get('/api/beam/breeding?ion=Ar&electronEnergy=5000&currentDensity=250')
    expect(r.status).toBe(200)
    expect(r.body).toMatchObject({ electronEnergyEv: 5000, currentDensityACm2: 250 })
    expect(r.body.steps[0]).toMatchObject({ charge: 0 })
    expect(r.body.breeding.at(-1)).toMatchObject({ charge: 18 })
    const bad = await c.scientist.get('/api/beam/breeding?ion=Ar&electronEnergy=0&currentDensity=250')
    expect(bad.status).toBe(400)
  })
})

describe('saved plans', () => {
  let foil: { id: string; code: string; formula: string; arealDensityUgCm2: number }
  let planId: string

  it('lists the stripper foils in stock and sources ranked by enrichment', async () => {
    const r = await c.scientist.get('/api/beam/stock?z=28&massNumber=58')
    expect(r.status).toBe(200)
    expect(r.body.foils.length).toBeGreaterThan(0)
    for (const f of r.body.foils) expect(['retired', 'depleted']).not.toContain(f.status)
    foil = r.body.foils.find((f: { formula: string; arealDensityUgCm2: number }) => f.formula === 'C' && f.arealDensityUgCm2 === 20)
    expect(foil).toBeTruthy()
    // Samples enriched in 58Ni come first, most enriched first (the demo holds a 99.5 % 58Ni
    // cathode among them), then natural nickel.
    const kinds = r.body.sources.map((s: { massNumber: number | null }) => (s.massNumber === 58 ? 'enriched' : s.massNumber === null ? 'natural' : 'other'))
    expect(kinds[0]).toBe('enriched')
    expect(kinds.lastIndexOf('enriched')).toBeLessThan(kinds.indexOf('natural'))
    const enriched = r.body.sources.filter((s: { massNumber: number | null }) => s.massNumber === 58).map((s: { enrichmentPct: number }) => s.enrichmentPct)
    expect(enriched).toEqual([...enriched].sort((a, b) => b - a))
    expect(enriched).toContain(99.5)
  })

  it('a scientist saves a plan with the foil from the stock; it is audited and frozen', async () => {
    const r = await c.scientist.post('/api/beam/plans', { ion: '208Pb27+', energy: 4.2, stripperSampleId: foil.id, chargeState: 54, breeding: { electronEnergy: 5000, currentDensity: 250 } })
    expect(r.status).toBe(201)
    expect(r.body).toMatchObject({ ion: '208Pb27+', medium: 'C', chargeState: 54, stripperSample: { id: foil.id, code: foil.code } })
    expect(r.body.rigidityTm).toBeGreaterThan(1.1)
    planId = r.body.id
    const audit = await testDb()('audit_log').where({ entity_type: 'beam_plan', entity_id: planId })
    expect(audit).toHaveLength(1)
    expect(audit[0].action).toBe('beam_plan.saved')
    const one = await c.technician.get(`/api/beam/plans/${planId}`)
    expect(one.status).toBe(200)
    expect(one.body.result.strip.models).toHaveLength(5)
    expect(one.body.inputs.arealDensity).toBe(20)
  })

  it('refuses a foil that is not a stripper foil in stock, and a source without the element', async () => {
    const cathode = (await c.scientist.get('/api/samples?q=Graphite%20cathode&pageSize=1')).body.items[0]
    const r = await c.scientist.post('/api/beam/plans', { ion: 'Pb', energy: 4.2, stripperSampleId: cathode.id })
    expect(r.status).toBe(400)
    expect(r.body.data.issues[0].path).toBe('stripperSampleId')
    const s = await c.scientist.post('/api/beam/plans', { ion: 'Pb', energy: 4.2, medium: 'C', sourceSampleId: cathode.id })
    expect(s.status).toBe(400)
    expect(s.body.data.issues[0].path).toBe('sourceSampleId')
    expect(await testDb()('beam_plans').where({ source_sample_id: cathode.id }).first()).toBeUndefined()
  })

  it('a technician reads plans but cannot save one', async () => {
    const r = await c.technician.post('/api/beam/plans', { ion: 'Pb', energy: 4.2, medium: 'C' })
    expect(r.status).toBe(403)
  })

  it('is listed, searchable by element and by the foil it uses, and exported as CSV', async () => {
    const byFoil = await c.auditor.get(`/api/beam/plans?sampleId=${foil.id}`)
    expect(byFoil.body.items.map((p: { id: string }) => p.id)).toContain(planId)
    const byElement = await c.auditor.get('/api/beam/plans?element=Pb&q=208Pb')
    expect(byElement.body.items.map((p: { id: string }) => p.id)).toContain(planId)
    const none = await c.auditor.get('/api/beam/plans?element=U')
    expect(none.body.items.map((p: { id: string }) => p.id)).not.toContain(planId)
    const csv = await c.auditor.get('/api/beam/plans?format=csv')
    expect(csv.headers.get('content-type')).toMatch(/text\/csv/)
    expect(csv.body.split('\n')[0]).toBe('title,ion,energy_mev_u,medium,charge_state,charge_fraction,rigidity_tm,stripper_sample,source_sample,engine,created_by,created_at')
    expect(csv.body).toContain(foil.code)
  })

  it('re-runs on the current engine and lists what changed (nothing, on the same engine; the stored number when it differs)', async () => {
    const same = await c.technician.get(`/api/beam/plans/${planId}/rerun`)
    expect(same.status).toBe(200)
    expect(same.body.changes).toEqual([])
    // Pretend the plan was made by an older engine whose SG mean charge differed.
    const row = await testDb()('beam_plans').where({ id: planId }).first()
    row.result.strip.models[0].meanCharge = 50
    row.result.strip.engine = '0.9.0'
    await testDb()('beam_plans').where({ id: planId }).update({ result: JSON.stringify(row.result), engine_version: '0.9.0' })
    const diff = await c.technician.get(`/api/beam/plans/${planId}/rerun`)
    expect(diff.body.storedEngine).toBe('0.9.0')
    expect(diff.body.changes).toEqual(expect.arrayContaining([
      { what: 'engine version', before: '0.9.0', after: diff.body.currentEngine },
      expect.objectContaining({ what: 'schiwietz-grande-2001: mean charge', before: '50' }),
    ]))
  })
})
