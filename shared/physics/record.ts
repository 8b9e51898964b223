/**
 * The species record: everything the engine says about one species, as the JSON line of
 * DESIGN §5 (those fields first, exactly as named there) followed by extra fields for the pages.
 * Nested objects are frozen and shared between records of the same species (record-parts.ts);
 * copy before changing one.
 */
import { type BestEstimate, bestEstimate } from './best-estimate'
import { bindingEnergies, type BindingEnergy } from './binding'
import type { DiracOrbital, DiracRadialDensity, ScfOrbital, ScfRadialDensity, ScfSpeciesEstimates } from './scf/types'
import type { ConfigurationRule } from './configuration'
import { CODATA_2018, METHODS, METHOD_NAMES, type MethodName, diracHydrogenLikeEv, nuclearMass } from './methods'
import { oneElectronEnergy, type QedCorrection } from './qed/index'
import { formatSpecies, parseSpecies, type ParsedSpecies } from './notation'
import type { ElectronAffinity, ReferenceGroundLevel, ReferenceValue, SourcedValue } from './reference'
import { type Estimate, type ReferenceConfiguration, type TermSummary, judged, round, speciesBase } from './record-parts'
import type { ScreeningRow } from './slater'
import { subshellLabel } from './subshells'
import type { SubshellBoxes } from './terms'
import { ENGINE_VERSION } from './version'

export type { Estimate, ReferenceConfiguration, TermSummary } from './record-parts'
export type { BindingEnergy } from './binding'

export interface DescribeOptions {
  /** methods to run (default: every applicable one); unknown names throw */
  methods?: string[]
  /** SCF results for this species from ./scf, when the caller has them */
  scf?: ScfSpeciesEstimates | null
}

/** What the record carries of an SCF solution: enough for the screening, radii and density charts. */
export interface ScfSummary {
  method: string
  converged: boolean
  iterations: number
  totalEnergyHartree: number | null
  orbitals: readonly ScfOrbital[]
  density: ScfRadialDensity | null
}

/** What the record carries of the relativistic solution: nlj orbitals and large/small densities. */
export interface DiracSummary {
  method: string
  converged: boolean
  iterations: number
  totalEnergyHartree: number | null
  nucleusRadiusFm: number
  orbitals: readonly DiracOrbital[]
  density: DiracRadialDensity | null
}

export type ScreeningEntry = Readonly<ScreeningRow> & { readonly zEffMeanRadius?: number }

export interface SpeciesRecord {
  input: string
  z: number
  symbol: string
  charge: number
  electrons: number
  configuration: string
  core: string
  term: string | null
  isoelectronic: string | null
  screening: readonly ScreeningEntry[]
  ionisationEnergy: {
    reference: Readonly<ReferenceValue> | null
    estimates: readonly Estimate[]
    /** the subshell the next electron leaves ('3p'), null for a bare nucleus */
    nextElectron: string | null
    notes: string[]
  }
  productionThreshold: Readonly<SourcedValue & { from: string }> | null
  engine: string
  name: string
  massNumber: number | null
  notations: Readonly<{ ionic: string; spectroscopic: string }>
  configurationRule: ConfigurationRule
  configurationSource: string | null
  termRule: 'hund' | 'table' | null
  termSource: string | null
  unpaired: number
  orbitals: readonly SubshellBoxes[]
  /** LS terms of the configuration: each distinct term once, with how often it occurs */
  terms: readonly TermSummary[]
  /** neutral atoms: NIST's ground configuration and level, to set beside the engine's */
  referenceGroundLevel?: Readonly<ReferenceGroundLevel>
  /** positive ions: NIST ASD's ground shells, to set beside the engine's configuration */
  referenceConfiguration?: Readonly<ReferenceConfiguration>
  /** anions: the electron affinity is the binding energy of the extra electron */
  electronAffinity?: Readonly<ElectronAffinity>
  productionThresholdNote?: string
  /** the SCF solution of this species, when the caller supplied one */
  scf?: ScfSummary
  /** binding energy of every occupied nlj subshell (binding.ts); empty without a relativistic solution */
  bindingEnergies: readonly BindingEnergy[]
  /** the relativistic SCF solution of this species, when the caller supplied one */
  dirac?: DiracSummary
  caution: string
  /**
   * The estimate to lead with: of the methods with a number here, the one with the smallest
   * measured mean deviation for this class of species, with that mean (best-estimate.ts); null
   * when no method with a number has a measured figure (a bare nucleus, most negative ions).
   */
  bestEstimate: BestEstimate | null
}

