/**
 * The ionisation-energy methods the engine names in its output, and the constants they use.
 */
import { getElement, getIsotope } from './elements'
import { slaterTotalEnergyRydberg, nStar, screeningConstant } from './slater'
import { DIRAC_METHOD_NAMES, HF_CORRELATED_BASIS, HF_DELTA_BASIS } from './scf/options'
import type { Subshell } from './subshells'

export type MethodName =
  | 'slater-hydrogenic'
  | 'slater-total-energy'
  | 'dirac-hydrogen-like'
  | 'dirac-qed-hydrogen-like'
  | 'scf-delta'
  | 'scf-eigenvalue'
  // the relativistic solver's methods (shared/physics/scf, Dirac–Kohn–Sham)
  | 'dirac-scf-delta'
  | 'dirac-scf-eigenvalue'
  | 'dirac-lsd-delta'
  | 'dirac-scf-delta-qed'
  // Hartree–Fock energies on the local-density orbitals (scf/hf-species.ts)
  | 'hf-delta'
  | 'hf-correlated-delta'

/**
 * Where a method is meant to be used. Outside it the record carries `eV: null` and the reason
 * (methodDomainReason). One-electron ions are a case of their own: there the Dirac energy with
 * its corrections is exact to published theory, so a non-relativistic method is not shown.
 */
export interface MethodDomain {
  /** one line for the page: which species and which electron the method is for */
  text: string
  /**
   * 'only': one-electron ions only; 'any'; 'never': a non-relativistic model, not shown for a
   * one-electron ion once relativity, (Zα)²/4 of the energy, exceeds 0.01 % (Z ≥ 3): there its
   * number would only repeat the exact non-relativistic value the Dirac energy supersedes
   */
  oneElectron: 'only' | 'never' | 'any'
  /** whether the method is meant for negative ions */
  anions: boolean
  /** the Z range the method's data cover */
  zMax: number
  /** the lowest Z it is meant for (default 1) */
  zMin?: number
  /** the electron counts it is meant for (default: any) */
  electrons?: readonly number[]
  /** the fewest electrons it is meant for (default 1) */
  minElectrons?: number
  /** the lowest charge it is meant for, with the reason (default: any) */
  minCharge?: { charge: number; why: string }
}

export interface MethodInfo {
  name: MethodName
  /** one line for a page or a --help text */
  description: string
  citation: string
  /** true when the estimate comes from the SCF solver in ./scf rather than this module */
  scf: boolean
  /**
   * what the record names as the number's basis, for an SCF method that keeps only its energy and
   * no solution of its own; without it the basis is the name of the solution the number comes from
   */
  basis?: string
  domain: MethodDomain
}

const NOT_ONE_ELECTRON =
  'one-electron ion: a non-relativistic model, superseded here by the Dirac energy with its QED corrections (dirac-qed-hydrogen-like)'

/** Why `method` does not apply to a species of Z, charge and electrons, or null when it does. */
export function methodDomainReason(method: MethodInfo, z: number, charge: number, electrons: number): string | null {
  if (electrons === 0) return 'bare nucleus: no electron to remove'
  if (z > method.domain.zMax) return `the method's data cover Z ≤ ${method.domain.zMax}`
  if (method.domain.electrons && !method.domain.electrons.includes(electrons)) return method.domain.text
  if (method.domain.zMin !== undefined && z < method.domain.zMin) return `the method's data cover Z ≥ ${method.domain.zMin}`
  if (method.domain.oneElectron === 'only' && electrons !== 1) return 'one-electron ions only'
  if (method.domain.oneElectron === 'never' && electrons === 1 && (z * CODATA_2018.fineStructure) ** 2 / 4 > 1e-4) return NOT_ONE_ELECTRON
  if (method.domain.minElectrons !== undefined && electrons < method.domain.minElectrons) return method.domain.text
  if (method.domain.minCharge && charge < method.domain.minCharge.charge) return method.domain.minCharge.why
  if (charge < 0 && !method.domain.anions) return 'not made for negative ions: its screening was fitted to atoms and positive ions, not to a loosely bound extra electron'
  return null
}

/** The reason a computed energy cannot be printed as an ionisation energy, or null when it can. */
export function unphysicalReason(eV: number): string | null {
  if (!Number.isFinite(eV)) return 'the model gave no finite energy'
  if (eV <= 0) return `the model gives no binding (${eV.toFixed(2)} eV): outside what it can describe`
  return null
}

