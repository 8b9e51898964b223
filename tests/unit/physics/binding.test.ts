import { describe, expect, it } from 'vitest'
import { describeSpecies } from '../../../shared/physics/index'
import { bindingEnergies } from '../../../shared/physics/binding'
import { solveSpeciesAll } from '../../../shared/physics/scf/index'

// The bindingEnergies field that the beam planner reads: [{ subshell: "2p3/2", eV, method }].
describe('binding energies of every occupied nlj subshell', () => {
  const scf = solveSpeciesAll(26, 13, { densityPoints: 0 })
  const record = describeSpecies('Fe XIV', { scf })

  it('lists every nlj subshell of Fe13+ once, deepest first, in the agreed shape', () => {
    expect(record.bindingEnergies.map((b) => b.subshell)).toEqual(['1s1/2', '2s1/2', '2p1/2', '2p3/2', '3s1/2', '3p1/2'])
    for (const b of record.bindingEnergies) expect(Object.keys(b).sort()).toEqual(['eV', 'method', 'subshell'])
    const eV = record.bindingEnergies.map((b) => b.eV)
    expect([...eV].sort((a, b) => b - a)).toEqual(eV)
  })

  it('ties the outermost subshell to the NIST ASD ionisation energy and takes eigenvalues inside', () => {
    // NIST ASD, Fe XIV ionisation energy 392.2 eV (pymatgen periodic_table.json, carried in data/nist-asd.ts)
    expect(record.bindingEnergies.at(-1)).toEqual({ subshell: '3p1/2', eV: 392.2, method: 'nist-asd' })
    expect(record.bindingEnergies.slice(0, -1).every((b) => b.method === 'dirac-scf-eigenvalue')).toBe(true)
    // Fe 1s binding in highly ionised iron: between the neutral atom's K edge, 7112 eV (X-ray data
    // booklet, from memory), and the H-like Fe25+ 1s, 9278 eV (NIST ASD)
    expect(record.bindingEnergies[0].eV).toBeGreaterThan(7112)
    expect(record.bindingEnergies[0].eV).toBeLessThan(9278)
  })

  it('falls back to dirac-scf-delta where there is no reference value, and is empty without a solution', () => {
    const noReference = bindingEnergies(scf.dirac, null)
    expect(noReference.at(-1)!.method).toBe('dirac-scf-delta')
    expect(noReference.at(-1)!.eV).toBeCloseTo(scf.dirac!.deltaEv!, 3)
    expect(describeSpecies('Fe XIV').bindingEnergies).toEqual([])
    const bare = describeSpecies('H+', { scf: solveSpeciesAll(1, 1) })
    expect(bare.bindingEnergies).toEqual([])
  })

  it('gives the relativistic estimates beside the non-relativistic ones', () => {
    const methods = record.ionisationEnergy.estimates.map((e) => e.method)
    expect(methods).toContain('dirac-scf-delta')
    expect(methods).toContain('dirac-scf-eigenvalue')
    const delta = record.ionisationEnergy.estimates.find((e) => e.method === 'dirac-scf-delta')!
    expect(Math.abs(delta.deviationPercent!)).toBeLessThan(1.5)
  })
})
