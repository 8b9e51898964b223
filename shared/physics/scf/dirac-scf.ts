/**
 * The relativistic self-consistency loop: the Dirac–Kohn–Sham (Dirac–Slater) central-field atom of
 * D. A. Liberman, D. T. Cromer and J. T. Waber, Comput. Phys. Commun. 2, 107 (1971), with the
 * local spin-density exchange–correlation and self-interaction correction of the non-relativistic
 * solver (field.ts, xc.ts, sic.ts), a finite nucleus (nucleus.ts) and nlj channels
 * (dirac-channels.ts). The loop is the one of scf.ts with the Dirac radial solver in place of
 * Numerov's: densities are occupation·(G² + F²).
 */
import { checkSubshells, type SubshellOccupation } from './channels'
import { buildDiracChannels, defaultJSplit, type DiracChannel, type JSplit } from './dirac-channels'
import { diracWorkspace, solveDiracState } from './dirac-radial'
import { createField } from './field'
import { makeLogGrid, type RadialGrid } from './grid'
import { andersonMixer } from './mixing'
import { nuclearPotential, sphereRadiusBohr } from './nucleus'
import type { ScfFunctional, ScfOptions } from './options'
import { startingPotential } from './potential'
import { defaultRMax } from './scf'

export interface DiracOptions extends ScfOptions {
  /** 'finite' (default): uniform sphere with the Johnson–Soff radius; 'point': −Z/r */
  nucleus?: 'finite' | 'point'
  /** mass number for the nuclear radius (default: the most abundant isotope, from the caller) */
  massNumber?: number
  /** how open nl subshells are shared between their j parts (default: defaultJSplit) */
  jSplit?: JSplit
  /**
   * the relativistic correction to local exchange (xc-relativistic.ts), also inside the
   * self-interaction terms so one-electron ions stay exact; default true: the NIST RLDA setting,
   * and it moves the uranium K-shell eigenvalue from +0.65 % to +0.54 % of the X-ray value
   */
  relativisticExchange?: boolean
}

export const DIRAC_METHOD_NAMES: Record<ScfFunctional, string> = {
  'lsd-sic': 'dks-lsd-sic-spherical',
  lsd: 'dks-lsd-spherical',
  lda: 'dks-lda-spherical',
}

export interface DiracSolution {
  channel: DiracChannel
  energy: number
  g: Float64Array
  f: Float64Array
}

export interface DiracRun {
  method: string
  z: number
  charge: number
  converged: boolean
  iterations: number
  totalEnergy: number
  failure?: string
  grid: RadialGrid
  nucleusRadius: number
  solutions: DiracSolution[]
}

const MIX_BETA = 0.6
const MIX_DEPTH = 5
const MAX_BACKOFFS = 4

