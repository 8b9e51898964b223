/**
 * Binding energies of every occupied nlj subshell of a species, from its relativistic
 * (Dirac–Kohn–Sham, self-interaction-corrected) solution. Inner subshells: minus the orbital
 * eigenvalue, which with the self-interaction correction approximates the removal energy
 * (J. P. Perdew and A. Zunger, Phys. Rev. B 23, 5048, 1981). The outermost subshell, the one the
 * next electron leaves, is tied to the ionisation energy, as tabulations of binding energies do
 * for the valence shell (e.g. T. A. Carlson, "Photoelectron and Auger Spectroscopy", Plenum 1975,
 * whose outer shells are the spectroscopic ionisation energies; from memory): to the NIST ASD value
 * where there is one (method 'nist-asd'), else to dirac-scf-delta. The other j part of that nl shell
 * keeps its Dirac spin–orbit distance from it (method 'dirac-scf-eigenvalue').
 */
import type { DiracSpeciesEstimates } from './scf/types'

/** hartree in eV, CODATA 2018 */
const HARTREE_EV = 27.211386245988

export interface BindingEnergy {
  /** "2p3/2" */
  readonly subshell: string
  readonly eV: number
  readonly method: 'nist-asd' | 'dirac-scf-delta' | 'dirac-scf-eigenvalue'
}

const round = (v: number) => Number(v.toPrecision(7))

/** The binding energies, deepest first; empty without a converged relativistic solution. */
export function bindingEnergies(dirac: DiracSpeciesEstimates | null | undefined, referenceEv: number | null): BindingEnergy[] {
  if (!dirac || !dirac.species.converged || dirac.species.orbitals.length === 0) return []
  const orbitals = dirac.species.orbitals
  const top = orbitals.reduce((a, b) => (b.energyHartree > a.energyHartree ? b : a))
  const tie = referenceEv ?? dirac.deltaEv
  const tieMethod = referenceEv !== null ? 'nist-asd' : 'dirac-scf-delta'
  const out = orbitals.map((o): BindingEnergy => {
    const eigen = -o.energyHartree * HARTREE_EV
    if (tie === null || tie <= 0) return { subshell: o.label, eV: round(eigen), method: 'dirac-scf-eigenvalue' }
    if (o === top) return { subshell: o.label, eV: round(tie), method: tieMethod }
    if (o.n === top.n && o.l === top.l) {
      return { subshell: o.label, eV: round(tie + (top.energyHartree - o.energyHartree) * HARTREE_EV), method: 'dirac-scf-eigenvalue' }
    }
    return { subshell: o.label, eV: round(eigen), method: 'dirac-scf-eigenvalue' }
  })
  return out.sort((a, b) => b.eV - a.eV)
}
