/**
 * Relativistic ΔSCF and eigenvalue estimates of one species: the Dirac–Kohn–Sham solutions of the
 * species and of the ion with one electron fewer on one grid, as species.ts does non-relativistically.
 */
import type { SubshellOccupation } from './channels'
import { defaultJSplit } from './dirac-channels'
import { qedEnergy, screenedQedDomain } from './dirac-qed'
import { DIRAC_METHOD_NAMES, runDirac, type DiracOptions } from './dirac-scf'
import { toDiracResult } from './dirac-result'
import { defaultRMax } from './scf'
import { HARTREE_EV, type ConfigurationSource } from './species'
import type { DiracResult, DiracSpeciesEstimates } from './types'

export function diracSpeciesEstimates(
  z: number,
  charge: number,
  configurationOf: ConfigurationSource,
  options: DiracOptions = {},
): DiracSpeciesEstimates {
  if (!Number.isInteger(charge) || charge > z) throw new RangeError('the charge must be an integer no greater than Z')
  const points = options.densityPoints ?? 80
  const own: SubshellOccupation[] = configurationOf(z, charge).subshells
  // species and ion share one j split, so the ΔSCF removes an electron from one coupling scheme
  const settings = { ...options, rMax: options.rMax ?? defaultRMax(z, own), jSplit: options.jSplit ?? defaultJSplit(z, charge) }
  const run = runDirac(z, own, settings)
  const species = toDiracResult(run, points)
  if (charge === z) return { species, next: null, deltaEv: null, eigenvalueEv: null }
  const nextRun = run.converged ? runDirac(z, configurationOf(z, charge + 1).subshells, settings, run) : null
  const next: DiracResult = nextRun
    ? toDiracResult(nextRun, 0)
    : {
        method: DIRAC_METHOD_NAMES[options.functional ?? 'lsd-sic'],
        z,
        charge: charge + 1,
        converged: false,
        iterations: 0,
        totalEnergyHartree: Number.NaN,
        nucleusRadiusFm: species.nucleusRadiusFm,
        orbitals: [],
        failure: 'not attempted: the species itself did not converge',
      }
  const deltaEv = nextRun && run.converged && nextRun.converged ? (nextRun.totalEnergy - run.totalEnergy) * HARTREE_EV : null
  const top = run.converged && run.solutions.length > 0 ? Math.max(...run.solutions.map((s) => s.energy)) : null
  const out: DiracSpeciesEstimates = { species, next, deltaEv, eigenvalueEv: top === null ? null : -top * HARTREE_EV }
  // the finite nucleus is in the ΔSCF already; a He- or Li-like ion also gets its screened QED
  const electrons = own.reduce((sum, s) => sum + s.electrons, 0)
  if (deltaEv !== null && nextRun && options.nucleus !== 'point' && screenedQedDomain(z, electrons)) {
    const mine = qedEnergy(run)
    const theirs = qedEnergy(nextRun)
    if (mine && theirs) {
      out.screenedQed = {
        selfEnergyEv: (theirs.selfEnergyHartree - mine.selfEnergyHartree) * HARTREE_EV,
        vacuumPolarisationEv: (theirs.vacuumPolarisationHartree - mine.vacuumPolarisationHartree) * HARTREE_EV,
      }
    }
  }
  return out
}
