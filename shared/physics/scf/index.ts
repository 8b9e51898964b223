/**
 * The central-field self-consistent-field atom solver: public entry.
 *
 * Method ('lsd-sic-spherical'): non-relativistic Kohn–Sham central field with local spin-density
 * exchange–correlation (Slater exchange, Vosko–Wilk–Nusair correlation; xc.ts) and the Perdew–Zunger
 * self-interaction correction orbital by orbital in the spherical approximation (sic.ts), Hund's-rule
 * spin occupations (channels.ts), a logarithmic radial grid (grid.ts), Numerov shooting with node
 * counting (radial.ts) and Anderson density mixing (mixing.ts). The correction gives every orbital the
 * −(Z − N + 1)/r tail of a neutral atom or ion and makes one-electron ions exact.
 *
 * Everything here is a pure function of its arguments: no module state, no I/O, results are plain
 * JSON (a failed solve has totalEnergyHartree NaN, which JSON writes as null, and a failure reason).
 */
import { groundConfiguration } from '../configuration'
import { getElement } from '../elements'
import { METHODS, methodDomainReason } from '../methods'
import type { DiracOptions } from './dirac-scf'
import { diracSpeciesEstimates } from './dirac-species'
import type { SubshellOccupation } from './channels'
import { hartreeFockDelta } from './hf-species'
import { METHOD_NAMES, type ScfOptions } from './options'
import { toResult } from './result'
import { runScf } from './scf'
import { speciesEstimates, type ScfSpeciesOptions } from './species'
import type { DiracSpeciesEstimates, ScfResult, ScfSpeciesEstimates } from './types'

export type { ScfOrbital, ScfRadialDensity, ScfResult, ScfSpeciesEstimates } from './types'
export type { DiracOrbital, DiracRadialDensity, DiracResult, DiracSpeciesEstimates } from './types'
export type { DiracOptions } from './dirac-scf'
export { DIRAC_METHOD_NAMES, runDirac } from './dirac-scf'
export type { ScfFunctional, ScfOptions } from './options'
export type { ConfigurationSource, ScfSpeciesOptions } from './species'
export { HARTREE_EV } from './species'

const HF_DELTA = METHODS.find((m) => m.name === 'hf-delta')!
const HF_CORRELATED = METHODS.find((m) => m.name === 'hf-correlated-delta')!

/** The production method's name as shown to users. */
export const SCF_METHOD: string = METHOD_NAMES['lsd-sic']

/** Solve one electron configuration of element z (charge = z − electrons); throws RangeError on an impossible configuration. */
export function solveConfiguration(z: number, subshells: SubshellOccupation[], options: ScfOptions = {}): ScfResult {
  return toResult(runScf(z, subshells, options), options.densityPoints ?? 80)
}

/**
 * ΔSCF (E(next ion) − E(species)) and eigenvalue ionisation energies of (z, charge); ground
 * configurations from the engine's groundConfiguration unless options.configurationOf is given.
 */
export function solveSpeciesScf(z: number, charge: number, options: ScfSpeciesOptions = {}): ScfSpeciesEstimates {
  return speciesEstimates(z, charge, options.configurationOf ?? groundConfiguration, options)
}

/**
 * The relativistic (Dirac–Kohn–Sham) ΔSCF and eigenvalue estimates of (z, charge), finite nucleus of
 * the most abundant isotope unless options.massNumber says otherwise.
 */
export function solveSpeciesDirac(z: number, charge: number, options: DiracOptions & ScfSpeciesOptions = {}): DiracSpeciesEstimates {
  const massNumber = options.massNumber ?? getElement(z)?.principalMassNumber
  return diracSpeciesEstimates(z, charge, options.configurationOf ?? groundConfiguration, { ...options, massNumber })
}

/**
 * Both solvers for one species, as the cache stores them: the non-relativistic estimates with
 * `dirac` beside, the relativistic ΔSCF without the self-interaction correction
 * (`dirac-lsd-delta`, a total-energy difference only: no densities are kept for it) and the
 * Hartree–Fock ΔSCF on local-density orbitals with its relativistic shift, without and with local
 * correlation (`hf-delta`, `hf-correlated-delta`, hf-species.ts).
 */
export function solveSpeciesAll(z: number, charge: number, options: ScfSpeciesOptions = {}): ScfSpeciesEstimates {
  const lsd = solveSpeciesDirac(z, charge, { ...options, functional: 'lsd', densityPoints: 0 })
  // the Hartree–Fock methods only where their domains say: elsewhere the record gives the reason
  const electrons = z - charge
  const exchangeOnly = !methodDomainReason(HF_DELTA, z, charge, electrons)
  const correlated = !methodDomainReason(HF_CORRELATED, z, charge, electrons)
  const hf =
    exchangeOnly || correlated
      ? hartreeFockDelta(z, charge, options.configurationOf ?? groundConfiguration, () =>
          solveSpeciesDirac(z, charge, { ...options, functional: 'lda', densityPoints: 0 }).deltaEv,
        )
      : null
  const withCorrelation = hf?.eV != null && hf.correlationEv !== undefined ? hf.eV + hf.correlationEv : null
  return {
    ...solveSpeciesScf(z, charge, options),
    dirac: solveSpeciesDirac(z, charge, options),
    byMethod: {
      'dirac-lsd-delta': lsd.deltaEv,
      'hf-delta': exchangeOnly && hf ? hf.eV : null,
      'hf-correlated-delta': correlated ? withCorrelation : null,
    },
  }
}
