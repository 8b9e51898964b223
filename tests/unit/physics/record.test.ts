import { describe, expect, it } from 'vitest'
import type { ScfSpeciesEstimates } from '../../../shared/physics/scf/types'
import { ENGINE_VERSION, METHOD_NAMES, SpeciesParseError, describeSpecies } from '../../../shared/physics/index'
import { PYMATGEN } from './fixtures'

// DESIGN §5 fixes these fields, in this order, at the head of every record.
const CONTRACT = [
  'input', 'z', 'symbol', 'charge', 'electrons', 'configuration', 'core', 'term', 'isoelectronic',
  'screening', 'ionisationEnergy', 'productionThreshold', 'engine',
]

describe('the JSON line of DESIGN §5, for its own example Fe XIV', () => {
  const r = describeSpecies('Fe XIV')

  it('starts with the contract fields in order', () => {
    expect(Object.keys(r).slice(0, CONTRACT.length)).toEqual(CONTRACT)
  })

  it('has the values DESIGN §5 shows', () => {
    expect(r).toMatchObject({
      input: 'Fe XIV', z: 26, symbol: 'Fe', charge: 13, electrons: 13,
      configuration: '1s2 2s2 2p6 3s2 3p1', core: '[Ne] 3s2 3p1', term: '2P°1/2', isoelectronic: 'Al-like',
    })
    expect(r.screening).toContainEqual({ subshell: '3p', nStar: 3, sigma: 9.5, zEff: 16.5 })
    // DESIGN §5 quotes 392.2 eV and 361.0 eV, the NIST ASD values for Fe XIV and Fe XIII.
    expect(r.ionisationEnergy.reference?.eV).toBe(392.2)
    expect(r.ionisationEnergy.reference?.source).toMatch(/NIST ASD/)
    expect(r.productionThreshold).toMatchObject({ eV: 361.0, from: 'Fe12+' })
    expect(r.productionThreshold?.source).toMatch(/NIST ASD/)
    expect(r.engine).toBe(ENGINE_VERSION)
    expect(ENGINE_VERSION).toMatch(/^\d+\.\d+\.\d+$/)
  })

  it('gives only model estimates, each with its deviation from the reference', () => {
    const { reference, estimates } = r.ionisationEnergy
    expect(estimates.map((e) => e.method)).toEqual(['slater-hydrogenic', 'slater-total-energy', 'dirac-hydrogen-like', 'dirac-qed-hydrogen-like'])
    for (const e of estimates.slice(0, 2)) {
      expect(METHOD_NAMES).toContain(e.method)
      expect(e.eV).not.toBe(reference?.eV)
      expect(e.deviationEv).toBeCloseTo(e.eV! - (reference?.eV ?? 0), 3)
      expect(e.deviationPercent).toBeCloseTo((100 * (e.eV! - (reference?.eV ?? 0))) / (reference?.eV ?? 1), 2)
    }
    // the one-electron methods say why they give no number, and give none
    for (const e of estimates.slice(2)) expect(e).toEqual({ method: e.method, eV: null, notApplicable: 'one-electron ions only' })
  })

  it('says its numbers are estimates and carries the page extras', () => {
    expect(r.caution).toMatch(/estimates/)
    expect(r.notations).toEqual({ ionic: 'Fe13+', spectroscopic: 'Fe XIV' })
    expect(r.unpaired).toBe(1)
    expect(r.orbitals.map((o) => o.subshell)).toEqual(['1s', '2s', '2p', '3s', '3p'])
    expect(r.terms).toEqual([{ label: '2P°', count: 1, J: ['1/2', '3/2'] }])
    expect(JSON.parse(JSON.stringify(r))).toEqual(r)
  })
})