export const METHODS: readonly MethodInfo[] = [
  {
    name: 'slater-hydrogenic',
    description: 'Hydrogen-like energy of the next electron to leave: 13.6057 eV · Z_eff² / n*², Z_eff and n* by Slater\'s rules',
    citation: 'J. C. Slater, Phys. Rev. 36, 57 (1930)',
    scf: false,
    domain: { text: 'atoms and positive ions (one-electron ions only up to Z = 2); the outermost electron', oneElectron: 'never', anions: false, zMax: 118 },
  },
  {
    name: 'slater-total-energy',
    description: 'Difference of Slater total energies −13.6057 eV · Σ N_i (Z_eff,i / n*_i)² of the next ion and the species',
    citation: 'J. C. Slater, Phys. Rev. 36, 57 (1930)',
    scf: false,
    domain: { text: 'atoms and positive ions (one-electron ions only up to Z = 2); the outermost electron', oneElectron: 'never', anions: false, zMax: 118 },
  },
  {
    name: 'dirac-hydrogen-like',
    description: 'One-electron ions only: Dirac 1s binding m_r c² (1 − √(1 − (Zα)²)) with the reduced mass, point nucleus, no QED',
    citation: 'P. A. M. Dirac, Proc. R. Soc. A 117, 610 (1928); constants CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021))',
    scf: false,
    domain: { text: 'one-electron ions, 1s electron; the point-nucleus baseline of dirac-qed-hydrogen-like', oneElectron: 'only', anions: false, zMax: 118 },
  },
  {
    name: 'scf-delta',
    description: 'Total-energy difference (ΔSCF) of self-consistent central-field solutions of the next ion and the species: spin-polarised local density with the self-interaction correction, spherical average',
    citation: 'W. Kohn and L. J. Sham, Phys. Rev. 140, A1133 (1965); S. H. Vosko, L. Wilk and M. Nusair, Can. J. Phys. 58, 1200 (1980); J. P. Perdew and A. Zunger, Phys. Rev. B 23, 5048 (1981)',
    scf: true,
    domain: { text: 'atoms, positive and negative ions (one-electron ions only up to Z = 2); non-relativistic', oneElectron: 'never', anions: true, zMax: 118 },
  },
  {
    name: 'scf-eigenvalue',
    description: 'Minus the highest occupied orbital eigenvalue of the same self-interaction-corrected central-field solution',
    citation: 'J. P. Perdew and A. Zunger, Phys. Rev. B 23, 5048 (1981); J. F. Janak, Phys. Rev. B 18, 7165 (1978)',
    scf: true,
    domain: { text: 'atoms, positive and negative ions (one-electron ions only up to Z = 2); non-relativistic', oneElectron: 'never', anions: true, zMax: 118 },
  },
  {
    name: 'dirac-qed-hydrogen-like',
    description:
      'One-electron ions only: the Dirac 1s energy with the reduced mass, plus the finite-nuclear-size shift, the one-loop self-energy and the Uehling vacuum polarisation, each shown',
    citation:
      'V. M. Shabaev, J. Phys. B 26, 1103 (1993); V. M. Shabaev, I. I. Tupitsyn and V. A. Yerokhin, Phys. Rev. A 88, 012513 (2013); P. J. Mohr, Phys. Rev. A 46, 4421 (1992); E. A. Uehling, Phys. Rev. 48, 55 (1935)',
    scf: false,
    domain: { text: 'one-electron ions, 1s electron, Z = 1–118 (self-energy table to Z = 120)', oneElectron: 'only', anions: false, zMax: 118 },
  },
  {
    name: 'dirac-scf-delta',
    description: 'Total-energy difference (ΔSCF) of relativistic Dirac–Kohn–Sham central-field solutions of the next ion and the species: large and small components of every nlj subshell, spin-polarised local density with the self-interaction correction, finite nucleus',
    citation: 'D. A. Liberman, D. T. Cromer and J. T. Waber, Comput. Phys. Commun. 2, 107 (1971); J. P. Perdew and A. Zunger, Phys. Rev. B 23, 5048 (1981); nuclear radii W. R. Johnson and G. Soff, At. Data Nucl. Data Tables 33, 405 (1985)',
    scf: true,
    domain: { text: 'atoms and positive ions, Z = 1–118, every charge state; relativistic, finite nucleus, no QED', oneElectron: 'any', anions: false, zMax: 118 },
  },
  {
    name: 'dirac-scf-eigenvalue',
    description: 'Minus the highest occupied nlj eigenvalue of the same self-interaction-corrected Dirac–Kohn–Sham solution',
    citation: 'D. A. Liberman, D. T. Cromer and J. T. Waber, Comput. Phys. Commun. 2, 107 (1971); J. P. Perdew and A. Zunger, Phys. Rev. B 23, 5048 (1981)',
    scf: true,
    domain: { text: 'atoms and positive ions, Z = 1–118, every charge state; relativistic, finite nucleus, no QED', oneElectron: 'any', anions: false, zMax: 118 },
  },
  {
    name: 'dirac-lsd-delta',
    description:
      'The same relativistic ΔSCF without the self-interaction correction: plain spin-polarised local density (Kohn–Sham). The accuracy bench finds it closer to NIST than the corrected ΔSCF for most ions of light elements, for d electrons of heavy ions and for f electrons at low charge',
    citation:
      'D. A. Liberman, D. T. Cromer and J. T. Waber, Comput. Phys. Commun. 2, 107 (1971); W. Kohn and L. J. Sham, Phys. Rev. 140, A1133 (1965); S. H. Vosko, L. Wilk and M. Nusair, Can. J. Phys. 58, 1200 (1980)',
    scf: true,
    basis: DIRAC_METHOD_NAMES.lsd,
    domain: { text: 'atoms and positive ions, Z = 1–118, every charge state; relativistic, finite nucleus, no self-interaction correction, no QED', oneElectron: 'any', anions: false, zMax: 118 },
  },
  {
    name: 'dirac-scf-delta-qed',
    description:
      'He- and Li-like ions: the relativistic ΔSCF energy (dirac-scf-delta) plus the one-loop self-energy and Uehling vacuum polarisation of every electron, screened by the others, each shown',
    citation:
      'self-energy: hydrogenic F(Zα) of V. M. Shabaev, I. I. Tupitsyn and V. A. Yerokhin, Phys. Rev. A 88, 012513 (2013), scaled by the near-nucleus density ⟨e^(−r/ƛ_C)⟩ of each Dirac–Kohn–Sham orbital (the weight of the local part of their model operator); E. A. Uehling, Phys. Rev. 48, 55 (1935), averaged over each orbital',
    scf: true,
    domain: { text: 'He- and Li-like ions (two or three electrons), Z = 10–118; relativistic ΔSCF with screened one-loop QED', oneElectron: 'any', anions: false, zMax: 118, zMin: 10, electrons: [2, 3] },
  },
  {
    name: 'hf-delta',
    description:
      'Hartree–Fock ΔSCF: the Hartree–Fock energies of the Hund\'s-rule determinants of the species and of the next ion, each with its own self-consistent local-density orbitals, plus the relativistic shift of the local-density ΔSCF (Dirac–Kohn–Sham minus non-relativistic, spin-restricted). Exact exchange, no correlation energy: the accuracy bench finds it closest to NIST for d electrons leaving moderately and highly charged ions, where the local exchange misjudges the open d shell',
    citation:
      'E. U. Condon and G. H. Shortley, The Theory of Atomic Spectra (Cambridge, 1935); J. C. Slater, Phys. Rev. 34, 1293 (1929); orbitals and relativistic shift: D. A. Liberman, D. T. Cromer and J. T. Waber, Comput. Phys. Commun. 2, 107 (1971)',
    scf: true,
    basis: HF_DELTA_BASIS,
    domain: {
      text: 'ions of charge ≥ 5 with two or more electrons, Z = 7–118; no correlation energy, relativity as a local-density shift',
      oneElectron: 'never',
      anions: false,
      zMax: 118,
      minElectrons: 2,
      minCharge: {
        charge: 5,
        why: 'ions of charge ≥ 5 only: below that the correlation energy Hartree–Fock leaves out is several per cent of the ionisation energy (accuracy bench, engine 1.5.0: off by 13.6 % on average for neutral atoms, 7.0 % at q = 1, 3.7 % at q = 2–4)',
      },
    },
  },
  {
    name: 'hf-correlated-delta',
    description:
      'hf-delta plus the change of the local spin-density correlation energy (Vosko–Wilk–Nusair) between the species and the next ion, on the same orbitals and Hund\'s-rule spin densities: exact exchange with approximate correlation. The accuracy bench finds it closest to NIST for d and f electrons leaving ions of charge 1–4',
    citation:
      'E. U. Condon and G. H. Shortley, The Theory of Atomic Spectra (Cambridge, 1935); S. H. Vosko, L. Wilk and M. Nusair, Can. J. Phys. 58, 1200 (1980); H. Stoll, C. M. E. Pavlidou and H. Preuss, Theor. Chim. Acta 49, 143 (1978); relativistic shift: D. A. Liberman, D. T. Cromer and J. T. Waber, Comput. Phys. Commun. 2, 107 (1971)',
    scf: true,
    basis: HF_CORRELATED_BASIS,
    domain: {
      text: 'atoms and positive ions with two or more electrons, Z = 2–118; local correlation, relativity as a local-density shift',
      oneElectron: 'never',
      anions: false,
      zMax: 118,
      minElectrons: 2,
    },
  },
]

