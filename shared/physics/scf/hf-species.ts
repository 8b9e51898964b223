/**
 * The hf-delta estimate: the Hartree–Fock ΔSCF of a species, with the Hartree–Fock energy of each
 * ion's Hund's-rule determinant (hf-energy.ts) evaluated with that ion's own self-consistent
 * local-density orbitals, plus the relativistic shift of the ΔSCF taken from the local-density
 * atom: Dirac–Kohn–Sham ΔSCF minus non-relativistic ΔSCF, both spin-restricted, in the engine's
 * j coupling (defaultJSplit). Adding a relativistic shift computed at a lower level of theory to a
 * non-relativistic energy difference is common practice, no source.
 *
 * Why: the local-density ΔSCF (dirac-lsd-delta) overshoots by 3–6 % where a d electron leaves a
 * heavy ion of charge 5–9 (Au⁵⁺, Hg⁵⁺, Hg⁶⁺): its approximate exchange misjudges the open d shell.
 * Hartree–Fock exchange is exact for a determinant; with the relativistic shift it is within 1 % of
 * NIST ASD there (tests/unit/scf/hartree-fock.test.ts). It has no correlation energy, which costs
 * it several per cent at charge 0–4, so hf-delta is only offered from charge 5 on (methods.ts).
 *
 * hf-correlated-delta adds the change of the local spin-density correlation energy between the two
 * ions (correlationEv), evaluated on the same orbitals: exact exchange with approximate
 * correlation. Adding a density-functional correlation energy to a Hartree–Fock energy is an old
 * device (H. Stoll, C. M. E. Pavlidou and H. Preuss, Theor. Chim. Acta 49, 143, 1978, used local
 * spin-density correlation so; citation from memory, and we do not remove the same-spin part as
 * they did). The bench finds it the closest method for d and f electrons leaving ions of charge 1–4.
 */
import { hundSplit, type SubshellOccupation } from './channels'
import { createField } from './field'
import { determinantEnergy, type RadialOrbital } from './hf-energy'
import type { RadialGrid } from './grid'
import { radialWorkspace, solveBoundState } from './radial'
import { defaultRMax, runScf, type ScfRun } from './scf'
import type { ConfigurationSource } from './species'
import { HARTREE_EV } from './species'
import { lsdCorrelationOnGrid } from './xc'

/** The parts of an hf-delta estimate, eV; eV is null (with the reason) where it cannot be made. */
export interface HartreeFockDelta {
  eV: number | null
  /** the non-relativistic Hartree–Fock ΔSCF */
  nonRelativisticEv?: number
  /** Dirac minus non-relativistic local-density ΔSCF */
  relativisticShiftEv?: number
  /**
   * the change of the local spin-density correlation energy, E_c(next ion) − E_c(species), each on
   * its Hund's-rule spin densities: what hf-correlated-delta adds to eV
   */
  correlationEv?: number
  failure?: string
}

/**
 * The orbitals of a converged spin-restricted run with their one-electron energies ⟨T + V_nuc⟩.
 * Each is solved once more in the potential of the run's own output density, so that
 * ⟨T + V_nuc⟩ = ε − ⟨P|V_H + V_xc|P⟩ holds exactly for the function it is used with.
 */
export function restrictedOrbitals(run: ScfRun): RadialOrbital[] | string {
  const { grid, z } = run
  const channels = run.solutions.map((s) => s.channel)
  if (channels.some((c) => c.spin !== 'pair')) throw new RangeError('restrictedOrbitals needs a spin-restricted (lda) run')
  const field = createField(z, grid, channels, 'lda')
  const size = grid.size
  const x = new Float64Array(channels.length * size)
  run.solutions.forEach((s, c) => {
    for (let i = 0; i < size; i++) x[c * size + i] = s.channel.occupation * s.p[i] * s.p[i]
  })
  field.build(x)
  const ws = radialWorkspace(grid)
  const out: RadialOrbital[] = []
  for (let c = 0; c < channels.length; c++) {
    const { channel, energy } = run.solutions[c]
    const v = field.potentials[c]
    const solved = solveBoundState(grid, v, z, channel.n, channel.l, energy, ws, 1e-12)
    if (typeof solved === 'string') return solved
    let screening = 0
    for (let i = 0; i < size; i++) screening += grid.dr[i] * solved.p[i] * solved.p[i] * (v[i] + z / grid.r[i])
    out.push({ n: channel.n, l: channel.l, occupation: channel.occupation, p: solved.p, oneElectron: solved.energy - screening })
  }
  return out
}

/**
 * The Vosko–Wilk–Nusair correlation energy (xc.ts) of the orbitals' density, spin split by Hund's
 * rule in every subshell (as the determinant is), hartree.
 */
export function correlationEnergy(grid: RadialGrid, orbitals: readonly RadialOrbital[]): number {
  const up = new Float64Array(grid.size)
  const down = new Float64Array(grid.size)
  for (const o of orbitals) {
    const split = hundSplit(o.l, o.occupation)
    for (let i = 0; i < grid.size; i++) {
      const p2 = o.p[i] * o.p[i]
      up[i] += split.up * p2
      down[i] += split.down * p2
    }
  }
  return lsdCorrelationOnGrid(grid.r, grid.dr, up, down)
}

const whole = (subshells: readonly SubshellOccupation[]) => subshells.every((s) => Number.isInteger(s.electrons))

/**
 * hf-delta for (z, charge). relativisticDeltaEv gives the spin-restricted Dirac–Kohn–Sham ΔSCF of
 * the same species (the caller's relativistic solver, so this module stays non-relativistic).
 */
export function hartreeFockDelta(
  z: number,
  charge: number,
  configurationOf: ConfigurationSource,
  relativisticDeltaEv: () => number | null,
): HartreeFockDelta {
  if (charge >= z - 1) return { eV: null, failure: 'needs at least two electrons' }
  const own = configurationOf(z, charge).subshells
  const next = configurationOf(z, charge + 1).subshells
  if (!whole(own) || !whole(next)) return { eV: null, failure: 'a determinant needs whole subshell occupations' }
  const settings = { functional: 'lda' as const, rMax: defaultRMax(z, own) }
  const run = runScf(z, own, settings)
  if (!run.converged) return { eV: null, failure: `the local-density species did not converge: ${run.failure}` }
  const nextRun = runScf(z, next, settings, run)
  if (!nextRun.converged) return { eV: null, failure: `the local-density next ion did not converge: ${nextRun.failure}` }
  const mine = restrictedOrbitals(run)
  const theirs = restrictedOrbitals(nextRun)
  if (typeof mine === 'string' || typeof theirs === 'string') return { eV: null, failure: typeof mine === 'string' ? mine : String(theirs) }
  const nonRelativisticEv = (determinantEnergy(nextRun.grid, theirs) - determinantEnergy(run.grid, mine)) * HARTREE_EV
  const dirac = relativisticDeltaEv()
  if (dirac === null) return { eV: null, failure: 'the relativistic local-density ΔSCF did not converge' }
  const relativisticShiftEv = dirac - (nextRun.totalEnergy - run.totalEnergy) * HARTREE_EV
  const eV = nonRelativisticEv + relativisticShiftEv
  const correlationEv = (correlationEnergy(nextRun.grid, theirs) - correlationEnergy(run.grid, mine)) * HARTREE_EV
  if (!Number.isFinite(eV) || !Number.isFinite(correlationEv)) return { eV: null, failure: 'the energy is not finite' }
  return { eV, nonRelativisticEv, relativisticShiftEv, correlationEv }
}
