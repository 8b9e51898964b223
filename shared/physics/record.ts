/**
 * The species record: everything the engine says about one species, as the JSON line of
 * DESIGN §5 (those fields first, exactly as named there) followed by extra fields for the pages.
 */
import type { ScfSpeciesEstimates } from './scf/types'
import { groundConfiguration, nextElectronSubshell, type ConfigurationRule } from './configuration'
import { getElement } from './elements'
import { lsTerms } from './ls-terms'
import {
  METHOD_NAMES,
  SLATER_RYDBERG_EV,
  type MethodName,
  diracHydrogenLikeEv,
  nuclearMass,
  slaterHydrogenicEv,
} from './methods'
import { formatSpecies, parseSpecies, type ParsedSpecies } from './notation'
import {
  IONISATION_SOURCE,
  type ElectronAffinity,
  type ReferenceGroundLevel,
  type SourcedValue,
  electronAffinity,
  referenceGroundLevel,
  referenceIonisationEv,
} from './reference'
import { slaterScreening, slaterTotalEnergyRydberg, type ScreeningRow } from './slater'
import { type Subshell, capacity, subshellLabel } from './subshells'
import { groundTerm, orbitalBoxes, unpairedElectrons, type SubshellBoxes } from './terms'
import { ENGINE_VERSION } from './version'

export interface DescribeOptions {
  /** methods to run (default: every applicable one); unknown names throw */
  methods?: string[]
  /** SCF results for this species from ./scf, when the caller has them */
  scf?: ScfSpeciesEstimates | null
}

export interface Estimate {
  method: MethodName
  eV: number
  /** estimate − reference, where a reference exists */
  deviationEv?: number
  deviationPercent?: number
  /** what the estimate assumed, where that matters (the isotope for the reduced mass) */
  basis?: string
}

/** One distinct LS term of the configuration and how often it occurs. */
export interface TermSummary {
  readonly label: string
  readonly count: number
  readonly J: readonly string[]
}

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
  screening: (ScreeningRow & { zEffMeanRadius?: number })[]
  ionisationEnergy: {
    reference: SourcedValue | null
    estimates: Estimate[]
    /** the subshell the next electron leaves ('3p'), null for a bare nucleus */
    nextElectron: string | null
    notes: string[]
  }
  productionThreshold: (SourcedValue & { from: string }) | null
  engine: string
  name: string
  massNumber: number | null
  notations: { ionic: string; spectroscopic: string }
  configurationRule: ConfigurationRule
  configurationSource: string | null
  termRule: 'hund' | 'table' | null
  termSource: string | null
  unpaired: number
  orbitals: SubshellBoxes[]
  /** LS terms of the configuration: each distinct term once, with how often it occurs */
  terms: readonly TermSummary[]
  /** neutral atoms: NIST's ground configuration and level, to set beside the engine's */
  referenceGroundLevel?: ReferenceGroundLevel
  /** anions: the electron affinity is the binding energy of the extra electron */
  electronAffinity?: ElectronAffinity
  productionThresholdNote?: string
  caution: string
}

// Significant-figure rounding without toPrecision's string round trip (it dominated the bench).
function round(x: number, digits: number): number {
  if (x === 0 || !Number.isFinite(x)) return x
  const scale = 10 ** (digits - 1 - Math.floor(Math.log10(Math.abs(x))))
  return Math.round(x * scale) / scale
}

// Term lists and Slater energies are shared between species: cache them (term lists frozen).
const termCache = new Map<string, readonly TermSummary[]>()
function termSummary(shells: readonly Subshell[]): readonly TermSummary[] {
  if (shells.length === 0) return []
  const key = shells.filter((s) => s.electrons < capacity(s.l)).map((s) => `${s.l}.${s.electrons}`).join(' ') +
    (shells.reduce((sum, s) => sum + s.l * s.electrons, 0) % 2)
  let hit = termCache.get(key)
  if (!hit) {
    hit = Object.freeze(lsTerms(shells).map((t) => Object.freeze({ label: t.label, count: t.count, J: Object.freeze(t.J) })))
    termCache.set(key, hit)
  }
  return hit
}

const energyCache = new Map<number, number>()
function slaterEnergy(z: number, charge: number): number {
  const key = z * 128 + charge + 1
  let hit = energyCache.get(key)
  if (hit === undefined) {
    hit = slaterTotalEnergyRydberg(z, groundConfiguration(z, charge).subshells)
    energyCache.set(key, hit)
  }
  return hit
}

const CAUTION = 'Computed values are model estimates, not measurements; where a reference value is given, rely on it.'
const ANION_CAUTION = ' The ground configuration of a negative ion is less certain than that of a positive ion.'
const ANION_THRESHOLD =
  'Negative ions are made by charge exchange or sputtering, not by electron-impact ionisation (common practice, no source).'

function selectMethods(methods: string[] | undefined): Set<MethodName> {
  if (!methods) return new Set(METHOD_NAMES)
  const unknown = methods.filter((m) => !(METHOD_NAMES as readonly string[]).includes(m))
  if (unknown.length > 0) {
    throw new RangeError(`unknown method ${unknown.map((m) => `'${m.slice(0, 24)}'`).join(', ')}; known: ${METHOD_NAMES.join(', ')}`)
  }
  return new Set(methods as MethodName[])
}

