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
