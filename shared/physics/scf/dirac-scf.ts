/**
 * The relativistic self-consistency loop: the Dirac–Kohn–Sham (Dirac–Slater) central-field atom of
 * D. A. Liberman, D. T. Cromer and J. T. Waber, Comput. Phys. Commun. 2, 107 (1971), with the
 * local spin-density exchange–correlation and self-interaction correction of the non-relativistic
 * solver (field.ts, xc.ts, sic.ts), a finite nucleus (nucleus.ts) and nlj channels
 * (dirac-channels.ts). The loop is the one of iteration.ts, shared with scf.ts, with the Dirac
 * radial solver in place of Numerov's: densities are occupation·(G² + F²).
 */
import { checkSubshells, type SubshellOccupation } from './channels'
import { buildDiracChannels, defaultJSplit, type DiracChannel, type JSplit } from './dirac-channels'
import { diracWorkspace, solveDiracState } from './dirac-radial'
import { createField } from './field'
import { makeLogGrid, type RadialGrid } from './grid'
import { iterate, type OrbitalProblem } from './iteration'
import { nuclearPotential, sphereRadiusBohr } from './nucleus'
import { DIRAC_METHOD_NAMES, type ScfFunctional, type ScfOptions } from './options'
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

export { DIRAC_METHOD_NAMES }

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
  const ws = diracWorkspace(grid)
  const field = createField(z, grid, channels, functional, nuclear, options.relativisticExchange ?? true)
  const problem: OrbitalProblem<DiracChannel, DiracSolution> = {
    z,
    grid,
    channels,
    electrons,
    field,
    solve(ch, v, guess, tolerance) {
      const s = solveDiracState(grid, v, z, ch.n, ch.kappa, guess, ws, tolerance, radius)
      return typeof s === 'string' ? s : { channel: ch, energy: s.energy, g: s.g, f: s.f }
    },
    density(ch, { g, f }, x, o) {
      for (let i = 0; i < grid.size; i++) x[o + i] = ch.occupation * (g[i] * g[i] + f[i] * f[i])
    },
    startingPotential() {
      const tf = startingPotential(grid, z, electrons)
      // the Thomas–Fermi start screens a point charge; swap in the finite nucleus
      for (let i = 0; i < grid.size; i++) tf[i] += nuclear[i] + z / grid.r[i]
      return tf
    },
    startTolerance: 1e-8,
    sameSubshell: (a, b) => a.n === b.n && a.kappa === b.kappa,
    totalEnergy: (solutions, xOut) => diracTotalEnergy(grid, field.potentials, nuclear, solutions) + sumTerms(field.build(xOut)),
  }
  const run = iterate(problem, { maxIterations: options.maxIterations ?? 120, tolerance: (options.tolerance ?? 1e-6) * electrons }, seed)
  return { method: DIRAC_METHOD_NAMES[functional], z, charge, grid, nucleusRadius: radius, ...run }
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