function withDeviation(estimate: Estimate, reference: number | null): Estimate {
  const eV = round(estimate.eV, 9)
  if (reference === null) return { ...estimate, eV }
  const deviation = estimate.eV - reference
  return { ...estimate, eV, deviationEv: round(deviation, 6), deviationPercent: round((100 * deviation) / reference, 4) }
}

/** The full record of one species (a text in any accepted notation, or an already parsed one). */
export function describeSpecies(input: string | ParsedSpecies, options: DescribeOptions = {}): SpeciesRecord {
  const parsed = typeof input === 'string' ? parseSpecies(input) : input
  const methods = selectMethods(options.methods)
  const { z, charge, massNumber } = parsed
  const element = getElement(z)
  if (!element) throw new RangeError(`no element with Z = ${z}`)
  const config = groundConfiguration(z, charge)
  const shells = config.subshells
  const term = groundTerm(shells, z, charge)
  const next = nextElectronSubshell(z, charge)
  const ea = charge === -1 ? electronAffinity(z) : undefined
  const referenceEv = charge === -1 ? (ea?.bound ? ea.eV : null) : referenceIonisationEv(z, charge)
  const reference =
    referenceEv === null ? null : { eV: referenceEv, source: charge === -1 ? (ea as { source: string }).source : IONISATION_SOURCE }

  const estimates: Estimate[] = []
  const notes: string[] = []
  if (next) {
    if (methods.has('slater-hydrogenic')) estimates.push({ method: 'slater-hydrogenic', eV: slaterHydrogenicEv(z, shells, next) })
    if (methods.has('slater-total-energy')) {
      const eV = SLATER_RYDBERG_EV * (slaterEnergy(z, charge + 1) - slaterEnergy(z, charge))
      estimates.push({ method: 'slater-total-energy', eV })
    }
    if (methods.has('dirac-hydrogen-like') && config.electrons === 1) {
      const mass = nuclearMass(z, massNumber)
      estimates.push({ method: 'dirac-hydrogen-like', eV: diracHydrogenLikeEv(z, mass.eV), basis: `reduced mass with the ${mass.basis}` })
    }
  }
  const scf = options.scf ?? null
  if (scf) {
    if (!scf.species.converged) notes.push(`SCF solution for this species did not converge${scf.species.failure ? `: ${scf.species.failure}` : ''}`)
    if (scf.next && !scf.next.converged) notes.push(`SCF solution for the next ion did not converge${scf.next.failure ? `: ${scf.next.failure}` : ''}`)
    if (methods.has('scf-delta') && scf.deltaEv !== null) estimates.push({ method: 'scf-delta', eV: scf.deltaEv, basis: scf.species.method })
    if (methods.has('scf-eigenvalue') && scf.eigenvalueEv !== null) {
      estimates.push({ method: 'scf-eigenvalue', eV: scf.eigenvalueEv, basis: scf.species.method })
    }
  }

  const screening: SpeciesRecord['screening'] = slaterScreening(z, shells)
  if (scf?.species.converged) {
    for (const row of screening) {
      const orbital = scf.species.orbitals.find((o) => subshellLabel(o.n, o.l) === row.subshell)
      if (orbital) row.zEffMeanRadius = round(orbital.zEffMeanRadius, 6)
    }
  }

  let productionThreshold: SpeciesRecord['productionThreshold'] = null
  let productionThresholdNote: string | undefined
  if (charge === -1) productionThresholdNote = ANION_THRESHOLD
  else if (charge === 0) productionThresholdNote = 'A neutral atom is not made by ionisation.'
  else {
    const below = referenceIonisationEv(z, charge - 1)
    const from = formatSpecies(z, charge - 1).ionic
    if (below === null) productionThresholdNote = `No reference ionisation energy for ${from}.`
    else productionThreshold = { eV: below, source: IONISATION_SOURCE, from }
  }

  const record: SpeciesRecord = {
    input: parsed.input,
    z,
    symbol: element.symbol,
    charge,
    electrons: config.electrons,
    configuration: config.text,
    core: config.core,
    term: term?.level ?? null,
    isoelectronic: config.isoelectronic,
    screening,
    ionisationEnergy: {
      reference,
      estimates: estimates.map((e) => withDeviation(e, referenceEv)),
      nextElectron: next ? subshellLabel(next.n, next.l) : null,
      notes,
    },
    productionThreshold,
    engine: ENGINE_VERSION,
    name: element.name,
    massNumber,
    notations: formatSpecies(z, charge, massNumber),
    configurationRule: config.rule,
    configurationSource: config.source,
    termRule: term?.rule ?? null,
    termSource: term?.source ?? null,
    unpaired: unpairedElectrons(shells),
    orbitals: orbitalBoxes(shells),
    terms: termSummary(shells),
    caution: charge === -1 ? CAUTION + ANION_CAUTION : CAUTION,
  }
  if (charge === 0) {
    const level = referenceGroundLevel(z)
    if (level) record.referenceGroundLevel = level
  }
  if (ea) record.electronAffinity = ea
  if (productionThresholdNote) record.productionThresholdNote = productionThresholdNote
  return record
}