describe('special species', () => {
  it('a bare nucleus: empty configuration and core, no term, screening or estimates; threshold from the H-like ion', () => {
    const r = describeSpecies('Fe26+')
    expect(r).toMatchObject({ configuration: '', core: '', term: null, isoelectronic: null, screening: [] })
    expect(r.ionisationEnergy).toEqual({ reference: null, estimates: [], nextElectron: null, notes: [] })
    // NIST ASD one-electron Fe ionisation energy (python3-pymatgen fixture).
    expect(r.productionThreshold?.eV).toBe(PYMATGEN[25].hydrogenLikeIonisationEv)
  })

  it('a one-electron ion gets the Dirac estimate with the isotope it names', () => {
    const natural = describeSpecies('Fe25+').ionisationEnergy.estimates.find((e) => e.method === 'dirac-hydrogen-like')
    const light = describeSpecies('54Fe25+').ionisationEnergy.estimates.find((e) => e.method === 'dirac-hydrogen-like')
    expect(natural?.basis).toMatch(/56Fe/)
    expect(light?.basis).toMatch(/54Fe/)
    expect((light?.eV ?? 0) < (natural?.eV ?? 0)).toBe(true)
    expect(describeSpecies('Fe24+').ionisationEnergy.estimates.find((e) => e.method === 'dirac-hydrogen-like')).toMatchObject({ eV: null, notApplicable: 'one-electron ions only' })
  })

  it('a neutral atom has no production threshold and shows the NIST ground level', () => {
    const r = describeSpecies('Fe')
    expect(r.productionThreshold).toBeNull()
    expect(r.productionThresholdNote).toBeTruthy()
    // NIST ASD via pymatgen: Fe [Ar] 3d6 4s2, 5D4
    expect(r.referenceGroundLevel).toMatchObject({ configuration: '[Ar] 3d6 4s2', level: '5D4' })
    expect(r.ionisationEnergy.reference?.eV).toBe(PYMATGEN[25].firstIonisationEv)
  })
})

// Electron affinities as pymatgen carries them (fixture); zero or negative means not bound.
describe('negative ions', () => {
  const bound = PYMATGEN.filter((e) => (e.electronAffinityEv ?? 0) > 0)
  const unbound = PYMATGEN.filter((e) => e.electronAffinityEv !== null && e.electronAffinityEv <= 0)

  it.each(bound.map((e) => [e.symbol, e.electronAffinityEv as number]))('%s- is bound by %f eV', (symbol, ea) => {
    const r = describeSpecies(`${symbol}-`)
    expect(r.electronAffinity).toMatchObject({ bound: true, eV: ea })
    expect(r.ionisationEnergy.reference?.eV).toBe(ea)
    expect(r.productionThreshold).toBeNull()
    expect(r.productionThresholdNote).toMatch(/charge exchange or sputtering/)
  })

  it('lists N, Be, Mg and the noble gases among the unbound', () => {
    expect(unbound.map((e) => e.symbol)).toEqual(expect.arrayContaining(['N', 'Be', 'Mg', 'He', 'Ne', 'Ar', 'Kr', 'Xe', 'Rn']))
  })

  it.each(unbound.map((e) => [e.symbol]))('%s- is not bound', (symbol) => {
    const r = describeSpecies(`${symbol}-`)
    expect(r.electronAffinity).toMatchObject({ bound: false, statement: 'not bound' })
    expect(r.ionisationEnergy.reference).toBeNull()
    expect(r.caution).toMatch(/negative ion/)
  })
})

