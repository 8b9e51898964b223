/** Knobs of the SCF solver. Every field is optional; the defaults are the production settings. */

/**
 * 'lsd-sic': spin-polarised local density with the Perdew–Zunger self-interaction correction (the
 * production method); 'lsd': the same without the correction; 'lda': spin-restricted local density,
 * the setting of the NIST atomic reference tables, kept so the numerics can be checked against them.
 */
export type ScfFunctional = 'lsd-sic' | 'lsd' | 'lda'

/** The method name each functional reports in ScfResult.method. */
export const METHOD_NAMES: Record<ScfFunctional, string> = {
  'lsd-sic': 'lsd-sic-spherical',
  lsd: 'lsd-spherical',
  lda: 'lda-spherical',
}

/** The same for the relativistic (Dirac–Kohn–Sham) solver, in DiracResult.method. */
export const DIRAC_METHOD_NAMES: Record<ScfFunctional, string> = {
  'lsd-sic': 'dks-lsd-sic-spherical',
  lsd: 'dks-lsd-spherical',
  lda: 'dks-lda-spherical',
}

export interface ScfOptions {
  functional?: ScfFunctional
  /** SCF iterations before giving up (default 120) */
  maxIterations?: number
  /** self-consistency reached when ∫|p_out − p_in| dr summed over orbitals, per electron, is below this (default 1e-6) */
  tolerance?: number
  /** log-grid step in ln r (default 0.04) */
  gridStep?: number
  /** outermost grid radius in bohr (default chosen from the charge and the outermost shell) */
  rMax?: number
  /** points of the coarse radial-density table; 0 leaves it out (default 80) */
  densityPoints?: number
}

/**
 * What hf-delta's number rests on (scf/hf-species.ts), as the record's basis: the Hartree–Fock
 * determinant energy on spin-restricted local-density orbitals, with the relativistic shift of the
 * spin-restricted Dirac–Kohn–Sham ΔSCF.
 */
export const HF_DELTA_BASIS = `hartree-fock determinant on ${METHOD_NAMES.lda} orbitals + ${DIRAC_METHOD_NAMES.lda} shift`

/** The same for hf-correlated-delta: the determinant energy plus the local correlation energy. */
export const HF_CORRELATED_BASIS = `hartree-fock determinant + vwn correlation on ${METHOD_NAMES.lda} orbitals + ${DIRAC_METHOD_NAMES.lda} shift`
