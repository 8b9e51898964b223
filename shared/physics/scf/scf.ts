/**
 * The non-relativistic solver: Numerov orbitals (radial.ts) of the channels of channels.ts in the
 * Kohn–Sham field of field.ts, iterated to self-consistency by the loop of iteration.ts.
 */
import { buildChannels, checkSubshells, type Channel, type SubshellOccupation } from './channels'
import { createField, totalEnergy, type ChannelSolution } from './field'
import { makeLogGrid, type RadialGrid } from './grid'
import { iterate, type OrbitalProblem } from './iteration'
import { METHOD_NAMES, type ScfFunctional, type ScfOptions } from './options'
import { startingPotential } from './potential'
import { radialWorkspace, solveBoundState } from './radial'

export type { ChannelSolution } from './field'

/** Everything the loop knows at the end; result.ts turns it into the public ScfResult. */
export interface ScfRun {
  method: string
  z: number
  charge: number
  converged: boolean
  iterations: number
  totalEnergy: number
  failure?: string
  grid: RadialGrid
  solutions: ChannelSolution[]
}

/**
 * Outer grid radius, bohr: far enough that the outermost orbital (hydrogen-like size n²/(q + 1)
 * for an ion of charge q) has decayed by many e-folds, never more than 60 bohr.
 */
export function defaultRMax(z: number, subshells: SubshellOccupation[]): number {
  const electrons = subshells.reduce((s, o) => s + o.electrons, 0)
  const nMax = subshells.reduce((m, o) => (o.electrons > 0 ? Math.max(m, o.n) : m), 1)
  const charge = Math.max(0, z - electrons)
  return Math.min(60, Math.max(20, (40 * nMax * nMax) / (charge + 1)))
}

/**
 * Solve one configuration self-consistently (the engine behind solveConfiguration); seed, a run
 * on the same grid, only supplies the starting densities. The loop itself is iteration.ts.
 */
export function runScf(z: number, subshells: SubshellOccupation[], options: ScfOptions = {}, seed?: ScfRun): ScfRun {
  const functional: ScfFunctional = options.functional ?? 'lsd-sic'
  const occupied = checkSubshells(z, subshells)
  const channels = buildChannels(occupied, functional)
  const electrons = occupied.reduce((s, o) => s + o.electrons, 0)
  const charge = z - electrons
  const rMax = options.rMax ?? defaultRMax(z, occupied)
  const grid = makeLogGrid(z, { h: options.gridStep, rMax })
  const rws = radialWorkspace(grid)
  const field = createField(z, grid, channels, functional)
  const problem: OrbitalProblem<Channel, ChannelSolution> = {
    z,
    grid,
    channels,
    electrons,
    field,
    solve(ch, v, guess, tolerance) {
      const s = solveBoundState(grid, v, z, ch.n, ch.l, guess, rws, tolerance)
      return typeof s === 'string' ? s : { channel: ch, energy: s.energy, p: s.p }
    },
    density(ch, { p }, x, o) {
      for (let i = 0; i < grid.size; i++) x[o + i] = ch.occupation * p[i] * p[i]
    },
    startingPotential: () => startingPotential(grid, z, electrons),
    startTolerance: 1e-11,
    sameSubshell: (a, b) => a.n === b.n && a.l === b.l,
    totalEnergy: (solutions, xOut) => totalEnergy(z, grid, field, solutions, xOut),
  }
  const run = iterate(problem, { maxIterations: options.maxIterations ?? 120, tolerance: (options.tolerance ?? 1e-6) * electrons }, seed)
  return { method: METHOD_NAMES[functional], z, charge, grid, ...run }
}
