import { describe, expect, it } from 'vitest'
import { describeSpecies, referenceIonisationEv } from '../../../shared/physics/index'
import { selfEnergyF2s, selfEnergyShift1s, selfEnergyShift2s } from '../../../shared/physics/qed/self-energy'
import { qedEnergy } from '../../../shared/physics/scf/dirac-qed'
import { runDirac } from '../../../shared/physics/scf/dirac-scf'
import { solveSpeciesAll, solveSpeciesDirac } from '../../../shared/physics/scf/index'
import { HARTREE_EV } from '../../../shared/physics/scf/species'
import { parseConfiguration } from '../../../shared/physics/subshells'

const ME_EV = 510998.95
const settings = (z: number) => ({ massNumber: Math.round(2.5 * z), rMax: 20, densityPoints: 0, jSplit: 'jj' as const })
const qedOf = (z: number, configuration: string) => qedEnergy(runDirac(z, parseConfiguration(configuration), settings(z)))!

describe('the 2s self-energy table (Shabaev, Tupitsyn and Yerokhin, Phys. Rev. A 88, 012513 (2013))', () => {
  // the tabulated points (point nucleus + nuclear-size part, as printed in QEDMOD's fse_dat.f) come back exactly
  it.each([
    [20, 3.5066469903 - 0.0001020626],
    [50, 2.2243367444 - 0.0010752132],
    [90, 2.1668847406 - 0.0237389688],
  ])('F(Z = %i) = %f at a tabulated point', (z, f) => {
    expect(selfEnergyF2s(z)).toBeCloseTo(f, 9)
  })

  it('between the points stays between its neighbours where F is monotonic', () => {
    for (let z = 11; z < 65; z++) if (z % 5) expect(selfEnergyF2s(z)).toBeLessThan(selfEnergyF2s(z - 1))
    for (let z = 81; z < 120; z++) if (z % 5) expect(selfEnergyF2s(z)).toBeGreaterThan(selfEnergyF2s(z - 1))
  })
})

describe('screened QED from the Dirac–Kohn–Sham orbitals', () => {
  // A one-electron ion's orbital is the hydrogenic one: the scaling must give back the bare
  // self-energy, and the Uehling average the one-electron module's (qed/uehling.ts, tested
  // against the published U⁹¹⁺ value in tests/unit/physics/qed.test.ts).
  it('gives the hydrogenic self-energy and Uehling shift for a one-electron ion (U⁹¹⁺)', () => {
    const q = qedOf(92, '1s1')
    expect(q.selfEnergyHartree * HARTREE_EV).toBeCloseTo(selfEnergyShift1s(92) * ME_EV, 2)
    const u91 = describeSpecies('238U91+').ionisationEnergy.estimates.find((e) => e.method === 'dirac-qed-hydrogen-like')!
    const uehling = -u91.corrections!.find((c) => c.name === 'vacuum polarisation (Uehling)')!.eV
    expect(Math.abs(q.vacuumPolarisationHartree * HARTREE_EV - uehling) / Math.abs(uehling)).toBeLessThan(0.005)
  })

  // Screening lowers each electron's density at the nucleus: per electron the self-energy lies
  // between the bare one of Z and that of the screened charge (Z − 1 for the 1s pair, Z − 2 for
  // 2s outside it) — the two limits of the density scaling (common practice, no source).
  it.each([18, 54, 92])('Z = %i: 1s² and 1s² 2s self-energies lie between the bare and the fully screened ones', (z) => {
    const he = qedOf(z, '1s2').selfEnergyHartree * HARTREE_EV
    expect(he / 2).toBeLessThan(selfEnergyShift1s(z) * ME_EV)
    expect(he / 2).toBeGreaterThan(selfEnergyShift1s(z - 1) * ME_EV)
    const li = qedOf(z, '1s2 2s1').selfEnergyHartree * HARTREE_EV - he
    expect(li).toBeLessThan(selfEnergyShift2s(z) * ME_EV)
    expect(li).toBeGreaterThan(selfEnergyShift2s(z - 2) * ME_EV * 0.9)
  })
})

