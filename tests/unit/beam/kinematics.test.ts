import { describe, expect, it } from 'vitest'
import { energyForms, ionMass, motion, rigidity } from '../../../shared/beam/index'

describe('rigidity and velocity (hand calculation written out)', () => {
  it('208Pb54+ at 4.2 MeV/u', () => {
    // By hand: atomic mass of 208Pb 207.9766525 u (NIST via chemical-elements) less 54 electrons of
    // 5.48579909065e-4 u (CODATA 2018) → 207.94703 u; T = 4.2 × 207.94703 = 873.3775 MeV;
    // Mc² = 207.94703 × 931.49410242 = 193 701.43 MeV; pc = √(T² + 2TMc²) = 18 414.99 MeV;
    // Bρ = pc / (299.792458 × 54) = 1.137515 T·m; γ = 1 + T/Mc² = 1.0045089; β = 0.0946422;
    // Eρ = pc β / 54 = 32.2747 MV.
    const r = rigidity(82, 208, 54, 4.2 * ionMass(82, 208, 54).ionMassU)
    expect(r.tm).toBeCloseTo(1.137515, 5)
    expect(r.mv).toBeCloseTo(32.2747, 3)
    expect(r.beta).toBeCloseTo(0.0946422, 6)
    expect(r.gamma).toBeCloseTo(1.0045089, 6)
  })

  it('a proton at 1 GeV has the textbook momentum 1.696 GeV/c and Bρ 5.657 T·m (from memory)', () => {
    const m = motion(1000, 938.27208816)
    expect(m.pcMeV).toBeCloseTo(1696.0, 0)
    expect(m.pcMeV / 299.792458).toBeCloseTo(5.657, 2)
  })

  it('converts MeV/u, total MeV and MeV/nucleon into each other', () => {
    const mass = ionMass(20, 48, 10)
    const a = energyForms(5, 'MeV/u', mass)
    expect(a.totalMeV).toBeCloseTo(5 * mass.ionMassU, 9)
    const b = energyForms(a.totalMeV, 'MeV', mass)
    expect(b.mevPerU).toBeCloseTo(5, 12)
    const c = energyForms(b.mevPerNucleon, 'MeV/nucleon', mass)
    expect(c.totalMeV).toBeCloseTo(a.totalMeV, 9)
    expect(c.mevPerNucleon * 48).toBeCloseTo(a.totalMeV, 9)
  })

  it('takes the removed electrons off the atomic mass', () => {
    const neutral = ionMass(82, 208, 0)
    const ion = ionMass(82, 208, 27)
    expect(neutral.ionMassU - ion.ionMassU).toBeCloseTo(27 * 5.48579909065e-4, 12) // CODATA 2018 electron mass in u
    expect(ion.note).toMatch(/binding energies ignored/)
  })
})
