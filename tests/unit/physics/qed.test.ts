import { describe, expect, it } from 'vitest'
import { describeSpecies } from '../../../shared/physics/index'
import { COMPTON_FM, finiteSizeShift1s, nuclearRadius } from '../../../shared/physics/qed/nucleus'
import { selfEnergyF1s, selfEnergyShift1s } from '../../../shared/physics/qed/self-energy'
import { uehlingShift1s } from '../../../shared/physics/qed/uehling'
import { runDirac } from '../../../shared/physics/scf/dirac-scf'
import { rmsRadiusFm } from '../../../shared/physics/scf/nucleus'
import { parseConfiguration } from '../../../shared/physics/subshells'
import { PYMATGEN } from './fixtures'

const ALPHA = 7.2973525693e-3
const ME = 510998.95
const qed = (species: string) => describeSpecies(species).ionisationEnergy.estimates.find((e) => e.method === 'dirac-qed-hydrogen-like')!
const correction = (species: string, name: string) => qed(species).corrections!.find((c) => c.name === name)!.eV

describe('dirac-qed-hydrogen-like against NIST ASD', () => {
  // Reference: NIST ASD one-electron ionisation energies as carried by python3-pymatgen 2022.11.7
  // (tests/fixtures/reference/pymatgen-elements.json). Target of issue 11: within 0.01 %.
  it('is within 0.01 % of NIST for every one-electron ion Z = 1–92', () => {
    for (let z = 1; z <= 92; z++) {
      const reference = PYMATGEN[z - 1].hydrogenLikeIonisationEv
      if (reference === null) continue
      const r = describeSpecies({ input: '', z, symbol: '', charge: z - 1, massNumber: null })
      const e = r.ionisationEnergy.estimates.find((x) => x.method === 'dirac-qed-hydrogen-like')!
      expect(Math.abs(e.eV! - reference) / reference, `Z = ${z}`).toBeLessThan(1e-4)
    }
  }, 60_000)

  it('is closer to NIST than the point-nucleus Dirac energy from Z = 10 up', () => {
    for (const z of [10, 30, 50, 70, 92]) {
      const reference = PYMATGEN[z - 1].hydrogenLikeIonisationEv!
      const r = describeSpecies({ input: '', z, symbol: '', charge: z - 1, massNumber: null }).ionisationEnergy.estimates
      const dirac = r.find((x) => x.method === 'dirac-hydrogen-like')!.eV!
      const full = r.find((x) => x.method === 'dirac-qed-hydrogen-like')!.eV!
      expect(Math.abs(full - reference)).toBeLessThan(Math.abs(dirac - reference) / 10)
    }
  })

  it('shows each correction with its size in eV and its source', () => {
    const e = qed('U91+')
    expect(e.corrections!.map((c) => c.name)).toEqual(['finite nuclear size', 'self-energy', 'vacuum polarisation (Uehling)'])
    for (const c of e.corrections!) expect(c.source).toMatch(/\(\d{4}\)/)
    const dirac = describeSpecies('U91+').ionisationEnergy.estimates.find((x) => x.method === 'dirac-hydrogen-like')!.eV!
    expect(e.eV! - dirac).toBeCloseTo(e.corrections!.reduce((s, c) => s + c.eV, 0), 2)
  })
})

describe('the 1s Lamb shift of U⁹¹⁺ (²³⁸U)', () => {
  // Published theoretical total 463.95 eV, quoted by A. Gumberidze et al., Phys. Rev. Lett. 94,
  // 223001 (2005) (from memory); it also holds Wichmann–Kroll, two-loop, recoil and nuclear
  // polarisation terms (together about +3.4 eV) that this engine leaves out. Target: within 1 %.
  it('is within 1 % of the published total', () => {
    const lamb = -qed('238U91+').corrections!.reduce((s, c) => s + c.eV, 0)
    expect(Math.abs(lamb - 463.95) / 463.95).toBeLessThan(0.01)
  })

  // Separate contributions for ²³⁸U, 1s, as tabulated by V. A. Yerokhin and V. M. Shabaev,
  // J. Phys. Chem. Ref. Data 44, 033103 (2015) (values from memory): nuclear size 198.8 eV,
  // one-loop self-energy 355.05 eV, Uehling vacuum polarisation −93.35 eV.
  it.each([
    ['finite nuclear size', -198.8, 0.01],
    ['self-energy', -355.05, 0.005],
    ['vacuum polarisation (Uehling)', 93.35, 0.01],
  ])('%s ≈ %f eV of binding', (name, published, tolerance) => {
    const value = correction('238U91+', name)
    expect(Math.abs(value - published) / Math.abs(published)).toBeLessThan(tolerance)
  })
})

