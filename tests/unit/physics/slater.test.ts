import { describe, expect, it } from 'vitest'
import { groundConfiguration } from '../../../shared/physics/configuration'
import { nStar, screeningConstant, slaterScreening } from '../../../shared/physics/slater'
import { parseConfiguration } from '../../../shared/physics/subshells'

// Worked examples of Slater's rules (J. C. Slater, Phys. Rev. 36, 57 (1930)). The σ column spells
// out the sum by Slater's constants — 0.35 same group (0.30 in 1s), 0.85 from n − 1 for s,p,
// 1.00 from deeper and for d,f from everything to the left — and the Z_eff values are the ones
// general-chemistry textbooks quote for these atoms (from memory), except Gd 4f, which is only our
// own application of the rules to an f electron.
describe("Slater's rules: worked examples", () => {
  it.each([
    ['He 1s', 2, '1s2', '1s', 0.3, 1.7],
    ['N 2p', 7, '1s2 2s2 2p3', '2p', 2 * 0.85 + 4 * 0.35, 3.9],
    ['O 2p', 8, '1s2 2s2 2p4', '2p', 2 * 0.85 + 5 * 0.35, 4.55],
    ['Na 3s', 11, '[Ne] 3s1', '3s', 2 * 1.0 + 8 * 0.85, 2.2],
    ['K 4s', 19, '[Ar] 4s1', '4s', 10 * 1.0 + 8 * 0.85, 2.2],
    ['Fe 3d', 26, '[Ar] 3d6 4s2', '3d', 18 * 1.0 + 5 * 0.35, 6.25],
    ['Fe 4s', 26, '[Ar] 3d6 4s2', '4s', 10 * 1.0 + 14 * 0.85 + 1 * 0.35, 3.75],
    ['Zn 3d', 30, '[Ar] 3d10 4s2', '3d', 18 * 1.0 + 9 * 0.35, 8.85],
    ['Zn 4s', 30, '[Ar] 3d10 4s2', '4s', 10 * 1.0 + 18 * 0.85 + 1 * 0.35, 4.35],
    ['Br 4p', 35, '[Ar] 3d10 4s2 4p5', '4p', 10 * 1.0 + 18 * 0.85 + 6 * 0.35, 7.6],
    ['Cs 6s', 55, '[Xe] 6s1', '6s', 46 * 1.0 + 8 * 0.85, 2.2],
    ['Gd 4f', 64, '[Xe] 4f7 5d1 6s2', '4f', 46 * 1.0 + 6 * 0.35, 15.9],
  ])('%s', (_, z, config, label, sigma, zEff) => {
    const subshells = parseConfiguration(config)
    const target = subshells.find((s) => `${s.n}${'spdf'[s.l]}` === label)
    if (!target) throw new Error(`no ${label} in ${config}`)
    expect(screeningConstant(subshells, target)).toBeCloseTo(sigma, 10)
    expect(z - screeningConstant(subshells, target)).toBeCloseTo(zEff, 10)
  })

  // DESIGN §5's example row for Fe XIV: 3p, n* = 3, σ = 9.5, Z_eff = 16.5.
  it('gives the Fe XIV 3p row of DESIGN §5', () => {
    const row = slaterScreening(26, groundConfiguration(26, 13).subshells).find((r) => r.subshell === '3p')
    expect(row).toEqual({ subshell: '3p', nStar: 3, sigma: 9.5, zEff: 16.5 })
  })

  it.each([
    [1, 1],
    [2, 2],
    [3, 3],
    [4, 3.7],
    [5, 4.0],
    [6, 4.2],
    [7, 4.2], // beyond Slater's table: the engine keeps 4.2 (documented in slater.ts)
  ])('n = %i has n* = %f (Slater 1930)', (n, value) => {
    expect(nStar(n)).toBe(value)
  })

  it('lists one row per occupied subshell in canonical order, with Z_eff = Z − σ', () => {
    const g = groundConfiguration(79, 0)
    const rows = slaterScreening(79, g.subshells)
    expect(rows.map((r) => r.subshell).join(' ')).toBe(g.text.replace(/\d+(?= |$)/g, ''))
    for (const r of rows) expect(r.zEff).toBeCloseTo(79 - r.sigma, 9)
  })

  it('screens a 1s electron of a one-electron ion by nothing', () => {
    expect(slaterScreening(92, groundConfiguration(92, 91).subshells)).toEqual([{ subshell: '1s', nStar: 1, sigma: 0, zEff: 92 }])
  })
})