describe('options', () => {
  it('runs only the methods asked for, and refuses unknown ones', () => {
    const r = describeSpecies('Fe XIV', { methods: ['slater-total-energy'] })
    expect(r.ionisationEnergy.estimates.map((e) => e.method)).toEqual(['slater-total-energy'])
    expect(() => describeSpecies('Fe', { methods: ['guess'] })).toThrow(/unknown method 'guess'; known: slater-hydrogenic/)
  })

  it('passes parse errors through', () => {
    expect(() => describeSpecies('Fe27+')).toThrow(SpeciesParseError)
  })

  // A made-up solver result: the record must copy these numbers, whatever they are.
  const orbital = (n: number, l: number, zEffMeanRadius: number) => ({
    n, l, occupation: 2, energyHartree: -1, rMean: 1, r2Mean: 1, zEffMeanRadius,
  })
  const scf = (converged: boolean, deltaEv: number | null, eigenvalueEv: number | null): ScfSpeciesEstimates => ({
    species: { method: 'test-method', z: 26, charge: 13, converged, iterations: 10, totalEnergyHartree: -1,
      orbitals: [orbital(1, 0, 25.9), orbital(3, 1, 18.1)], failure: converged ? undefined : 'too many iterations' },
    next: null,
    deltaEv,
    eigenvalueEv,
  })

  it('adds the SCF estimates and mean-radius Z_eff when given', () => {
    const r = describeSpecies('Fe XIV', { scf: scf(true, 390.5, 387.2) })
    const byMethod = Object.fromEntries(r.ionisationEnergy.estimates.map((e) => [e.method, e.eV]))
    expect(byMethod['scf-delta']).toBe(390.5)
    expect(byMethod['scf-eigenvalue']).toBe(387.2)
    expect(r.screening.find((s) => s.subshell === '3p')?.zEffMeanRadius).toBe(18.1)
    expect(r.screening.find((s) => s.subshell === '2p')?.zEffMeanRadius).toBeUndefined()
  })

  it('gives no number for null SCF estimates, says why, and notes a failed solve', () => {
    const r = describeSpecies('Fe XIV', { scf: scf(false, null, null) })
    for (const e of r.ionisationEnergy.estimates.filter((x) => x.method.startsWith('scf'))) {
      expect(e).toMatchObject({ eV: null, notApplicable: expect.stringMatching(/no converged self-consistent solution/) })
    }
    expect(r.ionisationEnergy.estimates.filter((x) => x.method.startsWith('scf'))).toHaveLength(2)
    expect(r.ionisationEnergy.notes.join(' ')).toMatch(/did not converge: too many iterations/)
    expect(r.screening.some((s) => s.zEffMeanRadius !== undefined)).toBe(false)
  })
})

describe('every species from H to element 118, charge −1 to bare nucleus', () => {
  it('describes each without throwing, with consistent electron counts, and no non-positive energy', () => {
    let count = 0
    for (let z = 1; z <= 118; z++) {
      for (let charge = -1; charge <= z; charge++) {
        const r = describeSpecies({ input: `${z}:${charge}`, z, symbol: '', charge, massNumber: null })
        expect(r.electrons).toBe(z - charge)
        const fromText = r.configuration.split(' ').filter(Boolean).reduce((s, t) => s + Number(/\d+$/.exec(t)?.[0]), 0)
        expect(fromText).toBe(z - charge)
        expect(r.screening.length).toBe(r.orbitals.length)
        for (const e of r.ionisationEnergy.estimates) expect(e.eV === null ? typeof e.notApplicable === 'string' : Number.isFinite(e.eV) && e.eV > 0).toBe(true)
        count++
      }
    }
    expect(count).toBe(7021 + 2 * 118)
  }, 60_000)
})

describe('the record uses the methods as methods.ts defines them', () => {
  it('for every species with electrons, Slater estimates equal the stand-alone functions', async () => {
    const { slaterHydrogenicEv, slaterTotalEnergyEv } = await import('../../../shared/physics/methods')
    const { groundConfiguration, nextElectronSubshell } = await import('../../../shared/physics/configuration')
    for (let z = 1; z <= 118; z++) {
      for (let charge = -1; charge < z; charge++) {
        const r = describeSpecies({ input: '', z, symbol: '', charge, massNumber: null })
        const shells = groundConfiguration(z, charge).subshells
        const next = nextElectronSubshell(z, charge)
        if (!next) throw new Error('no next electron')
        const [hydrogenic, total] = r.ionisationEnergy.estimates
        // The record rounds to nine significant figures; where it gives no number, the domain or a
        // non-positive energy is why.
        const close = (e: typeof hydrogenic, b: number) => {
          if (e.eV === null) expect(charge < 0 || z - charge === 1 || b <= 0).toBe(true)
          else expect(Math.abs(e.eV - b)).toBeLessThanOrEqual(1e-8 * Math.abs(b) + 1e-12)
        }
        close(hydrogenic, slaterHydrogenicEv(z, shells, next))
        close(total, slaterTotalEnergyEv(z, shells, groundConfiguration(z, charge + 1).subshells))
      }
    }
  })
})
