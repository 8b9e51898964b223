import { describe, expect, it } from 'vitest'
import { breedPlan, integratePopulations, lotzCrossSection, subshellBindings } from '../../../shared/beam/index'

// The issue asks for a one-electron ion such as hydrogen-like Mo: those were measured in an
// electron-beam ion trap (R. E. Marrs, S. R. Elliott and J. H. Scofield, Phys. Rev. A 56, 1338
// (1997): H-like Mo, Dy, Au, Bi at 1.3–3.9 times threshold), but only the abstract could be
// read, not the values; He⁺ stands in.
describe('Lotz cross-sections', () => {
  it('He+ (one electron) near its maximum: measured ≈ 4.5e-18 cm² at 200 eV (Peart, Walton & Dolder, J. Phys. B 2, 1347 (1969) — from memory), within the ±40 % the formula carries', () => {
    const subs = subshellBindings(2, 1)
    expect(subs).toHaveLength(1)
    expect(subs[0]!.eV).toBeCloseTo(54.4178, 2) // NIST ASD He II ionisation energy
    const sigma = lotzCrossSection(200, subs)
    expect(Math.abs(sigma / 4.5e-18 - 1)).toBeLessThan(0.4)
  })

  it('is zero at and below threshold and sums every subshell above it', () => {
    const ne = subshellBindings(10, 0)
    expect(ne.map((s) => s.subshell)).toEqual(['1s', '2s', '2p'])
    expect(lotzCrossSection(ne[2]!.eV, ne)).toBe(0)
    const outerOnly = lotzCrossSection(2000, [ne[2]!])
    expect(lotzCrossSection(2000, ne)).toBeGreaterThan(outerOnly)
  })

  it('uses SCF eigenvalues for inner subshells when the server passes them, never below the outermost', () => {
    const subs = subshellBindings(10, 0, { scf: { 0: { '1s': 832.5, '2s': 1, '2p': 19.9 } } })
    expect(subs[0]).toMatchObject({ subshell: '1s', eV: 832.5 })
    expect(subs[0]!.method).toMatch(/SCF/)
    expect(subs[1]!.eV).toBeCloseTo(21.5645, 3) // raised to the outermost: Ne I ionisation energy 21.5645 eV (NIST ASD)
    expect(subs[2]!.method).toMatch(/reference ionisation energy/)
  })

  it('takes binding energies from a species record when given', () => {
    const subs = subshellBindings(10, 0, { recorded: { 0: [{ subshell: '1s', eV: 870, method: 'dirac-fock' }, { subshell: '2p1/2', eV: 21.7, method: 'dirac-fock' }, { subshell: '2p3/2', eV: 21.6, method: 'dirac-fock' }] } })
    expect(subs[0]).toMatchObject({ subshell: '1s', eV: 870 })
    expect(subs[2]!.eV).toBeCloseTo((2 * 21.7 + 4 * 21.6) / 6, 9)
    expect(subs[2]!.method).toMatch(/species record/)
  })
})

describe('breeding', () => {
  it('conserves the ion number in the rate equations', () => {
    const rates = [5e3, 1e3, 2e2, 40, 3]
    const samples = [1e-5, 1e-4, 1e-3, 1e-2, 0.1, 1, 10]
    const { series } = integratePopulations(rates, 1e-7, 10, samples)
    for (let i = 0; i < samples.length; i++) expect(series.reduce((s, f) => s + f[i]!, 0)).toBeCloseTo(1, 12)
    // A single step is exponential decay, N0 = exp(−k t): 1 % steps keep it within 1 %.
    const one = integratePopulations([100], 1e-6, 0.02, [0.01, 0.02])
    expect(one.series[0]![0]! / Math.exp(-1)).toBeCloseTo(1, 2)
  })

  it('Ar at 5 keV and 250 A/cm² reaches the bare nucleus, with shell openings and growing j·τ', () => {
    const plan = breedPlan({ ion: 'Ar', electronEnergyEv: 5000, currentDensityACm2: 250 })
    expect(plan.steps[0]!.charge).toBe(0)
    expect(plan.breeding[0]!.charge).toBe(1)
    expect(plan.maxCharge).toBe(18)
    expect(plan.thresholds.map((t) => t.subshell)).toEqual(['3p', '2p', '1s'])
    for (let i = 1; i < plan.breeding.length; i++) expect(plan.breeding[i]!.jTauACm2).toBeGreaterThan(plan.breeding[i - 1]!.jTauACm2)
    expect(plan.breeding[5]!.timeS).toBeCloseTo(plan.breeding[5]!.jTauACm2 / 250, 12)
    expect(plan.uncertainty).toBeGreaterThanOrEqual(0.3)
    expect(plan.warnings.join(' ')).toMatch(/radiative recombination and charge exchange are left out/)
  })

  it('stops where the beam cannot open the next shell', () => {
    const plan = breedPlan({ ion: 'Ar', electronEnergyEv: 2000, currentDensityACm2: 100 })
    expect(plan.maxCharge).toBe(16) // He-like Ar: 1s binding 4121 eV (NIST ASD) > 2 keV
    expect(plan.thresholds.find((t) => t.subshell === '1s')).toMatchObject({ reachable: false })
  })
})
