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
}
