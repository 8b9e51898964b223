/**
 * The species record: everything the engine says about one species, as the JSON line of
 * DESIGN §5 (those fields first, exactly as named there) followed by extra fields for the pages.
 * Nested objects are frozen and shared between records of the same species (record-parts.ts);
 * copy before changing one.
 */
import { bindingEnergies, type BindingEnergy } from './binding'
import type { DiracOrbital, DiracRadialDensity, ScfOrbital, ScfRadialDensity, ScfSpeciesEstimates } from './scf/types'
import type { ConfigurationRule } from './configuration'
import { METHOD_NAMES, type MethodName, diracHydrogenLikeEv, nuclearMass } from './methods'
import { formatSpecies, parseSpecies, type ParsedSpecies } from './notation'
import type { ElectronAffinity, ReferenceGroundLevel, SourcedValue } from './reference'
import { type Estimate, type TermSummary, estimate, round, speciesBase } from './record-parts'
import type { ScreeningRow } from './slater'
import { subshellLabel } from './subshells'
import type { SubshellBoxes } from './terms'
import { ENGINE_VERSION } from './version'

export type { Estimate, TermSummary } from './record-parts'
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
    reference: Readonly<SourcedValue> | null
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
  if (base.slaterHydrogenic && methods.has('slater-hydrogenic')) estimates.push(base.slaterHydrogenic)
  if (base.slaterTotalEnergy && methods.has('slater-total-energy')) estimates.push(base.slaterTotalEnergy)
  if (base.electrons === 1 && methods.has('dirac-hydrogen-like')) {
    const mass = nuclearMass(z, massNumber)
    estimates.push(estimate('dirac-hydrogen-like', diracHydrogenLikeEv(z, mass.eV), referenceEv, `reduced mass with the ${mass.basis}`))
  }

  const notes: string[] = []
  let screening: readonly ScreeningEntry[] = base.screening
  const scf = options.scf ?? null
  if (scf) {
    for (const note of [failure('this species', scf.species), failure('the next ion', scf.next)]) if (note) notes.push(note)
    if (methods.has('scf-delta') && scf.deltaEv !== null) estimates.push(estimate('scf-delta', scf.deltaEv, referenceEv, scf.species.method))
    if (methods.has('scf-eigenvalue') && scf.eigenvalueEv !== null) {
      estimates.push(estimate('scf-eigenvalue', scf.eigenvalueEv, referenceEv, scf.species.method))
    }
    const dirac = scf.dirac
    if (dirac) {
      for (const note of [failure('this species (relativistic)', dirac.species), failure('the next ion (relativistic)', dirac.next)]) if (note) notes.push(note)
      if (methods.has('dirac-scf-delta') && dirac.deltaEv !== null) estimates.push(estimate('dirac-scf-delta', dirac.deltaEv, referenceEv, dirac.species.method))
      if (methods.has('dirac-scf-eigenvalue') && dirac.eigenvalueEv !== null) {
        estimates.push(estimate('dirac-scf-eigenvalue', dirac.eigenvalueEv, referenceEv, dirac.species.method))
      }
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
  }
  if (base.referenceGroundLevel) record.referenceGroundLevel = base.referenceGroundLevel
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