const ALL_METHODS: ReadonlySet<MethodName> = new Set(METHOD_NAMES)

function selectMethods(methods: string[] | undefined): ReadonlySet<MethodName> {
  if (!methods) return ALL_METHODS
  const unknown = methods.filter((m) => !(METHOD_NAMES as readonly string[]).includes(m))
  if (unknown.length > 0) {
    throw new RangeError(`unknown method ${unknown.map((m) => `'${m.slice(0, 24)}'`).join(', ')}; known: ${METHOD_NAMES.join(', ')}`)
  }
  return new Set(methods as MethodName[])
}

const SCREENED_SE_SOURCE =
  'hydrogenic one-loop self-energy F(Zα) of the same level (Shabaev, Tupitsyn and Yerokhin, Phys. Rev. A 88, 012513 (2013)) scaled by the near-nucleus density ⟨e^(−r/ƛ_C)⟩ of each Dirac–Kohn–Sham orbital against the hydrogenic one'
const SCREENED_VP_SOURCE = 'E. A. Uehling, Phys. Rev. 48, 55 (1935): the finite nucleus\'s Uehling potential averaged over each Dirac–Kohn–Sham orbital'

/** dirac-scf-delta-qed: the ΔSCF energy with the screened QED of a He- or Li-like ion, and the two corrections. */
function screenedQed(dirac: ScfSpeciesEstimates['dirac']): { eV: number; corrections: QedCorrection[] } | undefined {
  const qed = dirac?.screenedQed
  if (!dirac || !qed || dirac.deltaEv === null) return undefined
  return {
    eV: dirac.deltaEv + qed.selfEnergyEv + qed.vacuumPolarisationEv,
    corrections: [
      Object.freeze({ name: 'self-energy (screened)', eV: round(qed.selfEnergyEv, 6), source: SCREENED_SE_SOURCE }),
      Object.freeze({ name: 'vacuum polarisation (Uehling, screened)', eV: round(qed.vacuumPolarisationEv, 6), source: SCREENED_VP_SOURCE }),
    ],
  }
}

function failure(what: string, result: { converged: boolean; failure?: string } | null): string | null {
  if (!result || result.converged) return null
  return `SCF solution for ${what} did not converge${result.failure ? `: ${result.failure}` : ''}`
}

