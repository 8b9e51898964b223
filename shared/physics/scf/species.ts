/**
 * ΔSCF estimates for one species: solve it and the ion with one electron fewer in the same grid
 * and take the difference of total energies (the ΔSCF method; common practice, no source), here
 * with the self-interaction-corrected functional of sic.ts.
 */
import type { SubshellOccupation } from './channels'
import { METHOD_NAMES, type ScfOptions } from './options'
import { toResult } from './result'
import { defaultRMax, runScf, type ScfRun } from './scf'
import type { ScfSpeciesEstimates } from './types'

/** hartree in eV, CODATA 2018 */
export const HARTREE_EV = 27.211386245988

/** Where the ground configuration of (z, charge) comes from. */
export type ConfigurationSource = (z: number, charge: number) => { subshells: SubshellOccupation[] }

/** Options of solveSpeciesScf: the solver's, and the configuration source (default: the engine's ground configurations). */
export interface ScfSpeciesOptions extends ScfOptions {
  configurationOf?: ConfigurationSource
}

/** The highest occupied orbital eigenvalue of a converged run, spin resolved, hartree. */
function highestOccupied(run: ScfRun): number | null {
  if (!run.converged || run.solutions.length === 0) return null
  return Math.max(...run.solutions.map((s) => s.energy))
}

/**
 * The species and its next ion with the ΔSCF and eigenvalue ionisation energies. The ion starts
 * from the species' orbitals, which roughly halves its iterations; its result carries no density
 * table (it is cached as a species of its own).
 */
export function speciesEstimates(
  z: number,
  charge: number,
  configurationOf: ConfigurationSource,
  options: ScfOptions = {},
): ScfSpeciesEstimates {
  if (!Number.isInteger(charge) || charge > z) throw new RangeError('the charge must be an integer no greater than Z')
  const points = options.densityPoints ?? 80
  const own = configurationOf(z, charge).subshells
  const settings = { ...options, rMax: options.rMax ?? defaultRMax(z, own) }
  const run = runScf(z, own, settings)
  const species = toResult(run, points)
  if (charge === z) return { species, next: null, deltaEv: null, eigenvalueEv: null }

  const nextRun = run.converged
    ? runScf(z, configurationOf(z, charge + 1).subshells, settings, run)
    : null
  const next = nextRun
    ? toResult(nextRun, 0)
    : {
        method: METHOD_NAMES[options.functional ?? 'lsd-sic'],
        z,
        charge: charge + 1,
        converged: false,
        iterations: 0,
        totalEnergyHartree: Number.NaN,
        orbitals: [],
        failure: 'not attempted: the species itself did not converge',
      }
  const deltaEv =
    nextRun && run.converged && nextRun.converged ? (nextRun.totalEnergy - run.totalEnergy) * HARTREE_EV : null
  const top = highestOccupied(run)
  return { species, next, deltaEv, eigenvalueEv: top === null ? null : -top * HARTREE_EV }
}