/** Solve one configuration self-consistently; seed (a run on the same grid) supplies starting densities. */
export function runDirac(z: number, subshells: SubshellOccupation[], options: DiracOptions = {}, seed?: DiracRun): DiracRun {
  const functional: ScfFunctional = options.functional ?? 'lsd-sic'
  const occupied = checkSubshells(z, subshells)
  const electrons = occupied.reduce((s, o) => s + o.electrons, 0)
  const charge = z - electrons
  const channels = buildDiracChannels(occupied, functional, options.jSplit ?? defaultJSplit(z, charge))
  const rMax = options.rMax ?? defaultRMax(z, occupied)
  const grid = makeLogGrid(z, { h: options.gridStep, rMax })
  const radius = options.nucleus === 'point' ? 0 : sphereRadiusBohr(options.massNumber ?? Math.max(1, Math.round(2.5 * z)))
  const nuclear = nuclearPotential(grid, z, radius)
  const base = { method: DIRAC_METHOD_NAMES[functional], z, charge, grid, nucleusRadius: radius }
  if (channels.length === 0) return { ...base, converged: true, iterations: 0, totalEnergy: 0, solutions: [] }

  const maxIterations = options.maxIterations ?? 120
  const tolerance = (options.tolerance ?? 1e-6) * electrons
  const size = grid.size
  const count = channels.length
  const ws = diracWorkspace(grid)
  const fail = (iterations: number, failure: string, solutions: DiracSolution[] = []): DiracRun => ({
    ...base,
    converged: false,
    iterations,
    totalEnergy: Number.NaN,
    failure,
    solutions,
  })
  const solveOne = (v: Float64Array, ch: DiracChannel, guess: number, tol: number) =>
    solveDiracState(grid, v, z, ch.n, ch.kappa, guess, ws, tol, radius)

  const energies = new Float64Array(count)
  let xIn: Float64Array = new Float64Array(count * size)
  let v0: Float64Array | null = null
  const startV = () => {
    const tf = startingPotential(grid, z, electrons)
    // the Thomas–Fermi start screens a point charge; swap in the finite nucleus
    for (let i = 0; i < size; i++) tf[i] += nuclear[i] + z / grid.r[i]
    return tf
  }
  for (let c = 0; c < count; c++) {
    const ch = channels[c]
    const from = seed && seed.grid.size === size && seed.grid.r[0] === grid.r[0] ? seedFor(ch, seed.solutions) : null
    if (from) {
      energies[c] = from.energy
      for (let i = 0; i < size; i++) xIn[c * size + i] = ch.occupation * (from.g[i] ** 2 + from.f[i] ** 2)
      continue
    }
    v0 ??= startV()
    const s = solveOne(v0, ch, -0.5 * (z / ch.n) ** 2, 1e-8)
    if (typeof s === 'string') return fail(0, s)
    energies[c] = s.energy
    for (let i = 0; i < size; i++) xIn[c * size + i] = ch.occupation * (s.g[i] ** 2 + s.f[i] ** 2)
  }

  const weights = new Float64Array(count * size)
  for (let c = 0; c < count; c++) weights.set(grid.dr, c * size)
  const mixer = andersonMixer(weights, MIX_BETA, MIX_DEPTH)
  const field = createField(z, grid, channels, functional, nuclear, options.relativisticExchange ?? true)

  const solveAll = (potentials: Float64Array[], tol: number): { solutions: DiracSolution[]; xOut: Float64Array } | string => {
    const xOut = new Float64Array(count * size)
    const found: DiracSolution[] = []
    for (let c = 0; c < count; c++) {
      const ch = channels[c]
      const s = solveOne(potentials[c], ch, energies[c], tol)
      if (typeof s === 'string') return s
      energies[c] = s.energy
      found.push({ channel: ch, energy: s.energy, g: s.g, f: s.f })
      const o = c * size
      for (let i = 0; i < size; i++) xOut[o + i] = ch.occupation * (s.g[i] * s.g[i] + s.f[i] * s.f[i])
    }
    return { solutions: found, xOut }
  }

  let solutions: DiracSolution[] = []
  let best = Infinity
  let worse = 0
  let backoffs = 0
  let lastGood: { x: Float64Array; out: Float64Array } | null = null
  let lastUnbound = ''
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
        const { x, out } = lastGood
        const step = 0.3 / backoffs
        xIn = clipAndNormalise(x.map((v, k) => v + step * (out[k] - v)), channels, grid)
        continue
      }
      v0 ??= startV()
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
      const energy = diracTotalEnergy(grid, field.potentials, nuclear, solutions) + sumTerms(field.build(xOut))
      if (!Number.isFinite(energy)) return fail(iteration, 'the total energy is not finite', solutions)
      return { ...base, converged: true, iterations: iteration, totalEnergy: energy, solutions }
    }
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
      return fail(iteration, `not self-consistent after ${iteration} iterations (residual ${perElectron} per electron)`, solutions)
    }
  }
  return fail(maxIterations, `not self-consistent after ${maxIterations} iterations, the last ended by: ${lastUnbound}`)
}

const sumTerms = (t: { hartree: number; xc: number; sic: number }) => t.hartree + t.xc + t.sic

/**
 * The one-electron part of the total energy, Σ q·(ε − ⟨v⟩) + ∫ρ·v_nuc: ε − ⟨v⟩ is the kinetic
 * (Dirac, rest energy removed) energy of each orbital in the potential v it was solved in.
 * Must be called before the field is rebuilt from the output densities.
 */
function diracTotalEnergy(grid: RadialGrid, potentials: Float64Array[], nuclear: Float64Array, solutions: DiracSolution[]): number {
  let sum = 0
  for (let c = 0; c < solutions.length; c++) {
    const { channel, energy, g, f } = solutions[c]
    const v = potentials[c]
    let pot = 0
    let nuc = 0
    for (let i = 0; i < grid.size; i++) {
      const w = grid.dr[i] * (g[i] * g[i] + f[i] * f[i])
      pot += w * v[i]
      nuc += w * nuclear[i]
    }
    sum += channel.occupation * (energy - pot + nuc)
  }
  return sum
}

function seedFor(ch: DiracChannel, solutions: DiracSolution[]): DiracSolution | null {
  const same = solutions.filter((s) => s.channel.n === ch.n && s.channel.kappa === ch.kappa)
  return same.find((s) => s.channel.spin === ch.spin) ?? same[0] ?? null
}

/** As in scf.ts: clip negative mixed densities and restore each channel's electron count. */
function clipAndNormalise(x: Float64Array, channels: DiracChannel[], grid: RadialGrid): Float64Array {
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