/** The full record of one species (a text in any accepted notation, or an already parsed one). */
export function describeSpecies(input: string | ParsedSpecies, options: DescribeOptions = {}): SpeciesRecord {
  const parsed = typeof input === 'string' ? parseSpecies(input) : input
  const methods = selectMethods(options.methods)
  const { z, charge, massNumber } = parsed
  const base = speciesBase(z, charge)
  const referenceEv = base.reference?.eV ?? null

  const estimates: Estimate[] = []
  const species = { z, charge, electrons: base.electrons }
  // a bare nucleus has no electron to remove: no method is asked (the page says so)
  const asked = (m: MethodName) => base.electrons > 0 && methods.has(m)
  if (base.slaterHydrogenic && asked('slater-hydrogenic')) estimates.push(base.slaterHydrogenic)
  if (base.slaterTotalEnergy && asked('slater-total-energy')) estimates.push(base.slaterTotalEnergy)
  if (asked('dirac-hydrogen-like') || asked('dirac-qed-hydrogen-like')) {
    const mass = base.electrons === 1 ? nuclearMass(z, massNumber) : null
    const dirac = mass ? diracHydrogenLikeEv(z, mass.eV) : null
    const basis = mass ? `reduced mass with the ${mass.basis}` : undefined
    if (asked('dirac-hydrogen-like')) estimates.push(judged('dirac-hydrogen-like', species, dirac, referenceEv, { basis }))
    if (asked('dirac-qed-hydrogen-like')) {
      const qed = mass && dirac !== null && z <= 118 ? oneElectronEnergy(z, mass.massNumber, dirac, CODATA_2018.electronMassEv) : null
      estimates.push(judged('dirac-qed-hydrogen-like', species, qed?.totalEv ?? null, referenceEv, { basis, corrections: qed?.corrections }))
    }
  }

  const notes: string[] = []
  let screening: readonly ScreeningEntry[] = base.screening
  const scf = options.scf ?? null
  if (scf) {
    for (const note of [failure('this species', scf.species), failure('the next ion', scf.next)]) if (note) notes.push(note)
    const missing = 'no converged self-consistent solution for this species and the next ion'
    const dirac = scf.dirac
    for (const info of METHODS) {
      if (!info.scf || !asked(info.name)) continue
      const relativistic = info.name === 'dirac-scf-delta' || info.name === 'dirac-scf-eigenvalue' || info.name === 'dirac-scf-delta-qed'
      const screened = info.name === 'dirac-scf-delta-qed' ? screenedQed(dirac) : undefined
      const value =
        info.name === 'scf-delta' ? scf.deltaEv
        : info.name === 'scf-eigenvalue' ? scf.eigenvalueEv
        : info.name === 'dirac-scf-delta-qed' ? (dirac ? screened?.eV ?? null : undefined)
        : relativistic ? (dirac ? (info.name === 'dirac-scf-delta' ? dirac.deltaEv : dirac.eigenvalueEv) : undefined)
        : scf.byMethod?.[info.name]
      // a method the caller's SCF results do not cover is left out (not computed), not "not applicable"
      if (value === undefined) continue
      // a method that keeps only its energy names its own basis (methods.ts)
      const basis = info.basis ?? (relativistic && dirac ? dirac.species.method : scf.species.method)
      estimates.push(judged(info.name, species, value, referenceEv, { basis, missing, corrections: screened?.corrections }))
    }
    if (dirac) {
      for (const note of [failure('this species (relativistic)', dirac.species), failure('the next ion (relativistic)', dirac.next)]) if (note) notes.push(note)
    }
    if (scf.species.converged) {
      screening = base.screening.map((row) => {
        const orbital = scf.species.orbitals.find((o) => subshellLabel(o.n, o.l) === row.subshell)
        return orbital ? { ...row, zEffMeanRadius: round(orbital.zEffMeanRadius, 6) } : row
      })
    }
  }

  const record: SpeciesRecord = {
    input: parsed.input,
    z,
    symbol: base.symbol,
    charge,
    electrons: base.electrons,
    configuration: base.configuration,
    core: base.core,
    term: base.term,
    isoelectronic: base.isoelectronic,
    screening,
    ionisationEnergy: { reference: base.reference, estimates, nextElectron: base.nextElectron, notes },
    productionThreshold: base.productionThreshold,
    engine: ENGINE_VERSION,
    name: base.name,
    massNumber,
    notations: massNumber === null ? base.notations : formatSpecies(z, charge, massNumber),
    configurationRule: base.configurationRule,
    configurationSource: base.configurationSource,
    termRule: base.termRule,
    termSource: base.termSource,
    unpaired: base.unpaired,
    orbitals: base.orbitals,
    terms: base.terms,
    bindingEnergies: bindingEnergies(scf?.dirac, referenceEv),
    caution: base.caution,
    bestEstimate: bestEstimate(z, charge, estimates),
  }
  if (base.referenceGroundLevel) record.referenceGroundLevel = base.referenceGroundLevel
  if (base.referenceConfiguration) record.referenceConfiguration = base.referenceConfiguration
  if (base.electronAffinity) record.electronAffinity = base.electronAffinity
  if (base.productionThresholdNote) record.productionThresholdNote = base.productionThresholdNote
  if (scf) {
    const own = scf.species
    record.scf = {
      method: own.method,
      converged: own.converged,
      iterations: own.iterations,
      totalEnergyHartree: Number.isFinite(own.totalEnergyHartree) ? own.totalEnergyHartree : null,
      orbitals: own.orbitals,
      density: own.density ?? null,
    }
    const rel = scf.dirac?.species
    if (rel) {
      record.dirac = {
        method: rel.method,
        converged: rel.converged,
        iterations: rel.iterations,
        totalEnergyHartree: Number.isFinite(rel.totalEnergyHartree) ? rel.totalEnergyHartree : null,
        nucleusRadiusFm: rel.nucleusRadiusFm,
        orbitals: rel.orbitals,
        density: rel.density ?? null,
      }
    }
  }
  return record
}