export const METHOD_NAMES: readonly MethodName[] = METHODS.map((m) => m.name)

/** The Rydberg energy the Slater methods use, 13.6057 eV as DESIGN §5 fixes it (CODATA: 13.605693…). */
export const SLATER_RYDBERG_EV = 13.6057

/** CODATA 2018 recommended values (E. Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)). */
export const CODATA_2018 = {
  fineStructure: 7.2973525693e-3,
  electronMassEv: 510998.95,
  atomicMassUnitEv: 931494102.42,
} as const

/** The hydrogen-like energy 13.6057 eV · (Z_eff / n*)² of one electron. */
export function hydrogenicEv(zEff: number, effectiveN: number): number {
  return SLATER_RYDBERG_EV * (zEff / effectiveN) ** 2
}

/** slater-hydrogenic: 13.6057 eV · (Z_eff / n*)² for one electron of `from` in the configuration. */
export function slaterHydrogenicEv(z: number, subshells: readonly Subshell[], from: { n: number; l: number }): number {
  return hydrogenicEv(z - screeningConstant(subshells, from), nStar(from.n))
}

/** slater-total-energy: E_Slater(next ion) − E_Slater(species), in eV. */
export function slaterTotalEnergyEv(z: number, species: readonly Subshell[], nextIon: readonly Subshell[]): number {
  return SLATER_RYDBERG_EV * (slaterTotalEnergyRydberg(z, nextIon) - slaterTotalEnergyRydberg(z, species))
}

