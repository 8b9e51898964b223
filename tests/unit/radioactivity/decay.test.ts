import { describe, expect, it } from 'vitest'
import { activityOn, batemanActivities, chainOf, decayed, lambda, NUCLIDES } from '../../../shared/radioactivity/decay'

const YEAR = 365.25 * 86_400
const DAY = 86_400

describe('half-lives carried against NUBASE2020 (F. G. Kondev et al., Chin. Phys. C 45, 030001 (2021); values from memory)', () => {
  it.each([
    ['Co-60', 5.2711 * YEAR],
    ['Cs-137', 30.08 * YEAR],
    ['Am-241', 432.6 * YEAR],
    ['U-238', 4.468e9 * YEAR],
    ['Th-234', 24.1 * DAY],
  ])('%s', (name, t) => {
    expect(NUCLIDES[name]!.halfLifeS / t).toBeCloseTo(1, 9)
    expect(NUCLIDES[name]!.note).toBe('from memory')
  })
})

describe('decay of a single nuclide: A = A₀ e^(−λt)', () => {
  it('halves in one half-life and falls to 1/1024 in ten', () => {
    const t = NUCLIDES['Co-60']!.halfLifeS
    expect(decayed(1e6, t, t)).toBeCloseTo(5e5, 6)
    expect(decayed(1e6, t, 10 * t)).toBeCloseTo(1e6 / 1024, 6)
  })

  // Worked example (textbook arithmetic, common practice, no source): a ¹³⁷Cs check source of
  // 370 kBq (10 µCi) certified on 2000-01-01 holds 370 · 2^(−t/30.08 y) kBq on 2026-12-02.
  it('corrects a 370 kBq ¹³⁷Cs source certified on 2000-01-01 to 2026-12-02', () => {
    const years = (Date.parse('2026-12-02') - Date.parse('2000-01-01')) / 1000 / YEAR
    const expected = 370e3 * 2 ** (-years / 30.08)
    const a = activityOn('Cs-137', 370e3, '2000-01-01', '2026-12-02')
    expect(a.known).toBe(true)
    expect(a.activityBq).toBeCloseTo(expected, 3)
    expect(a.activityBq / 370e3).toBeCloseTo(0.538, 3)
  })

  // decayed is the one-member Bateman chain; it must still be the plain law A₀·2^(−t/T½), the
  // definition of the half-life (common practice, no source).
  it.each(['H-3', 'Co-60', 'Y-90', 'Pa-234m', 'U-238'])('%s: the one-member chain is A₀·2^(−t/T½) to 1e-14', (name) => {
    const half = NUCLIDES[name]!.halfLifeS
    for (const f of [0, 1e-6, 0.3, 1, 2.5, 10, 40]) {
      const expected = 1234.5 * 2 ** -f
      expect(Math.abs(decayed(1234.5, half, f * half) - expected) / expected).toBeLessThan(1e-14)
    }
  })

  it('keeps an unknown nuclide at its recorded activity, saying so', () => {
    expect(activityOn('Xx-999', 12, '2020-01-01', '2026-01-01')).toEqual({ nuclide: 'Xx-999', activityBq: 12, daughters: [], known: false })
  })
})

describe('grow-in of daughters (Bateman, Proc. Camb. Philos. Soc. 15, 423 (1910))', () => {
  it('matches the two-member closed form A₂ = A₁(0) λ₂/(λ₂−λ₁) (e^(−λ₁t) − e^(−λ₂t))', () => {
    const [t1, t2] = [10 * DAY, 1 * DAY]
    const t = 3 * DAY
    const [l1, l2] = [lambda(t1), lambda(t2)]
    const [a1, a2] = batemanActivities(1000, [t1, t2], t)
    expect(a1).toBeCloseTo(1000 * Math.exp(-l1 * t), 9)
    expect(a2).toBeCloseTo((1000 * l2 * (Math.exp(-l1 * t) - Math.exp(-l2 * t))) / (l2 - l1), 9)
  })

  it('agrees with a step-by-step integration of dNᵢ/dt = λᵢ₋₁Nᵢ₋₁ − λᵢNᵢ for a three-member chain', () => {
    const halfLives = [5 * DAY, 2 * DAY, 0.5 * DAY]
    const l = halfLives.map(lambda)
    const n = [1000 / l[0]!, 0, 0]
    const dt = 60
    for (let s = 0; s < (4 * DAY) / dt; s++) {
      const d0 = -l[0]! * n[0]!, d1 = l[0]! * n[0]! - l[1]! * n[1]!, d2 = l[1]! * n[1]! - l[2]! * n[2]!
      n[0]! += d0 * dt
      n[1]! += d1 * dt
      n[2]! += d2 * dt
    }
    const exact = batemanActivities(1000, halfLives, 4 * DAY)
    exact.forEach((a, i) => expect(a / (l[i]! * n[i]!)).toBeCloseTo(1, 3))
  })

  it('brings depleted uranium\'s ²³⁴Th and ²³⁴ᵐPa into secular equilibrium with ²³⁸U within a year', () => {
    expect(chainOf('U-238').map((m) => m.name)).toEqual(['U-238', 'Th-234', 'Pa-234m'])
    const week = activityOn('U-238', 8.5, '2026-01-01', '2026-01-08')
    // After 7 d, ²³⁴Th has grown to 1 − 2^(−7/24.1) of the parent.
    expect(week.daughters[0]!.activityBq / 8.5).toBeCloseTo(1 - 2 ** (-7 / 24.1), 4)
    const year = activityOn('U-238', 8.5, '2026-01-01', '2027-01-01')
    expect(year.activityBq).toBeCloseTo(8.5, 6)
    for (const d of year.daughters) expect(d.activityBq / 8.5).toBeCloseTo(1, 3)
  })
})
