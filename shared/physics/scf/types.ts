/**
 * The contract between the self-consistent-field solver (shared/physics/scf/) and its users
 * (the species record, the cache, the command line). Energies in hartree unless the name says eV;
 * radii in bohr.
 */

/** One occupied subshell of a converged SCF solution. */
export interface ScfOrbital {
  n: number
  l: number
  /** electrons in the subshell (may be fractional) */
  occupation: number
  /** orbital eigenvalue, hartree (spin-averaged where the solver is spin-polarised) */
  energyHartree: number
  /** ⟨r⟩, bohr */
  rMean: number
  /** ⟨r²⟩, bohr² */
  r2Mean: number
  /** mean-radius effective charge ⟨r⟩_H / ⟨r⟩ with ⟨r⟩_H = (3n² − l(l+1))/2 */
  zEffMeanRadius: number
}

/** A coarse radial density table for plotting: r²|R(r)|² per subshell label ("1s", "3d"). */
export interface ScfRadialDensity {
  r: number[]
  bySubshell: Record<string, number[]>
}

/** The solution for one electron configuration of one species. */
export interface ScfResult {
  /** the method's own name, e.g. the functional and corrections used */
  method: string
  z: number
  charge: number
  converged: boolean
  iterations: number
  totalEnergyHartree: number
  orbitals: ScfOrbital[]
  density?: ScfRadialDensity
  /** why it did not converge, when it did not */
  failure?: string
}

/** What the species record needs from the solver for one species. */
export interface ScfSpeciesEstimates {
  /** this species */
  species: ScfResult
  /** the ion with one electron fewer; null for a bare nucleus */
  next: ScfResult | null
  /** E(next) − E(species) in eV; null when either solve did not converge */
  deltaEv: number | null
  /** −ε of the outermost occupied orbital in eV; null when the solve did not converge */
  eigenvalueEv: number | null
  /**
   * Further SCF methods' ionisation energies by method id (e.g. the relativistic solver's), eV;
   * null when that solve did not converge. describeSpecies reads every METHODS entry with
   * `scf: true` from here (scf-delta and scf-eigenvalue from the two fields above).
   */
  byMethod?: Readonly<Partial<Record<string, number | null>>>
  /** the relativistic solution of the same species (solveSpeciesAll); absent in older cache rows */
  dirac?: DiracSpeciesEstimates
}

/** One occupied nlj subshell of a converged relativistic (Dirac–Kohn–Sham) solution. */
export interface DiracOrbital {
  n: number
  l: number
  /** 2j */
  twoJ: number
  kappa: number
  /** "2p3/2" */
  label: string
  occupation: number
  /** orbital eigenvalue without the rest energy, hartree (occupation-weighted over spins) */
  energyHartree: number
  /** ⟨r⟩ and ⟨r²⟩ over large and small components, bohr and bohr² */
  rMean: number
  r2Mean: number
  /** ⟨r⟩ of the large and of the small component alone, each normalised to itself, bohr */
  rMeanLarge: number
  rMeanSmall: number
  /** ∫F² dr: the small component's share of the norm */
  smallFraction: number
}

/** r²|g|² and r²|f|² per nlj subshell (one electron, large + small = 1) on a coarse log table. */
export interface DiracRadialDensity {
  r: number[]
  large: Record<string, number[]>
  small: Record<string, number[]>
}

/** The relativistic solution of one configuration. */
export interface DiracResult {
  method: string
  z: number
  charge: number
  converged: boolean
  iterations: number
  totalEnergyHartree: number
  /** radius of the uniformly charged nuclear sphere, fm (0: point nucleus) */
  nucleusRadiusFm: number
  orbitals: DiracOrbital[]
  density?: DiracRadialDensity
  failure?: string
}

/** The relativistic estimates of one species, carried beside the non-relativistic ones. */
export interface DiracSpeciesEstimates {
  species: DiracResult
  next: DiracResult | null
  deltaEv: number | null
  eigenvalueEv: number | null
  /**
   * He- and Li-like ions (dirac-qed.ts): the screened one-loop QED, as its change of the
   * ionisation energy in eV (negative: it lowers it); absent elsewhere and in older cache rows
   */
  screenedQed?: { selfEnergyEv: number; vacuumPolarisationEv: number }
}
