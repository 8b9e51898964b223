import { describe, expect, it } from 'vitest'
import { groundConfiguration } from '../../../shared/physics/configuration'
import {
  CODATA_2018,
  METHODS,
  SLATER_RYDBERG_EV,
  diracHydrogenLikeEv,
  nuclearMass,
  slaterHydrogenicEv,
  slaterTotalEnergyEv,
} from '../../../shared/physics/methods'
import { PYMATGEN } from './fixtures'

describe('constants', () => {
  // CODATA 2018 (E. Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)): 1/α = 137.035999084,
  // m_e c² = 0.51099895000 MeV, m_u c² = 931.49410242 MeV.
  it('are the CODATA 2018 values', () => {
    expect(1 / CODATA_2018.fineStructure).toBeCloseTo(137.035999084, 6)
    expect(CODATA_2018.electronMassEv).toBe(510998.95)
    expect(CODATA_2018.atomicMassUnitEv).toBe(931494102.42)
    expect(SLATER_RYDBERG_EV).toBe(13.6057) // DESIGN §5
  })

  it('names every method with a description and a citation', () => {
    expect(METHODS.map((m) => m.name)).toEqual([
      'slater-hydrogenic',
      'slater-total-energy',
      'dirac-hydrogen-like',
      'scf-delta',
      'scf-eigenvalue',
      'dirac-qed-hydrogen-like',
      'dirac-scf-delta',
      'dirac-scf-eigenvalue',
      'dirac-lsd-delta',
      'dirac-scf-delta-qed',
      'hf-delta',
      'hf-correlated-delta',
    ])
    for (const m of METHODS) {
      expect(m.description.length).toBeGreaterThan(20)
      expect(m.citation).toMatch(/\b(19|20)\d\d\b/)
    }
  })
})

// NIST ASD one-electron ionisation energies as carried by pymatgen (fixture), Z = 1–103.
describe('dirac-hydrogen-like against NIST ASD (python3-pymatgen 2022.11.7)', () => {
  const withReference = PYMATGEN.filter((e) => e.hydrogenLikeIonisationEv !== null)
  const deviation = (z: number, reference: number) => (diracHydrogenLikeEv(z, nuclearMass(z, null).eV) - reference) / reference

  it('has a reference for every Z up to 103', () => expect(withReference.length).toBe(103))

  it.each(withReference.filter((e) => e.z < 50).map((e) => [e.symbol, e.z, e.hydrogenLikeIonisationEv as number]))(
    '%s (Z = %i): within 0.1 %% of %f eV',
    (_, z, reference) => {
      expect(Math.abs(deviation(z, reference))).toBeLessThan(1e-3)
    },
  )

  // From Sn on, the 1s Lamb shift and the finite size of the nucleus — both left out of the
  // point-nucleus Dirac formula and both lowering the binding (common practice, no source) —
  // exceed 0.1 %; they stay under 1 % of the binding up to Lr (from memory).
  it.each(withReference.filter((e) => e.z >= 50).map((e) => [e.symbol, e.z, e.hydrogenLikeIonisationEv as number]))(
    '%s (Z = %i): above %f eV by less than 1 %%',
    (_, z, reference) => {
      const d = deviation(z, reference)
      expect(d).toBeGreaterThan(0)
      expect(d).toBeLessThan(1e-2)
    },
  )

  // The measured 1s Lamb shift of U⁹¹⁺, 460.2 ± 4.6 eV (A. Gumberidze et al., Phys. Rev. Lett. 94,
  // 223001 (2005), from memory), is what separates the point-nucleus Dirac energy from NIST's value.
  it('leaves for U⁹¹⁺ the measured ground-state Lamb shift', () => {
    const u = PYMATGEN[91].hydrogenLikeIonisationEv as number
    const gap = diracHydrogenLikeEv(92, nuclearMass(92, 238).eV) - u
    expect(Math.abs(gap - 460.2)).toBeLessThan(2 * 4.6)
  })

  it('applies the reduced mass: deuterium binds more than protium by m_e/m_p · E ≈ 3.7 meV', () => {
    const h = diracHydrogenLikeEv(1, nuclearMass(1, 1).eV)
    const d = diracHydrogenLikeEv(1, nuclearMass(1, 2).eV)
    // Written out from the reduced-mass formula with the chemical-elements masses of 1H and 2H.
    const mp = 1.00782503223 * CODATA_2018.atomicMassUnitEv - CODATA_2018.electronMassEv
    const md = 2.01410177812 * CODATA_2018.atomicMassUnitEv - CODATA_2018.electronMassEv
    const me = CODATA_2018.electronMassEv
    expect(d / h).toBeCloseTo((md / (me + md)) / (mp / (me + mp)), 12)
    expect(d - h).toBeGreaterThan(3.6e-3)
    expect(d - h).toBeLessThan(3.8e-3)
  })

  it('chooses the nuclear mass as documented', () => {
    expect(nuclearMass(26, null).basis).toBe('most abundant isotope 56Fe')
    expect(nuclearMass(26, 54).basis).toBe('isotope 54Fe')
    expect(nuclearMass(43, null).basis).toBe('reference isotope 98Tc')
    expect(nuclearMass(26, 56).eV).toBeCloseTo(55.93493633 * 931494102.42 - 26 * 510998.95, 0)
  })
})

describe('Slater estimates, against sums written out by hand', () => {
  it('slater-hydrogenic: H is 13.6057 eV, Na 3s is 13.6057 (2.2/3)² eV', () => {
    expect(slaterHydrogenicEv(1, groundConfiguration(1, 0).subshells, { n: 1, l: 0 })).toBeCloseTo(13.6057, 10)
    expect(slaterHydrogenicEv(11, groundConfiguration(11, 0).subshells, { n: 3, l: 0 })).toBeCloseTo(13.6057 * (2.2 / 3) ** 2, 10)
  })

  it('slater-total-energy: He → He⁺ is 13.6057 (2 · 1.7² − 2²) eV', () => {
    const he = groundConfiguration(2, 0).subshells
    const heIon = groundConfiguration(2, 1).subshells
    expect(slaterTotalEnergyEv(2, he, heIon)).toBeCloseTo(13.6057 * (2 * 1.7 ** 2 - 4), 10)
  })

  it('slater-total-energy: Li → Li⁺ is 13.6057 (1.3²/4) eV, the 1s pair being unchanged', () => {
    const li = groundConfiguration(3, 0).subshells
    const liIon = groundConfiguration(3, 1).subshells
    // Li 2s: σ = 2 · 0.85, Z_eff = 1.3, n* = 2; the 1s electrons see each other only.
    expect(slaterTotalEnergyEv(3, li, liIon)).toBeCloseTo(13.6057 * (1.3 ** 2 / 4), 10)
  })
})
