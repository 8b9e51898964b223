import { describe, expect, it } from 'vitest'
import { groundConfiguration } from '../../../shared/physics/configuration'
import { describeSpecies, referenceIonisationDetail, referenceIonisationEv, speciesClass } from '../../../shared/physics/index'
import { determinantEnergy, averageEnergy, gauntC, slaterIntegral, slaterWorkspace, threeJ } from '../../../shared/physics/scf/hf-energy'
import { correlationEnergy, hartreeFockDelta, restrictedOrbitals } from '../../../shared/physics/scf/hf-species'
import { lsdOnGrid } from '../../../shared/physics/scf/xc'
import { solveSpeciesDirac, solveSpeciesAll } from '../../../shared/physics/scf/index'
import { makeLogGrid } from '../../../shared/physics/scf/grid'
import { runScf } from '../../../shared/physics/scf/scf'
import { parseConfiguration } from '../../../shared/physics/subshells'


describe('angular factors', () => {
  it('3j symbols: (j j 0; m −m 0) = (−1)^(j−m)/√(2j+1) (closed form, A. R. Edmonds, Angular Momentum in Quantum Mechanics, 1957, eq. 3.7.8; from memory)', () => {
    for (let j = 0; j <= 4; j++) {
      for (let m = -j; m <= j; m++) expect(threeJ(j, j, 0, m, -m, 0)).toBeCloseTo((-1) ** (j - m) / Math.sqrt(2 * j + 1), 14)
    }
  })

  it('3j symbols are orthogonal: Σ_m1,m2 (j1 j2 j3; m1 m2 m3)(j1 j2 j3′; m1 m2 m3) = δ_j3j3′/(2j3 + 1) (Edmonds eq. 3.7.8, common practice)', () => {
    for (const [j1, j2] of [[2, 2], [3, 2], [1, 3]]) {
      for (let j3 = Math.abs(j1 - j2); j3 <= j1 + j2; j3++) {
        for (let j3b = Math.abs(j1 - j2); j3b <= j1 + j2; j3b++) {
          for (let m3 = -Math.min(j3, j3b); m3 <= Math.min(j3, j3b); m3++) {
            let sum = 0
            for (let m1 = -j1; m1 <= j1; m1++) {
              const m2 = -m1 - m3
              sum += threeJ(j1, j2, j3, m1, m2, m3) * threeJ(j1, j2, j3b, m1, m2, m3)
            }
            expect(sum).toBeCloseTo(j3 === j3b ? 1 / (2 * j3 + 1) : 0, 13)
          }
        }
      }
    }
  })

  it('Condon–Shortley c^k: c²(p±1, p±1) = −1/5, c²(p0, p0) = 2/5, c¹(s0, p±1) = −1/√3 up to sign (E. U. Condon and G. H. Shortley 1935, table 1⁶; from memory)', () => {
    expect(gauntC(2, 1, 1, 1, 1)).toBeCloseTo(-1 / 5, 14)
    expect(gauntC(2, 1, -1, 1, -1)).toBeCloseTo(-1 / 5, 14)
    expect(gauntC(2, 1, 0, 1, 0)).toBeCloseTo(2 / 5, 14)
    expect(Math.abs(gauntC(1, 0, 0, 1, 1))).toBeCloseTo(1 / Math.sqrt(3), 14)
    // sum rule Σ_m c^k(lm, lm) = (2l + 1)δ_k0: a closed shell is spherical (Condon and Shortley, ch. 6)
    for (let l = 0; l <= 3; l++) {
      for (let k = 0; k <= 2 * l; k += 2) {
        let sum = 0
        for (let m = -l; m <= l; m++) sum += gauntC(k, l, m, l, m)
        expect(sum).toBeCloseTo(k === 0 ? 2 * l + 1 : 0, 13)
      }
    }
  })
})

describe('Slater integrals of hydrogenic orbitals (closed forms; H. A. Bethe and E. E. Salpeter, Quantum Mechanics of One- and Two-Electron Atoms, 1957; from memory)', () => {
  const z = 3
  const grid = makeLogGrid(z, { rMax: 60 })
  const ws = slaterWorkspace(grid)
  const p1s = grid.r.map((r) => 2 * z ** 1.5 * r * Math.exp(-z * r))
  const p2s = grid.r.map((r) => (z ** 1.5 / Math.SQRT2) * r * (1 - (z * r) / 2) * Math.exp(-z * r / 2))
  const p2p = grid.r.map((r) => (z ** 2.5 / (2 * Math.sqrt(6))) * r * r * Math.exp(-z * r / 2))
  it.each([
    ['F⁰(1s,1s) = 5Z/8', 0, p1s, p1s, p1s, p1s, (5 * z) / 8],
    ['F⁰(1s,2s) = 17Z/81', 0, p1s, p1s, p2s, p2s, (17 * z) / 81],
    ['G⁰(1s,2s) = 16Z/729', 0, p1s, p2s, p1s, p2s, (16 * z) / 729],
    ['F⁰(2p,2p) = 93Z/512', 0, p2p, p2p, p2p, p2p, (93 * z) / 512],
    ['F²(2p,2p) = 45Z/512', 2, p2p, p2p, p2p, p2p, (45 * z) / 512],
  ] as const)('%s', (_, k, a, b, c, d, expected) => {
    expect(Math.abs(slaterIntegral(grid, k, a, b, c, d, ws) / expected - 1)).toBeLessThan(1e-6)
  })
})

