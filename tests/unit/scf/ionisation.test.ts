import { describe, expect, it } from 'vitest'
import { solveSpeciesScf } from '../../../shared/physics/scf/index'
import { NIST_ASD_IONISATION_EV } from '../../fixtures/scf/nist-asd-ionisation'

// ΔSCF ionisation energies, E(next ion) − E(species), against NIST ASD (fixture: Debian
// python3-pymatgen's periodic_table.json). Ground configurations are the engine's.

const percentOff = (z: number, charge: number): number => {
  const s = solveSpeciesScf(z, charge, { densityPoints: 0 })
  expect(s.deltaEv, `Z=${z} q=${charge}: ${s.species.failure ?? s.next?.failure ?? ''}`).not.toBeNull()
  return (100 * Math.abs(s.deltaEv! - NIST_ASD_IONISATION_EV[z - 1][charge])) / NIST_ASD_IONISATION_EV[z - 1][charge]
}

// Tolerances by kind of ionisation, not by element: an s electron leaving a closed core is the
// central field's best case; open p shells carry the spherical average of their multiplets; when
// the ion's ground configuration differs from the atom's less the removed electron (V⁺ 3d4 from
// V 3d3 4s2, Ni⁺ 3d9, Y⁺ 5s2, Pd⁺ 4d9) the answer rides on the s–d balance of the local density,
// the known weak spot of the method.
describe('first ionisation energies against NIST ASD, within a tolerance for each kind', () => {
  it.each([
    ['H', 1, 1],
    ['Li', 3, 4],
    ['Na', 11, 4],
    ['Mg', 12, 4],
    ['K', 19, 4],
    ['Ca', 20, 4],
    ['Rb', 37, 4],
    ['Sr', 38, 4],
    ['Cd', 48, 4],
  ])('%s (Z = %i), s electron: %i %%', (_s, z, tolerance) => {
    expect(percentOff(z, 0)).toBeLessThan(tolerance)
  })

  it.each([
    ['He', 2, 4],
    ['C', 6, 9],
    ['N', 7, 9],
    ['O', 8, 9],
    ['Ne', 10, 9],
    ['Si', 14, 9],
    ['Ar', 18, 9],
    ['Ga', 31, 9],
    ['Kr', 36, 9],
    ['Sb', 51, 9],
    ['Xe', 54, 9],
  ])('%s (Z = %i), closed or open p shell: %i %%', (_s, z, tolerance) => {
    expect(percentOff(z, 0)).toBeLessThan(tolerance)
  })

  it.each([
    ['Sc', 21, 6],
    ['Ti', 22, 6],
    ['Mn', 25, 6],
    ['Fe', 26, 6],
    ['Cu', 29, 6],
    ['Zn', 30, 6],
    ['Zr', 40, 6],
    ['Mo', 42, 6],
    ['Ag', 47, 6],
  ])('%s (Z = %i), transition metal, same d count in the ion: %i %%', (_s, z, tolerance) => {
    expect(percentOff(z, 0)).toBeLessThan(tolerance)
  })

  it.each([
    ['V', 23, 25],
    ['Co', 27, 25],
    ['Ni', 28, 25],
    ['Y', 39, 25],
    ['Pd', 46, 25],
  ])('%s (Z = %i), the ion rearranges its s and d electrons: %i %%', (_s, z, tolerance) => {
    expect(percentOff(z, 0)).toBeLessThan(tolerance)
  })
})

describe('ionisation energies of ions against NIST ASD', () => {
  it.each([
    ['He-like Ne⁸⁺', 10, 8, 2],
    ['Li-like Ne⁷⁺', 10, 7, 2],
    ['Na-like Fe¹⁵⁺', 26, 15, 2],
    ['Al-like Fe¹³⁺', 26, 13, 2],
    ['Ar-like Fe⁸⁺', 26, 8, 3],
    ['Fe⁺', 26, 1, 5],
    ['Ni-like Zn²⁺', 30, 2, 5],
    ['He-like Zn²⁸⁺', 30, 28, 2],
  ])('%s: within %i %%', (_label, z, charge, tolerance) => {
    expect(percentOff(z, charge as number)).toBeLessThan(tolerance as number)
  })
})

describe('the aggregate targets of issue 5', () => {
  const mean = (values: number[]) => values.reduce((s, v) => s + v, 0) / values.length

  it('mean absolute deviation over the first ionisation energies of Z = 1–54 is at most 5 %', () => {
    const devs = Array.from({ length: 54 }, (_, i) => percentOff(i + 1, 0))
    expect(mean(devs)).toBeLessThan(5)
  }, 120_000)

  it('mean absolute deviation over every charge state of Z = 1–30 is at most 3 %', () => {
    const devs: number[] = []
    for (let z = 1; z <= 30; z++) for (let q = 0; q < z; q++) devs.push(percentOff(z, q))
    expect(devs).toHaveLength(465)
    expect(mean(devs)).toBeLessThan(3)
  }, 120_000)
})
