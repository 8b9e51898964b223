/**
 * The self-consistency loop both solvers share: potentials from the input orbital densities,
 * orbitals in those potentials, Anderson mixing of the orbital densities, until input and output
 * agree, with a step back when an orbital comes out unbound. The non-relativistic (scf.ts) and the
 * relativistic (dirac-scf.ts) solver each bring their channels, radial solve, density and total
 * energy; everything else is here once.
 */
import type { Channel } from './channels'
import type { Field } from './field'
import type { RadialGrid } from './grid'
import { andersonMixer } from './mixing'

/** A solved orbital: the channel it belongs to and its eigenvalue (plus the solver's radial functions). */
export interface Orbital<C extends Channel> {
  channel: C
  energy: number
}

/** What a solver brings to the loop. */
export interface OrbitalProblem<C extends Channel, S extends Orbital<C>> {
  z: number
  grid: RadialGrid
  channels: readonly C[]
  electrons: number
  field: Field
  /** The orbital of channel ch in potential v, from the eigenvalue guess, to tolerance; or why there is none. */
  solve(ch: C, v: Float64Array, guess: number, tolerance: number): S | string
  /**
   * Writes ch's occupation × the density of s into x[offset …] (the channel's slice of the density
   * vector); s may be a seed's orbital, whose own channel holds another occupation.
   */
  density(ch: C, s: S, x: Float64Array, offset: number): void
  /** A potential whose tail binds every orbital: the first orbitals, and the blend of a first back-off. */
  startingPotential(): Float64Array
  /** eigenvalue tolerance of the first orbitals in the starting potential */
  startTolerance: number
  /** whether two channels are the same subshell (spin aside), for taking orbitals from a seed */
  sameSubshell(a: C, b: C): boolean
  /** The total energy of converged orbitals; called while the field still holds the potentials they were solved in. */
  totalEnergy(solutions: S[], xOut: Float64Array): number
}

export interface IterationOptions {
  maxIterations: number
  /** on ∫|x_out − x_in| dr summed over channels (already multiplied by the electron count) */
  tolerance: number
}

export interface IterationResult<S> {
  converged: boolean
  iterations: number
  totalEnergy: number
  failure?: string
  solutions: S[]
}

const MIX_BETA = 0.6
const MIX_DEPTH = 5
/** how many times a run may step back after an orbital came out unbound */
const MAX_BACKOFFS = 4

/**
 * Iterate problem to self-consistency; seed, a run on the same grid, only supplies the starting
 * densities (a run on another grid is ignored).
 */
