import { describe, expect, it } from 'vitest'
import { gaussianFractions, sayerFractions, stripPlan } from '../../../shared/beam/index'

// Measured or operated equilibrium charge states, each with its source. All recalled, so marked
// "from memory"; the tolerance is ±3 charges, about the spread the papers give for heavy ions
// (Sayer 1977's abstract: rms 0.5 in q₀ and 4 % in q₀/Z; Schiwietz & Grande 2001 ~2–3 % in q̄, from memory).
const MEASURED = [
  {
    ion: '208Pb27+', energy: 4.2, medium: 'C', charge: 54,
    source: 'CERN Linac3: Pb27+ at 4.2 MeV/u stripped to Pb54+ in a carbon foil, LHC Design Report Vol. III, CERN-2004-003 (2004) — from memory',
  },
  {
    ion: '238U28+', energy: 11.4, medium: 'C', charge: 73,
    source: 'GSI UNILAC: U28+ at 11.4 MeV/u stripped to U73+ in a carbon foil for SIS18 injection — from memory',
  },
]

describe.each(MEASURED)('equilibrium charge of $ion at $energy MeV/u in $medium', (row) => {
  const plan = stripPlan({ ion: row.ion, energy: row.energy, medium: row.medium })
  it.each(plan.models.map((m) => [m.model, m] as const))(`%s is within 3 charges of ${row.charge}+ (${row.source})`, (_name, model) => {
    expect(Math.abs(model.meanCharge - row.charge)).toBeLessThanOrEqual(3)
    expect(Math.abs(model.mostProbable - row.charge)).toBeLessThanOrEqual(3)
  })
})