describe('the separate corrections in their known limits', () => {
  // P. J. Mohr, Phys. Rev. A 46, 4421 (1992): F(Zα) = 10.316 793 for hydrogen 1s (from memory).
  it('self-energy function F(1) of hydrogen', () => {
    expect(selfEnergyF1s(1)).toBeCloseTo(10.31679, 3)
  })

  // Tabulated F(Zα) of V. M. Shabaev, I. I. Tupitsyn, V. A. Yerokhin, Phys. Rev. A 88, 012513 (2013):
  // the interpolation passes through the table and stays between its neighbours.
  it('passes through the tabulated F(Zα) and interpolates smoothly between', () => {
    expect(selfEnergyF1s(20)).toBeCloseTo(3.2462, 4)
    expect(selfEnergyF1s(90)).toBeCloseTo(1.4721, 4)
    expect(selfEnergyF1s(25)).toBeLessThan(3.2462)
    expect(selfEnergyF1s(25)).toBeGreaterThan(2.5518)
    expect(selfEnergyShift1s(92) * ME).toBeGreaterThan(0)
  })

  // Uehling's 1s shift tends to −(4/15)(α/π)(Zα)⁴ m c² (E. A. Uehling, Phys. Rev. 48, 55 (1935);
  // the leading term in M. I. Eides, H. Grotch and V. A. Shelyuto, Phys. Rep. 342, 63 (2001)).
  it('Uehling shift of hydrogen in the point-nucleus, low-Z limit', () => {
    const x = ALPHA
    const h = uehlingShift1s(1, 0.8783, COMPTON_FM) / ((ALPHA / Math.PI) * x ** 4)
    expect(h).toBeCloseTo(-4 / 15 + ((5 * Math.PI) / 48) * x, 3)
  })

  // Leading finite-size shift of an s level: (2/3)(Zα)⁴ (R_rms m c/ħ)² m c² / n³ (L. L. Foldy;
  // e.g. Eides, Grotch and Shelyuto, Phys. Rep. 342, 63 (2001)); Shabaev's form must reduce to it.
  it('Shabaev finite-size shift reduces to the non-relativistic leading term at low Z', () => {
    const r = nuclearRadius(1, 1).rmsFm / COMPTON_FM
    expect(finiteSizeShift1s(ALPHA, nuclearRadius(1, 1).rmsFm) / ((2 / 3) * ALPHA ** 4 * r * r)).toBeCloseTo(1, 2)
  })

  // The coefficients of f(αZ) are from memory; Shabaev states his closed form reproduces the
  // shift of a uniformly charged sphere to about 0.2 % for Z = 1–100 (abstract of J. Phys. B 26,
  // 1103 (1993)). Our Dirac solver gives that shift directly: the 1s energy with the sphere minus
  // the point-nucleus one (the solver matches the exact Dirac energies, tests/unit/scf/dirac.test.ts).
  // Below Z ≈ 30 the shift is under 1e-8 of the energy, past the solver's precision.
  it.each([
    [36, 84],
    [50, 120],
    [70, 174],
    [82, 208],
    [92, 238],
    [100, 257],
  ])('Shabaev finite-size shift of Z = %i (A = %i) agrees with the Dirac solver\'s uniform sphere within 0.2 %', (z, a) => {
    const options = { massNumber: a, densityPoints: 0, rMax: 10 / z, tolerance: 1e-12 }
    const energy = (nucleus: 'finite' | 'point') => runDirac(z, parseConfiguration('1s1'), { ...options, nucleus }).totalEnergy
    const solved = (energy('finite') - energy('point')) * ALPHA * ALPHA // hartree → m c²
    expect(Math.abs(finiteSizeShift1s(ALPHA * z, rmsRadiusFm(a)) / solved - 1)).toBeLessThan(0.002)
  })

  it('uses the Johnson–Soff radius formula for nuclides not in its table', () => {
    expect(nuclearRadius(50, 118)).toMatchObject({ rmsFm: expect.closeTo(0.836 * Math.cbrt(118) + 0.57, 9), source: expect.stringMatching(/Johnson and G. Soff/) })
  })
})
