import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { signedIn, unique, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { createSample, sampleBody } from '../support/samples'

let manager: Client
beforeAll(async () => {
  manager = await signedIn('manager')
})
afterAll(closeTestDb)

// A fictional supplier's analysis of a ⁵⁸Ni lot (demo data): atom %, standard uncertainties in %.
const ANALYSIS = [
  { massNumber: 58, percent: 99.3, uncertainty: 0.05 },
  { massNumber: 60, percent: 0.55, uncertainty: 0.04 },
  { massNumber: 61, percent: 0.03, uncertainty: 0.01 },
  { massNumber: 62, percent: 0.1, uncertainty: 0.02 },
  { massNumber: 64, percent: 0.02, uncertainty: null },
]
const issues = (r: { body: { data?: { issues: { path: string; message: string }[] } } }) => r.body.data?.issues ?? []

describe('a full isotopic analysis per component', () => {
  it('stores one row per isotope, answers them in order, and replaces them with the composition', async () => {
    const s = await createSample(manager, { name: `Analysed ${unique()}`, components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', analysis: ANALYSIS }] })
    expect(s.components[0].analysis).toEqual(ANALYSIS)
    expect(s.components[0].enrichmentPercent).toBeNull()
    const rows = await testDb()('sample_component_isotopes as i').join('sample_components as c', 'c.id', 'i.component_id').where('c.sample_id', s.id).orderBy('i.position').select('i.mass_number', 'i.atom_pct', 'i.atom_unc_pct')
    expect(rows.map((r) => [r.mass_number, r.atom_pct, r.atom_unc_pct])).toEqual(ANALYSIS.map((a) => [a.massNumber, a.percent, a.uncertainty]))

    const again = await manager.patch(`/api/samples/${s.id}`, { version: 1, components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', enrichmentPercent: 99.3, enrichmentUncertainty: 0.1 }] })
    expect(again.status, JSON.stringify(again.body)).toBe(200)
    expect(again.body.components[0]).toMatchObject({ enrichmentPercent: 99.3, analysis: null })
    expect(await testDb()('sample_component_isotopes as i').join('sample_components as c', 'c.id', 'i.component_id').where('c.sample_id', s.id)).toEqual([])
  })

  it('refuses a named isotope with neither enrichment nor analysis, instead of reading it as 100 %', async () => {
    const r = await manager.post('/api/samples', sampleBody({ components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom' }] }))
    expect(r.status).toBe(400)
    expect(issues(r)).toEqual([{ path: 'components.0.enrichmentPercent', message: expect.stringContaining('Give the enrichment of 58Ni') }])
  })

  it.each([
    ['a sum that is not 100 %', ANALYSIS.map((a) => (a.massNumber === 60 ? { ...a, percent: 1.55 } : a)), 'add up to 101.000 %'],
    ['an isotope twice', [...ANALYSIS, { massNumber: 60, percent: 0, uncertainty: null }], 'listed twice'],
    ['the named isotope missing', ANALYSIS.filter((a) => a.massNumber !== 58).map((a, i) => (i === 0 ? { ...a, percent: 99.85 } : a)), 'must list ⁵⁸Ni'],
    ['an isotope that does not exist', [{ massNumber: 58, percent: 99.9 }, { massNumber: 99, percent: 0.1 }], '99Ni is not a known nuclide'],
  ])('refuses %s, pointing at the analysis', async (_what, analysis, message) => {
    const r = await manager.post('/api/samples', sampleBody({ components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', analysis }] }))
    expect(r.status).toBe(400)
    expect(issues(r)).toContainEqual({ path: 'components.0.analysis', message: expect.stringContaining(message) })
  })

  it('refuses an enrichment and an analysis together, and a bad line by its field', async () => {
    const both = await manager.post('/api/samples', sampleBody({ components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', enrichmentPercent: 99, analysis: ANALYSIS }] }))
    expect(issues(both)).toContainEqual({ path: 'components.0.enrichmentPercent', message: expect.stringContaining('not both') })
    const bad = await manager.post('/api/samples', sampleBody({ components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', analysis: [{ massNumber: 58, percent: 'lots' }] }] }))
    expect(bad.status).toBe(400)
    expect(issues(bad)).toContainEqual({ path: 'components.0.analysis.0.percent', message: 'Enter the atom fraction in %' })
  })

  it('goes out in the CSV export rounded to its uncertainty, and comes back in through the import', async () => {
    const tag = unique()
    await createSample(manager, { name: `Export ${tag}`, lot: tag, components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', analysis: ANALYSIS }] })
    const csv = await manager.get(`/api/samples?format=csv&q=${tag}`)
    expect(csv.status).toBe(200)
    const text = String(csv.body)
    expect(text).toContain('Ni-58 1 iso[58=99.300±0.050 60=0.550±0.040 61=0.030±0.010 62=0.100±0.020 64=0.02]%')
    const line = text.trim().split('\n')[1]!.replace(/^S-\d{4}-\d+,/, ',').replace(`Export ${tag}`, `Reimport ${tag}`)
    const header = text.split('\n')[0]!
    const r = await manager.request('POST', '/api/samples/import?dryRun=true', `${header}\n${line}\n`, { 'content-type': 'text/csv' })
    expect(r.status, JSON.stringify(r.body)).toBe(200)
    expect(r.body).toMatchObject({ valid: true, rows: 1 })
  })
})
