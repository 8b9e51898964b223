/**
 * The self-consistency loop: potentials from the input orbital densities, orbitals in those
 * potentials, Anderson mixing of the orbital densities, until input and output agree.
 */
import { buildChannels, checkSubshells, type Channel, type SubshellOccupation } from './channels'
import { createField, totalEnergy, type ChannelSolution } from './field'
import { makeLogGrid, type RadialGrid } from './grid'
import { andersonMixer } from './mixing'
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

const MIX_BETA = 0.6
const MIX_DEPTH = 5
/** how many times a run may step back after an orbital came out unbound */
const MAX_BACKOFFS = 4

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
 * on the same grid, only supplies the starting densities.
 */
export function runScf(z: number, subshells: SubshellOccupation[], options: ScfOptions = {}, seed?: ScfRun): ScfRun {
  const functional: ScfFunctional = options.functional ?? 'lsd-sic'
  const occupied = checkSubshells(z, subshells)
  const channels = buildChannels(occupied, functional)
  const electrons = occupied.reduce((s, o) => s + o.electrons, 0)
  const charge = z - electrons
  const rMax = options.rMax ?? defaultRMax(z, occupied)
  const grid = makeLogGrid(z, { h: options.gridStep, rMax })
  const base = { method: METHOD_NAMES[functional], z, charge, grid }
  if (channels.length === 0) return { ...base, converged: true, iterations: 0, totalEnergy: 0, solutions: [] }

  const maxIterations = options.maxIterations ?? 120
  const tolerance = (options.tolerance ?? 1e-6) * electrons
  const size = grid.size
  const count = channels.length
  const rws = radialWorkspace(grid)
  const fail = (iterations: number, failure: string, solutions: ChannelSolution[] = []): ScfRun => ({
    ...base,
    converged: false,
    iterations,
    totalEnergy: Number.NaN,
    failure,
    solutions,
  })

  // Iteration zero: a neighbouring solution (the species, when solving its ion) or, failing that,
  // orbitals in the Thomas–Fermi potential give the first input densities.
  const energies = new Float64Array(count)
  let xIn: Float64Array = new Float64Array(count * size)
  let v0: Float64Array | null = null
  for (let c = 0; c < count; c++) {
    const ch = channels[c]
    const from = seed && seed.grid.size === size && seed.grid.r[0] === grid.r[0] ? seedFor(ch, seed.solutions) : null
    let p: Float64Array
    if (from) {
      energies[c] = from.energy
      p = from.p
    } else {
      v0 ??= startingPotential(grid, z, electrons)
      const s = solveBoundState(grid, v0, z, ch.n, ch.l, -0.5 * (z / ch.n) ** 2, rws)
      if (typeof s === 'string') return fail(0, s)
      energies[c] = s.energy
      p = s.p
    }
    for (let i = 0; i < size; i++) xIn[c * size + i] = ch.occupation * p[i] * p[i]
  }

  const weights = new Float64Array(count * size)
  for (let c = 0; c < count; c++) weights.set(grid.dr, c * size)
  const mixer = andersonMixer(weights, MIX_BETA, MIX_DEPTH)
  const field = createField(z, grid, channels, functional)

  // Orbitals of every channel in the given potentials, or the first failure.
  const solveAll = (potentials: Float64Array[], tol: number): { solutions: ChannelSolution[]; xOut: Float64Array } | string => {
    const xOut = new Float64Array(count * size)
    const found: ChannelSolution[] = []
    for (let c = 0; c < count; c++) {
      const ch = channels[c]
      const s = solveBoundState(grid, potentials[c], z, ch.n, ch.l, energies[c], rws, tol)
      if (typeof s === 'string') return s
      energies[c] = s.energy
      found.push({ channel: ch, energy: s.energy, p: s.p })
      for (let i = 0; i < size; i++) xOut[c * size + i] = ch.occupation * s.p[i] * s.p[i]
    }
    return { solutions: found, xOut }
  }

  let solutions: ChannelSolution[] = []
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
      v0 ??= startingPotential(grid, z, electrons)
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
      const energy = totalEnergy(z, grid, field, solutions, xOut)
      if (!Number.isFinite(energy)) return fail(iteration, 'the total energy is not finite', solutions)
      return { ...base, converged: true, iterations: iteration, totalEnergy: energy, solutions }
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
function seedFor(ch: Channel, solutions: ChannelSolution[]): ChannelSolution | null {
  const same = solutions.filter((s) => s.channel.n === ch.n && s.channel.l === ch.l)
  return same.find((s) => s.channel.spin === ch.spin) ?? same[0] ?? null
}

/**
 * Mixed densities can dip below zero where the orbitals have nodes; clip them and restore each
 * channel's electron count, so the potentials stay real and neutral where they should be.
 */
function clipAndNormalise(x: Float64Array, channels: Channel[], grid: RadialGrid): Float64Array {
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