// NIST ASD ionisation energies of He- and Li-like ions (the engine's reference data, from
// python3-pymatgen's periodic_table.json); for the heavy ones these are themselves QED calculations (NIST's
// parenthesised values), here a published reference either way.
describe('dirac-scf-delta-qed against NIST ASD', () => {
  const percent = (z: number, electrons: number, method: string) => {
    const charge = z - electrons
    const r = describeSpecies({ input: '', z, symbol: '', charge, massNumber: null }, { methods: [method], scf: solveSpeciesAll(z, charge, { densityPoints: 0 }) })
    const e = r.ionisationEnergy.estimates[0]!
    const reference = referenceIonisationEv(z, charge)!
    return (100 * (e.eV! - reference)) / reference
  }

  it.each([10, 18, 36, 54, 82, 92])('He-like, Z = %i: closer to NIST than the ΔSCF without QED', (z) => {
    expect(Math.abs(percent(z, 2, 'dirac-scf-delta-qed'))).toBeLessThan(Math.abs(percent(z, 2, 'dirac-scf-delta')))
  })

  it('He-like U⁹⁰⁺: within 0.3 % (0.46 % without QED)', () => {
    expect(Math.abs(percent(92, 2, 'dirac-scf-delta-qed'))).toBeLessThan(0.3)
  })

  // Li-like: the local exchange between 2s and the 1s pair leaves the ΔSCF about 0.1 % low at
  // high Z, as large as the QED itself, which then moves the estimate further down: both kept
  // within 0.2 %, and the page leads with whichever the bench finds better for Li-like ions.
  it.each([18, 36, 54, 82, 92])('Li-like, Z = %i: within 0.2 %', (z) => {
    expect(Math.abs(percent(z, 3, 'dirac-scf-delta-qed'))).toBeLessThan(0.2)
  })

  it('shows the two corrections with their sizes in eV, summing to the difference from dirac-scf-delta', () => {
    const scf = solveSpeciesAll(92, 89, { densityPoints: 0 })
    const r = describeSpecies('U89+', { scf })
    const qed = r.ionisationEnergy.estimates.find((e) => e.method === 'dirac-scf-delta-qed')!
    const plain = r.ionisationEnergy.estimates.find((e) => e.method === 'dirac-scf-delta')!
    expect(qed.corrections!.map((c) => c.name)).toEqual(['self-energy (screened)', 'vacuum polarisation (Uehling, screened)'])
    expect(qed.eV! - plain.eV!).toBeCloseTo(qed.corrections!.reduce((s, c) => s + c.eV, 0), 3)
    // the 2s self-energy lowers the ionisation energy by tens of eV, vacuum polarisation raises it
    expect(qed.corrections![0]!.eV).toBeLessThan(-40)
    expect(qed.corrections![1]!.eV).toBeGreaterThan(5)
  })

  it('is not applicable outside He- and Li-like ions or below Z = 10', () => {
    const fe = describeSpecies('Fe XIV', { scf: solveSpeciesAll(26, 13, { densityPoints: 0 }) })
    expect(fe.ionisationEnergy.estimates.find((e) => e.method === 'dirac-scf-delta-qed')).toMatchObject({ eV: null, notApplicable: expect.stringMatching(/He- and Li-like/) })
    const c = describeSpecies('C4+', { scf: solveSpeciesAll(6, 4, { densityPoints: 0 }) })
    expect(c.ionisationEnergy.estimates.find((e) => e.method === 'dirac-scf-delta-qed')).toMatchObject({ eV: null, notApplicable: expect.stringMatching(/Z ≥ 10/) })
    expect(solveSpeciesDirac(6, 4, { densityPoints: 0 }).screenedQed).toBeUndefined()
  })
})