describe('the Hartree–Fock energy of local-density orbitals', () => {
  it('term energies above the configuration average: p² ³P = −3F²/25, d² ³F = −58F²/441 + 5F⁴/441 (E. U. Condon and G. H. Shortley 1935, table 2⁷ in F_k = F^k/D_k; from memory)', () => {
    for (const [z, text, k2, k4, l] of [
      [6, '1s2 2s2 2p2', -3 / 25, 0, 1],
      [22, '1s2 2s2 2p6 3s2 3p6 3d2', -58 / 441, 5 / 441, 2],
    ] as const) {
      const run = runScf(z, parseConfiguration(text), { functional: 'lda' })
      const orbitals = restrictedOrbitals(run)
      if (typeof orbitals === 'string') throw new Error(orbitals)
      const open = orbitals.find((o) => o.l === l)!.p
      const ws = slaterWorkspace(run.grid)
      const f2 = slaterIntegral(run.grid, 2, open, open, open, open, ws)
      const f4 = slaterIntegral(run.grid, 4, open, open, open, open, ws)
      const shift = determinantEnergy(run.grid, orbitals) - averageEnergy(run.grid, orbitals)
      expect(shift).toBeCloseTo(k2 * f2 + k4 * f4, 10)
    }
  })

  // Hartree–Fock limits, hartree: E. Clementi and C. Roetti, At. Data Nucl. Data Tables 14, 177
  // (1974) and C. F. Bunge, J. A. Barrientos and A. V. Bunge, At. Data Nucl. Data Tables 53, 113
  // (1993) (from memory). The Hartree–Fock energy of any determinant lies above them (variational
  // principle), and local-density orbitals are close to Hartree–Fock ones, so it lies close above: 7e-4 of the total for He, whose
  // orbital the local density binds least well, 1.2e-4 to 2.2e-4 for C to Kr.
  it.each([
    ['He', 2, '1s2', -2.86168],
    ['C ³P', 6, '1s2 2s2 2p2', -37.68862],
    ['Ne', 10, '1s2 2s2 2p6', -128.54710],
    ['Ar', 18, '1s2 2s2 2p6 3s2 3p6', -526.81751],
    ['Kr', 36, '1s2 2s2 2p6 3s2 3p6 3d10 4s2 4p6', -2752.05498],
  ] as const)('%s: above the Hartree–Fock limit, within 1e-3 of it', (_, z, text, limit) => {
    const run = runScf(z, parseConfiguration(text), { functional: 'lda' })
    const orbitals = restrictedOrbitals(run)
    if (typeof orbitals === 'string') throw new Error(orbitals)
    const energy = determinantEnergy(run.grid, orbitals)
    expect(energy).toBeGreaterThan(limit)
    expect((energy - limit) / -limit).toBeLessThan(1e-3)
  })
})

const relativistic = (z: number, q: number) => () => solveSpeciesDirac(z, q, { functional: 'lda', densityPoints: 0 }).deltaEv