// Worked values of the 2004 solid-target formula, computed by hand (a calculator, not this code)
// from the formula as carried by TREKIS-4 and catima (see shared/beam/schiwietz-grande.ts):
//   v̂ = Zp^−0.543 v/v₀, c₁ = 1 − 0.26 exp(−Zt/11 − (Zt − Zp)²/9), c₂ = 1 + 0.03 v̂ ln Zt,
//   x = c₁ [v̂/(1.54 c₂)]^(1 + 1.83/Zp), q̄ = Zp (8.29x + x⁴)/(0.06/x + 4 + 7.4x + x⁴),
// with v/v₀ = β/α from the ion's mass (AME masses; α from CODATA 2018).
describe('Schiwietz et al. 2004 (Nucl. Instrum. Methods B 225, 4): worked values in carbon', () => {
  it.each([
    // ²⁰⁸Pb²⁷⁺ at 4.2 MeV/u: v/v₀ = 12.96939, v̂ = 1.18500, c₁ = 1.00000, c₂ = 1.06370, x = 0.71819
    { ion: '208Pb27+', energy: 4.2, vOverV0: 12.96939, mean: 52.775 },
    // ¹⁶O at 1 MeV/u, where the target term matters: v/v₀ = 6.34469, v̂ = 2.05131, c₁ = 0.90338,
    // c₂ = 1.11026, x = 1.12992
    { ion: '16O', energy: 1, vOverV0: 6.34469, mean: 6.2641 },
  ])('$ion at $energy MeV/u gives q̄ = $mean', ({ ion, energy, vOverV0, mean }) => {
    const plan = stripPlan({ ion, energy, medium: 'C' })
    expect(plan.energy.beta * 137.035999084).toBeCloseTo(vOverV0, 4)
    const m = plan.models.find((x) => x.model === 'schiwietz-grande-2004')!
    expect(m.meanCharge).toBeCloseTo(mean, 3)
    expect(m.coefficients).toMatch(/2001 paper's formula/)
  })

  it('flags heavy projectiles at 1–4 MeV/u, where the formula was found less good (Kaur, Kumar & Nandi, arXiv:2502.04831, abstract)', () => {
    const heavy = stripPlan({ ion: '48Ca', energy: 3, medium: 'C' }).models.find((x) => x.model === 'schiwietz-grande-2004')!
    expect(heavy.warnings.join(' ')).toMatch(/up to Z = 16/)
    const light = stripPlan({ ion: '16O', energy: 1, medium: 'C' }).models.find((x) => x.model === 'schiwietz-grande-2004')!
    expect(light.warnings).toEqual([])
  })

  it('gives no number for a gas stripper, and says why', () => {
    const plan = stripPlan({ ion: '12C1-', energy: 0.21, medium: 'Ar', gas: true })
    expect(plan.models.map((m) => m.model)).not.toContain('schiwietz-grande-2004')
    expect(plan.notApplicable).toEqual([{ model: 'schiwietz-grande-2004', source: expect.stringMatching(/225, 4 \(2004\)/), reason: expect.stringMatching(/solid strippers only/) }])
    const solid = stripPlan({ ion: '12C1-', energy: 0.21, medium: 'C' })
    expect(solid.notApplicable).toEqual([])
  })
})

describe('gas stripping of carbon for accelerator mass spectrometry', () => {
  // 12C− at 2.5 MeV (0.21 MeV/u) in argon gives C3+ as the most abundant state (the usual
  // choice at 2.5 MV terminal voltage in AMS; common practice, from memory).
  it('gives 3+ as the most probable state with the gas formulas', () => {
    const plan = stripPlan({ ion: '12C1-', energy: 0.21, medium: 'Ar', gas: true })
    const byName = Object.fromEntries(plan.models.map((m) => [m.model, m]))
    expect(byName['schiwietz-grande-2001']!.mostProbable).toBe(3)
    expect(byName['sayer-1977']!.mostProbable).toBe(3)
    expect(byName['nikolaev-dmitriev-1968']!.warnings.join(' ')).toMatch(/solid strippers/)
    expect(byName['baron-1993']!.warnings.join(' ')).toMatch(/carbon foils only/)
  })
})

describe('distributions', () => {
  it('are normalised over 0…Z and every model names its paper', () => {
    const plan = stripPlan({ ion: '48Ca10+', energy: 5, medium: 'C' })
    for (const m of plan.models) {
      expect(m.fractions).toHaveLength(21)
      expect(m.fractions.reduce((s, f) => s + f.fraction, 0)).toBeCloseTo(1, 12)
      expect(m.source).toMatch(/\(19\d\d\)|\(20\d\d\)/)
      expect(m.range.length).toBeGreaterThan(5)
    }
  })

  it("a Gaussian's mean and spread are its parameters when far from 0 and Z", () => {
    const f = gaussianFractions(82, 50.3, 2.1)
    const mean = f.reduce((s, x) => s + x.charge * x.fraction, 0)
    const sd = Math.sqrt(f.reduce((s, x) => s + (x.charge - mean) ** 2 * x.fraction, 0))
    expect(mean).toBeCloseTo(50.3, 6)
    expect(sd).toBeCloseTo(2.1, 3)
  })

  it('a width far below one charge still puts the whole beam in the state nearest the mean, and says so', () => {
    // Baron's width formula goes to zero for a nearly bare ion (Pb at 999 MeV/u): the Gaussian
    // would underflow to zero everywhere without scaling by its largest term.
    const baronPb = stripPlan({ ion: '208Pb82+', energy: 999, medium: 'C' }).models.find((m) => m.model === 'baron-1993')!
    expect(baronPb.fractions.reduce((s, f) => s + f.fraction, 0)).toBeCloseTo(1, 12)
    expect(baronPb.mostProbable).toBe(Math.round(baronPb.meanCharge))
    expect(baronPb.warnings.join(' ')).toMatch(/no spread/)
    const f = gaussianFractions(10, 4.3, 1e-3)
    expect(f[4]!.fraction).toBe(1)
  })

  it("Sayer's shape leans towards low charges when ε < 0 and is symmetric when ε = 0", () => {
    const sym = sayerFractions(82, 50, 2, 0)
    expect(sym[48]!.fraction).toBeCloseTo(sym[52]!.fraction, 12)
    const skew = sayerFractions(82, 50, 2, -0.2)
    expect(skew[46]!.fraction).toBeGreaterThan(skew[54]!.fraction)
  })

  it('flags energies outside a formula and refuses nonsense', () => {
    const low = stripPlan({ ion: 'Pb', energy: 0.5, medium: 'C' })
    expect(low.models.find((m) => m.model === 'baron-1993')!.warnings.join(' ')).toMatch(/1\.3 MeV\/u/)
    expect(low.warnings.join(' ')).toMatch(/No isotope named/)
    expect(() => stripPlan({ ion: 'Xx', energy: 1, medium: 'C' })).toThrow(/symbol|element/i)
    expect(() => stripPlan({ ion: 'Pb', energy: -1, medium: 'C' })).toThrow(/positive/)
    expect(() => stripPlan({ ion: 'Pb', energy: 1, medium: 'Qq' })).toThrow(/stripper medium/)
  })
})