export interface NuclearMass {
  /** nuclear mass, eV/c² */
  eV: number
  massNumber: number
  /** how the mass was chosen, for the record */
  basis: string
}

/**
 * Nuclear mass for the reduced-mass correction: atomic mass of the isotope minus Z electron
 * masses (the electrons' binding, under 1 MeV even for U, changes the reduced mass by < 1e−9).
 * Without a mass number, the most abundant natural isotope — what an analysing magnet selects
 * from a natural sample — or, for an element with none, its bracketed reference isotope.
 */
export function nuclearMass(z: number, massNumber: number | null): NuclearMass {
  const element = getElement(z)
  if (!element) throw new RangeError(`no element with Z = ${z}`)
  const a = massNumber ?? element.principalMassNumber
  const isotope = getIsotope(z, a)
  const basis =
    massNumber !== null
      ? `isotope ${a}${element.symbol}`
      : element.naturalIsotopes.length > 0
        ? `most abundant isotope ${a}${element.symbol}`
        : `reference isotope ${a}${element.symbol}`
  // A mass number outside the nuclide table falls back to A u: the reduced mass moves by < 1e−6.
  const atomicU = isotope?.massU ?? a
  return { eV: atomicU * CODATA_2018.atomicMassUnitEv - z * CODATA_2018.electronMassEv, massNumber: a, basis }
}

/** dirac-hydrogen-like: 1s binding energy of a one-electron ion with nuclear mass M (eV/c²). */
export function diracHydrogenLikeEv(z: number, nuclearMassEv: number): number {
  const me = CODATA_2018.electronMassEv
  const reduced = (me * nuclearMassEv) / (me + nuclearMassEv)
  const x = (z * CODATA_2018.fineStructure) ** 2
  // 1 − √(1 − x) written as x / (1 + √(1 − x)) keeps its digits for hydrogen, where x ≈ 5e−5.
  return (reduced * x) / (1 + Math.sqrt(1 - x))
}
