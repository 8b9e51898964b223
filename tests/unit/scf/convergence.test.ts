import { describe, expect, it } from 'vitest'
import { HARTREE_EV, SCF_METHOD, runDirac, solveConfiguration, solveSpeciesScf } from '../../../shared/physics/scf/index'
import { runScf } from '../../../shared/physics/scf/scf'
import { groundConfiguration } from '../../../shared/physics/configuration'

describe('a solve that cannot converge says so', () => {
  it('one iteration is not enough: converged false, a reason, no numbers', () => {
    const r = solveConfiguration(26, groundConfiguration(26, 0).subshells, { maxIterations: 1 })
    expect(r.converged).toBe(false)
    expect(r.iterations).toBe(1)
    expect(r.failure).toMatch(/not self-consistent after 1 iteration/)
    expect(r.totalEnergyHartree).toBeNaN()
    expect(r.orbitals).toEqual([])
    expect(r.density).toBeUndefined()
  })

  it('the species estimates are then null, never a number', () => {
    const s = solveSpeciesScf(26, 0, { maxIterations: 1 })
    expect(s.species.converged).toBe(false)
    expect(s.next?.converged).toBe(false)
    expect(s.next?.failure).toMatch(/did not converge/)
    expect(s.deltaEv).toBeNull()
    expect(s.eigenvalueEv).toBeNull()
  })

  it('an anion the local density cannot bind (He⁻, not bound in nature either) reports the unbound orbital', () => {
    const s = solveSpeciesScf(2, -1)
    expect(s.species.converged).toBe(false)
    expect(s.species.failure).toMatch(/no bound 2,0 state/)
    expect(s.deltaEv).toBeNull()
  })

  it('a bound anion converges (H⁻)', () => {
    const s = solveSpeciesScf(1, -1)
    expect(s.species.converged).toBe(true)
    // H⁻ is bound by 0.754 eV (electron affinity of hydrogen, from memory)
    expect(s.deltaEv).toBeGreaterThan(0.5)
    expect(s.deltaEv).toBeLessThan(1)
  })
})

describe('impossible input is refused', () => {
  it.each([
    ['l not below n', 26, [{ n: 2, l: 2, electrons: 1 }]],
    ['more electrons than the subshell holds', 26, [{ n: 2, l: 1, electrons: 7 }]],
    ['a subshell listed twice', 26, [{ n: 1, l: 0, electrons: 1 }, { n: 1, l: 0, electrons: 1 }]],
    ['a nuclear charge of zero', 0, [{ n: 1, l: 0, electrons: 1 }]],
  ])('%s', (_why, z, subshells) => {
    expect(() => solveConfiguration(z, subshells)).toThrow(RangeError)
  })
})

describe('results are plain data from pure functions', () => {
  it('a bare nucleus has zero energy and no next ion', () => {
    const s = solveSpeciesScf(26, 26)
    expect(s.species).toMatchObject({ converged: true, totalEnergyHartree: 0, orbitals: [], charge: 26 })
    expect(s.next).toBeNull()
    expect(s.deltaEv).toBeNull()
  })

  it('the same species solved twice, with another in between, gives the same result', () => {
    const first = solveSpeciesScf(8, 0)
    solveSpeciesScf(79, 3)
    expect(solveSpeciesScf(8, 0)).toEqual(first)
  })

  it('a converged result survives a JSON round trip unchanged and stays small', () => {
    const s = solveSpeciesScf(26, 0)
    const text = JSON.stringify(s)
    expect(JSON.parse(text)).toEqual(s)
    expect(text.length).toBeLessThan(12_000)
    expect(s.species.method).toBe(SCF_METHOD)
  })

  it('the radial density table is log-spaced, 60–100 points, each subshell normalised to one electron', () => {
    const { density, orbitals } = solveConfiguration(26, groundConfiguration(26, 0).subshells)
    expect(density).toBeDefined()
    const { r, bySubshell } = density!
    expect(r.length).toBeGreaterThanOrEqual(60)
    expect(r.length).toBeLessThanOrEqual(100)
    expect(Object.keys(bySubshell)).toEqual(['1s', '2s', '2p', '3s', '3p', '3d', '4s'])
    expect(orbitals.map((o) => `${o.n}${'spdf'[o.l]}`)).toEqual(Object.keys(bySubshell))
    const ratios = r.slice(1).map((v, i) => v / r[i])
    for (const q of ratios) expect(q).toBeCloseTo(ratios[0], 2)
    for (const values of Object.values(bySubshell)) {
      expect(values).toHaveLength(r.length)
      let integral = 0
      for (let i = 1; i < r.length; i++) integral += 0.5 * (values[i] + values[i - 1]) * (r[i] - r[i - 1])
      expect(integral).toBeGreaterThan(0.97)
      expect(integral).toBeLessThan(1.02)
    }
  })
})

