import { describe, expect, it } from 'vitest'
import { solveConfiguration, solveSpeciesScf } from '../../../shared/physics/scf/index'

// One electron in the field of a bare nucleus, infinite nuclear mass, no relativity: the textbook
// results E = −Z²/(2n²) hartree, ⟨r⟩ = (3n² − l(l+1))/(2Z) and ⟨r²⟩ = n²(5n² + 1 − 3l(l+1))/(2Z²)
// bohr (common practice, no source). The self-interaction correction must cancel the electron's
// own Hartree and exchange–correlation energy exactly for these to come out.

describe('one-electron ions: total energy −Z²/2 hartree to 0.01 %', () => {
  it.each([1, 2, 10, 26, 54, 92])('Z = %i', (z) => {
    const r = solveConfiguration(z, [{ n: 1, l: 0, electrons: 1 }])
    expect(r.converged).toBe(true)
    expect(r.charge).toBe(z - 1)
    expect(Math.abs(r.totalEnergyHartree / (-(z * z) / 2) - 1)).toBeLessThan(1e-4)
    expect(Math.abs(r.orbitals[0].energyHartree / (-(z * z) / 2) - 1)).toBeLessThan(1e-4)
  })

  it.each([1, 26, 92])('Z = %i: the ΔSCF ionisation energy is Z²·13.6057 eV', (z) => {
    // 13.6057 eV = hartree/2, CODATA 2018 (27.211386245988 eV / 2)
    const s = solveSpeciesScf(z, z - 1)
    expect(s.next?.totalEnergyHartree).toBe(0)
    expect(Math.abs(s.deltaEv! / (z * z * 13.605693122994) - 1)).toBeLessThan(1e-4)
    expect(Math.abs(s.eigenvalueEv! / (z * z * 13.605693122994) - 1)).toBeLessThan(1e-4)
  })
})

describe('hydrogen-like states: ⟨r⟩ and ⟨r²⟩ are the analytic values', () => {
  it.each([
    [1, 1, 0],
    [1, 2, 1],
    [3, 3, 2],
    [8, 2, 0],
    [26, 4, 3],
    [92, 3, 1],
  ])('Z = %i, n = %i, l = %i', (z, n, l) => {
    const r = solveConfiguration(z, [{ n, l, electrons: 1 }])
    expect(r.converged).toBe(true)
    const o = r.orbitals[0]
    expect(o.energyHartree / (-(z * z) / (2 * n * n))).toBeCloseTo(1, 5)
    expect(o.rMean / ((3 * n * n - l * (l + 1)) / (2 * z))).toBeCloseTo(1, 5)
    expect(o.r2Mean / ((n * n * (5 * n * n + 1 - 3 * l * (l + 1))) / (2 * z * z))).toBeCloseTo(1, 5)
    // so the mean-radius effective charge is the nuclear charge itself
    expect(o.zEffMeanRadius).toBeCloseTo(z, 3)
  })
})
