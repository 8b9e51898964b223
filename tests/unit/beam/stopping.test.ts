import { describe, expect, it } from 'vitest'
import { blochCorrection, effectiveCharge, motion, parseMedium, protonStopping, stripPlan } from '../../../shared/beam/index'

describe('Bethe proton stopping', () => {
  it('10 MeV protons in water: 45.67 MeV cm²/g (NIST PSTAR, electronic stopping, I = 75 eV — from memory) within 2 %', () => {
    const beta = motion(10, 938.27208816).beta
    const s = protonStopping(beta, 0.55509, 75) // Z/A of H2O: 10/18.015
    expect(Math.abs(s / 45.67 - 1)).toBeLessThan(0.02)
  })

  it('5 MeV alpha particles in water through the effective charge: 0.889 MeV cm²/mg (NIST ASTAR, electronic — from memory) within 10 %', () => {
    const m = motion(5, 4.001506179 * 931.49410242) // alpha mass, CODATA 2018
    const z = effectiveCharge(2, m.vOverV0)
    const s = (z * z * protonStopping(m.beta, 0.55509, 75)) / 1000
    expect(Math.abs(s / 0.889 - 1)).toBeLessThan(0.1)
  })

  it("Bloch's correction tends to −1.202 y² for small y (ζ(3) = 1.2020569, Bloch 1933)", () => {
    expect(blochCorrection(0.001) / 1e-6).toBeCloseTo(-1.2020569, 4)
  })

  it('reads media and applies the Bragg rule to compounds', () => {
    const c = parseMedium('C')
    expect(c).toMatchObject({ phase: 'solid', iEv: 78 })
    expect(parseMedium('N2').phase).toBe('gas')
    const ch2 = parseMedium('CH2')
    expect(ch2.iEv).toBeGreaterThan(19.2)
    expect(ch2.iEv).toBeLessThan(78)
    expect(ch2.notes.join(' ')).toMatch(/Bragg/)
  })
})

describe('energy loss in the foil', () => {
  it('grows with the areal density and is not estimated below 1 MeV/u', () => {
    const thin = stripPlan({ ion: '208Pb27+', energy: 4.2, medium: 'C', arealDensityUgCm2: 20 }).energyLoss!
    const thick = stripPlan({ ion: '208Pb27+', energy: 4.2, medium: 'C', arealDensityUgCm2: 200 }).energyLoss!
    expect(thin.estimated && thick.estimated).toBe(true)
    if (thin.estimated && thick.estimated) {
      expect(thick.lossMeV / thin.lossMeV).toBeGreaterThan(9)
      expect(thick.lossMeV / thin.lossMeV).toBeLessThan(11)
      expect(thin.uncertainty).toBeGreaterThan(0)
    }
    const slow = stripPlan({ ion: '12C1-', energy: 0.21, medium: 'Ar', gas: true, arealDensityUgCm2: 5 }).energyLoss!
    expect(slow).toMatchObject({ estimated: false })
    if (!slow.estimated) expect(slow.reason).toMatch(/not estimated here/)
  })

  it('warns above ~100 MeV/u, where the density effect it leaves out begins to matter (the bound stated in stopping.ts)', () => {
    const fast = stripPlan({ ion: '208Pb82+', energy: 500, medium: 'C', arealDensityUgCm2: 50 }).energyLoss
    expect(fast?.estimated && fast.warnings.join(' ')).toMatch(/density effect/)
    const slow = stripPlan({ ion: '208Pb27+', energy: 4.2, medium: 'C', arealDensityUgCm2: 20 }).energyLoss
    expect(slow?.estimated && slow.warnings.join(' ')).not.toMatch(/density effect/)
  })
})
