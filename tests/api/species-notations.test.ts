import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone } from '../support/api'
import { closeTestDb } from '../support/db'

let c: Awaited<ReturnType<typeof everyone>>
beforeAll(async () => {
  c = await everyone()
})
afterAll(closeTestDb)

// Issue 11 item 5: every notation a lab writes for ⁴⁸Ca¹⁰⁺ is the same species everywhere.
const CA48 = ['Ca-48 10+', 'Ca-48 XI', '48Ca10+', '48Ca 10+', 'Ca48 10+']

describe('isotope notations', () => {
  it.each(CA48)('the look-up reads %j as ⁴⁸Ca¹⁰⁺', async (text) => {
    const r = await c.scientist.get(`/api/species/lookup?q=${encodeURIComponent(text)}`)
    expect(r.status).toBe(200)
    expect(r.body).toMatchObject({ z: 20, charge: 10, massNumber: 48, notations: { ionic: '48Ca10+', spectroscopic: '48Ca XI' } })
  })

  it('records every notation as one species, finds it by any of them, and compares them as one', async () => {
    const ids = new Set<string>()
    for (const text of CA48) {
      const r = await c.scientist.post('/api/species', { species: text })
      expect([200, 201]).toContain(r.status)
      expect(r.body.label).toBe('48Ca10+')
      ids.add(r.body.id)
    }
    expect(ids.size).toBe(1)
    const found = await c.scientist.get(`/api/species?q=${encodeURIComponent('Ca-48 XI')}`)
    expect(found.body.items.map((s: { id: string }) => s.id)).toContain([...ids][0])
    const compared = await c.scientist.get(`/api/species/compare?species=${encodeURIComponent(CA48.join(', '))}`)
    expect(compared.body.rows.map((r: { label: string }) => r.label)).toEqual(CA48.map(() => '48Ca10+'))
  })
})

describe('estimates that say when they do not apply', () => {
  it('U⁹¹⁺: the QED estimate leads, with its corrections in eV; the non-relativistic ones say why they are absent', async () => {
    const r = await c.scientist.get(`/api/species/lookup?q=${encodeURIComponent('U91+')}`)
    expect(r.status).toBe(200)
    const qed = r.body.ionisationEnergy.estimates.find((e: { method: string }) => e.method === 'dirac-qed-hydrogen-like')
    expect(qed.corrections.map((x: { name: string }) => x.name)).toEqual(['finite nuclear size', 'self-energy', 'vacuum polarisation (Uehling)'])
    expect(r.body.bestEstimate).toMatchObject({ method: 'dirac-qed-hydrogen-like' })
    // within 0.01 % of the NIST ASD value the record carries beside it (via Debian python3-pymatgen)
    expect(Math.abs(qed.eV - r.body.ionisationEnergy.reference.eV) / r.body.ionisationEnergy.reference.eV).toBeLessThan(1e-4)
    const slater = r.body.ionisationEnergy.estimates.find((e: { method: string }) => e.method === 'slater-hydrogenic')
    expect(slater).toMatchObject({ eV: null, notApplicable: expect.stringMatching(/one-electron ion/) })
  })

  it('the comparison CSV gives no number for a method that does not apply, and the reason', async () => {
    const csv = await c.scientist.get(`/api/species/compare?species=${encodeURIComponent('U, U91+')}&format=csv`)
    const [head, u] = (csv.body as string).trim().split('\n')
    const columns = head!.split(',')
    expect(columns).toEqual(expect.arrayContaining(['best_estimate_eV', 'best_estimate_method', 'not_applicable']))
    expect(u).toMatch(/slater-total-energy: the model gives no binding/)
    expect(u).not.toMatch(/,-\d/)
  })
})