export function iterate<C extends Channel, S extends Orbital<C>>(
  problem: OrbitalProblem<C, S>,
  options: IterationOptions,
  seed?: { grid: RadialGrid; solutions: readonly S[] },
): IterationResult<S> {
  const { z, grid, channels, electrons, field } = problem
  if (channels.length === 0) return { converged: true, iterations: 0, totalEnergy: 0, solutions: [] }
  const { maxIterations, tolerance } = options
  const size = grid.size
  const count = channels.length
  const fail = (iterations: number, failure: string, solutions: S[] = []): IterationResult<S> => ({
    converged: false,
    iterations,
    totalEnergy: Number.NaN,
    failure,
    solutions,
  })

  // Iteration zero: a neighbouring solution (the species, when solving its ion) or, failing that,
  // orbitals in the starting potential give the first input densities.
  const energies = new Float64Array(count)
  let xIn: Float64Array = new Float64Array(count * size)
  let v0: Float64Array | null = null
  const seeded = seed && seed.grid.size === size && seed.grid.r[0] === grid.r[0] ? seed.solutions : null
  for (let c = 0; c < count; c++) {
    const ch = channels[c]
    let s = seeded ? seedFor(ch, seeded, problem.sameSubshell) : null
    if (!s) {
      v0 ??= problem.startingPotential()
      const solved = problem.solve(ch, v0, -0.5 * (z / ch.n) ** 2, problem.startTolerance)
      if (typeof solved === 'string') return fail(0, solved)
      s = solved
    }
    energies[c] = s.energy
    problem.density(ch, s, xIn, c * size)
  }

  const weights = new Float64Array(count * size)
  for (let c = 0; c < count; c++) weights.set(grid.dr, c * size)
  const mixer = andersonMixer(weights, MIX_BETA, MIX_DEPTH)

  // Orbitals of every channel in the given potentials, or the first failure.
  const solveAll = (potentials: Float64Array[], tol: number): { solutions: S[]; xOut: Float64Array } | string => {
    const xOut = new Float64Array(count * size)
    const found: S[] = []
    for (let c = 0; c < count; c++) {
      const ch = channels[c]
      const s = problem.solve(ch, potentials[c], energies[c], tol)
      if (typeof s === 'string') return s
      energies[c] = s.energy
      found.push(s)
      problem.density(ch, s, xOut, c * size)
    }
    return { solutions: found, xOut }
  }

  let solutions: S[] = []
  let best = Infinity
  let worse = 0
  let backoffs = 0
  let lastGood: { x: Float64Array; out: Float64Array } | null = null
  let lastUnbound = ''
  // Eigenvalues need be no sharper than the densities they come from; the last iterations use 1e-11.
  let eigenTolerance = 1e-8
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    field.build(xIn)
    const solved = solveAll(field.potentials, eigenTolerance)
    if (typeof solved === 'string') {
      if (backoffs >= MAX_BACKOFFS) return fail(iteration, solved)
      lastUnbound = solved
      backoffs++
      mixer.reset()
      if (lastGood) {
        // An extrapolated density can push a weakly bound orbital out of the atom: take a short
        // linear step from the last good iteration instead.
        const { x, out } = lastGood
        const step = 0.3 / backoffs
        xIn = clipAndNormalise(x.map((v, k) => v + step * (out[k] - v)), channels, grid)
        continue
      }
      // The first field may not bind a shallow orbital (a 4f without a Coulomb tail): solve once
      // in a blend with the starting potential, whose tail binds everything, and start from that.
      v0 ??= problem.startingPotential()
      const start = v0
      const blend = 0.5 ** backoffs
      const blended = field.potentials.map((v) => v.map((vi, i) => start[i] + blend * (vi - start[i])))
      const retry = solveAll(blended, eigenTolerance)
      if (typeof retry !== 'string') xIn = retry.xOut
      continue
    }
    solutions = solved.solutions
    const xOut = solved.xOut
    lastGood = { x: xIn, out: xOut }
    let residual = 0
    for (let k = 0; k < xOut.length; k++) residual += weights[k] * Math.abs(xOut[k] - xIn[k])
    if (!Number.isFinite(residual)) return fail(iteration, 'the density became non-finite', solutions)
    if (residual < tolerance) {
      const energy = problem.totalEnergy(solutions, xOut)
      if (!Number.isFinite(energy)) return fail(iteration, 'the total energy is not finite', solutions)
      return { converged: true, iterations: iteration, totalEnergy: energy, solutions }
    }
    // A run of steps that make the residual worse means the history misleads: start it afresh.
    if (residual < best) {
      best = residual
      worse = 0
    } else if (++worse >= 4) {
      mixer.reset()
      worse = 0
      best = residual
    }
    eigenTolerance = Math.min(1e-8, Math.max(1e-11, (1e-4 * residual) / electrons))
    xIn = clipAndNormalise(mixer.next(xIn, xOut), channels, grid)
    if (iteration === maxIterations) {
      const perElectron = (residual / electrons).toExponential(1)
      const plural = iteration === 1 ? '' : 's'
      return fail(iteration, `not self-consistent after ${iteration} iteration${plural} (residual ${perElectron} per electron)`, solutions)
    }
  }
  return fail(maxIterations, `not self-consistent after ${maxIterations} iterations, the last ended by: ${lastUnbound}`)
}

/** The seed's orbital for a channel: same subshell and spin, else the same subshell in either spin. */
function seedFor<C extends Channel, S extends Orbital<C>>(ch: C, solutions: readonly S[], sameSubshell: (a: C, b: C) => boolean): S | null {
  const same = solutions.filter((s) => sameSubshell(s.channel, ch))
  return same.find((s) => s.channel.spin === ch.spin) ?? same[0] ?? null
}

/**
 * Mixed densities can dip below zero where the orbitals have nodes; clip them and restore each
 * channel's electron count, so the potentials stay real and neutral where they should be.
 */
function clipAndNormalise(x: Float64Array, channels: readonly Channel[], grid: RadialGrid): Float64Array {
  const size = grid.size
  for (let c = 0; c < channels.length; c++) {
    const o = c * size
    let q = 0
    for (let i = 0; i < size; i++) {
      if (x[o + i] < 0) x[o + i] = 0
      q += grid.dr[i] * x[o + i]
    }
    const s = q > 0 ? channels[c].occupation / q : 1
    for (let i = 0; i < size; i++) x[o + i] *= s
  }
  return x
}