describe('hf-delta', () => {

  it('Fm⁴⁰⁺ (a 4f electron removed): the non-relativistic part agrees with NWChem\'s Hartree–Fock ΔSCF, 1946.36 eV (UGBS basis, high-spin UHF; scripts/reference/hartree-fock-oracle.ts), to 0.02 %', () => {
    const hf = hartreeFockDelta(100, 40, groundConfiguration, relativistic(100, 40))
    expect(hf.nonRelativisticEv! / 1946.36 - 1).toBeCloseTo(0, 3.7)
  })

  it('Hg⁴⁺–Hg⁶⁺ (a 5d electron removed): within 1 % of NIST ASD 5.12, where the local-density ΔSCF is 3–6 % high', () => {
    for (const q of [4, 5, 6]) {
      const reference = referenceIonisationEv(80, q)! // NIST ASD 5.12: 61.2 ± 0.2, 76.6 ± 0.5, 93 ± 2 eV
      const hf = hartreeFockDelta(80, q, groundConfiguration, relativistic(80, q)).eV!
      expect(Math.abs(hf / reference - 1)).toBeLessThan(0.01)
    }
    // the species record carries it from charge 5 on, beside the local-density ΔSCF
    for (const q of [5, 6]) {
      const all = solveSpeciesAll(80, q, { densityPoints: 0 })
      expect(all.byMethod!['hf-delta']! / referenceIonisationEv(80, q)! - 1).toBeCloseTo(hartreeFockDelta(80, q, groundConfiguration, relativistic(80, q)).eV! / referenceIonisationEv(80, q)! - 1, 9)
      expect(all.byMethod!['dirac-lsd-delta']! / referenceIonisationEv(80, q)! - 1).toBeGreaterThan(0.03)
    }
    // the record names what the number rests on, not the self-interaction-corrected solution's method
    const hg5 = describeSpecies('Hg5+', { scf: solveSpeciesAll(80, 5, { densityPoints: 0 }) })
    expect(hg5.ionisationEnergy.estimates.find((e) => e.method === 'hf-delta')?.basis).toBe('hartree-fock determinant on lda-spherical orbitals + dks-lda-spherical shift')
    // below charge 5 the record gives no number but the reason (its missing correlation energy)
    const hg4 = describeSpecies('Hg4+', { scf: solveSpeciesAll(80, 4, { densityPoints: 0 }) })
    expect(hg4.ionisationEnergy.estimates.find((e) => e.method === 'hf-delta')).toMatchObject({ eV: null, notApplicable: expect.stringMatching(/charge ≥ 5 only: .*correlation/) })
  })

  it('has no number for a one-electron ion, and a reason', () => {
    expect(hartreeFockDelta(8, 7, groundConfiguration, relativistic(8, 7))).toEqual({ eV: null, failure: 'needs at least two electrons' })
  })
})

describe('hf-correlated-delta', () => {
  it('the local correlation energy: He with its LDA orbitals −0.112 hartree (from memory: the usual figure for LDA correlation of He, against −0.042 exact), and exchange + correlation adds up to the functional', () => {
    const run = runScf(2, parseConfiguration('1s2'), { functional: 'lda' })
    const orbitals = restrictedOrbitals(run)
    if (typeof orbitals === 'string') throw new Error(orbitals)
    const ec = correlationEnergy(run.grid, orbitals)
    expect(ec).toBeGreaterThan(-0.114)
    expect(ec).toBeLessThan(-0.110)
    // E_xc of xc.ts minus the closed-form Dirac–Slater exchange −¾(6/π)^⅓ Σ_σ ∫ρ_σ^(4/3) is the correlation
    const { grid } = run
    const half = grid.r.map((_, i) => orbitals[0]!.p[i]! ** 2)
    const exc = lsdOnGrid(grid.r, grid.dr, half, half, new Float64Array(grid.size), new Float64Array(grid.size))
    let ex = 0
    for (let i = 0; i < grid.size; i++) {
      const shell = 4 * Math.PI * grid.r[i]! ** 2
      ex += grid.dr[i]! * shell * -0.75 * Math.cbrt(6 / Math.PI) * 2 * (half[i]! / shell) ** (4 / 3)
    }
    expect(exc - ex).toBeCloseTo(ec, 12)
  })

  // Every heavy ion (Z ≥ 55) of charge 1–4 whose next electron leaves an f shell and whose NIST ASD
  // 5.12 value is stated to better than 1 %: where the local-density ΔSCF is weakest.
  it('is closer to NIST than the local-density ΔSCF for f electrons leaving heavy ions of charge 1–4', () => {
    const ions: Array<[number, number, number]> = []
    for (let z = 55; z <= 103; z++) {
      for (let q = 1; q <= 4; q++) {
        const detail = referenceIonisationDetail(z, q)
        const reference = referenceIonisationEv(z, q)
        if (!detail || reference === null || detail.uncertaintyEv == null || detail.uncertaintyEv >= 0.01 * reference) continue
        if (speciesClass(z, q).shell === 'f') ions.push([z, q, reference])
      }
    }
    expect(ions.length).toBeGreaterThan(30)
    let hfc = 0
    let lsd = 0
    for (const [z, q, reference] of ions) {
      const hf = hartreeFockDelta(z, q, groundConfiguration, relativistic(z, q))
      hfc += Math.abs((hf.eV! + hf.correlationEv!) / reference - 1)
      lsd += Math.abs(solveSpeciesDirac(z, q, { functional: 'lsd', densityPoints: 0 }).deltaEv! / reference - 1)
    }
    // measured: 3.5 % against 4.6 % (the Hartree–Fock part alone, without correlation, is 7.6 %)
    expect(hfc / ions.length).toBeLessThan(0.04)
    expect(hfc).toBeLessThan(lsd)
  }, 60_000)
})