describe('orbital energies and the eigenvalue estimate', () => {
  it('for a closed-shell atom the eigenvalue estimate is minus the highest orbital energy (Ne 2p)', () => {
    const s = solveSpeciesScf(10, 0)
    const top = Math.max(...s.species.orbitals.map((o) => o.energyHartree))
    expect(s.species.orbitals.find((o) => o.energyHartree === top)).toMatchObject({ n: 2, l: 1 })
    expect(s.eigenvalueEv).toBeCloseTo(-top * HARTREE_EV, 9)
  })

  it('for an open-shell atom it uses the highest spin orbital, at or above the spin average (Fe)', () => {
    const s = solveSpeciesScf(26, 0)
    const top = Math.max(...s.species.orbitals.map((o) => o.energyHartree))
    expect(s.eigenvalueEv!).toBeLessThanOrEqual(-top * HARTREE_EV + 1e-9)
    expect(s.eigenvalueEv!).toBeGreaterThan(0)
  })

  it('orbital energies of an atom rise with n within each l, and occupations add up', () => {
    const r = solveConfiguration(54, groundConfiguration(54, 0).subshells)
    for (const l of [0, 1, 2]) {
      const energies = r.orbitals.filter((o) => o.l === l).map((o) => o.energyHartree)
      for (let i = 1; i < energies.length; i++) expect(energies[i]).toBeGreaterThan(energies[i - 1])
    }
    expect(r.orbitals.reduce((s, o) => s + o.occupation, 0)).toBe(54)
  })
})

// The seed only supplies the starting densities: the ion started from the atom's orbitals (which
// carry one electron more) reaches the solution it reaches from the Thomas–Fermi start, and a seed
// on another grid is ignored. Both solvers share this loop (iteration.ts).
describe.each([
  ['non-relativistic', runScf],
  ['relativistic', runDirac],
] as const)('a %s run seeded with a neighbouring solution', (_name, run) => {
  it.each([
    [26, 0],
    [36, 0],
    [79, 1],
  ])('Z = %i: the ion of charge %i + 1 converges to the same energy as from scratch, in no more iterations', (z, q) => {
    const settings = { rMax: 40, densityPoints: 0 }
    const atom = (run as typeof runScf)(z, groundConfiguration(z, q).subshells, settings)
    const ion = groundConfiguration(z, q + 1).subshells
    const fresh = (run as typeof runScf)(z, ion, settings)
    const seeded = (run as typeof runScf)(z, ion, settings, atom)
    expect(fresh.converged && seeded.converged).toBe(true)
    // both converged to 1e-6 per electron in the density: energies agree far below a meV
    expect(Math.abs(seeded.totalEnergy - fresh.totalEnergy)).toBeLessThan(1e-5)
    expect(seeded.iterations).toBeLessThanOrEqual(fresh.iterations)
    const otherGrid = (run as typeof runScf)(z, groundConfiguration(z, q).subshells, { ...settings, rMax: 30 })
    expect((run as typeof runScf)(z, ion, settings, otherGrid)).toEqual(fresh)
  })
})

describe('every element converges, neutral, half stripped and one-electron', () => {
  it('Z = 1–92 at charges 0, ⌊Z/2⌋ and Z − 1', () => {
    const failures: string[] = []
    for (let z = 1; z <= 92; z++) {
      for (const q of new Set([0, Math.floor(z / 2), z - 1])) {
        const s = solveSpeciesScf(z, q, { densityPoints: 0 })
        if (s.deltaEv === null || !(s.deltaEv > 0)) failures.push(`${z}/${q}: ${s.species.failure ?? s.next?.failure}`)
      }
    }
    expect(failures).toEqual([])
  }, 120_000)
})
