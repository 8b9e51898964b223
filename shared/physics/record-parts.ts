/**
 * The parts of a species record that depend only on (Z, charge), computed once per species and
 * frozen, so that describeSpecies — and a listing of all 7,139 species — only assembles them.
 * Frozen parts are shared between records: a caller that wants to change one copies it first.
 */
import { nextElectronSubshell, readGroundConfiguration, type ConfigurationRule } from './configuration'
import { getElement } from './elements'
import { lsTerms } from './ls-terms'
import { METHODS, SLATER_RYDBERG_EV, hydrogenicEv, methodDomainReason, type MethodName, unphysicalReason } from './methods'
import type { QedCorrection } from './qed/index'
import { formatSpecies } from './notation'
import {
  IONISATION_DETAIL_SOURCE,
  IONISATION_SOURCE,
  type ElectronAffinity,
  type ReferenceGroundLevel,
  type ReferenceValue,
  type SourcedValue,
  electronAffinity,
  groundShellOccupations,
  referenceGroundLevel,
  referenceGroundShells,
  referenceIonGroundLevel,
  referenceIonisationDetail,
  referenceIonisationEv,
} from './reference'
import { slaterScreening, type ScreeningRow } from './slater'
import { type Subshell, capacity, subshellLabel } from './subshells'
import { groundTerm, orbitalBoxes, unpairedElectrons, type SubshellBoxes } from './terms'

export interface Estimate {
  readonly method: MethodName
  /** null when the method does not apply to this species; then `notApplicable` says why */
  readonly eV: number | null
  readonly notApplicable?: string
  /** estimate − reference, where a reference exists */
  readonly deviationEv?: number
  readonly deviationPercent?: number
  /** what the estimate assumed, where that matters (the isotope for the reduced mass) */
  readonly basis?: string
  /** the corrections included, each as its change of the ionisation energy (dirac-qed-hydrogen-like) */
  readonly corrections?: readonly QedCorrection[]
}

/** One distinct LS term of the configuration and how often it occurs. */
export interface TermSummary {
  readonly label: string
  readonly count: number
  readonly J: readonly string[]
}

export interface SpeciesBase {
  symbol: string
  name: string
  electrons: number
  configuration: string
  core: string
  term: string | null
  isoelectronic: string | null
  screening: readonly ScreeningRow[]
  reference: Readonly<ReferenceValue> | null
  nextElectron: string | null
  slaterHydrogenic: Estimate | null
  slaterTotalEnergy: Estimate | null
  productionThreshold: Readonly<SourcedValue & { from: string }> | null
  productionThresholdNote: string | undefined
  configurationRule: ConfigurationRule
  configurationSource: string | null
  termRule: 'hund' | 'table' | null
  termSource: string | null
  unpaired: number
  orbitals: readonly SubshellBoxes[]
  terms: readonly TermSummary[]
  referenceGroundLevel: Readonly<ReferenceGroundLevel> | undefined
  referenceConfiguration: Readonly<ReferenceConfiguration> | undefined
  electronAffinity: Readonly<ElectronAffinity> | undefined
  notations: Readonly<{ ionic: string; spectroscopic: string }>
  caution: string
}

/** An ion's ground shells as NIST ASD lists them, set beside the engine's configuration. */
export interface ReferenceConfiguration {
  /** as ASD writes them with '.' → ' ', e.g. '[Cd] 4f11' */
  configuration: string
  /** ASD's ground level, e.g. '4I°15/2'; absent where it gives none */
  level?: string
  /** whether the engine's configuration has the same occupations */
  matches: boolean
  source: string
}

/** ASD's ground shells of a positive ion beside the engine's configuration; undefined where ASD lists none. */
function referenceConfigurationOf(z: number, charge: number, subshells: readonly Subshell[]): ReferenceConfiguration | undefined {
  if (charge < 1) return undefined
  const shells = referenceGroundShells(z, charge)
  const theirs = shells === null ? null : groundShellOccupations(shells)
  if (shells === null || theirs === null) return undefined
  const ours = new Map(subshells.filter((s) => s.electrons > 0).map((s) => [subshellLabel(s.n, s.l), s.electrons]))
  const matches = ours.size === theirs.size && [...ours].every(([label, n]) => theirs.get(label) === n)
  const level = referenceIonGroundLevel(z, charge)
  return { configuration: shells.replace(/\./g, ' '), ...(level ? { level } : {}), matches, source: IONISATION_DETAIL_SOURCE }
}

const CAUTION = 'Computed values are model estimates, not measurements; where a reference value is given, rely on it.'
const ANION_CAUTION = ' The ground configuration of a negative ion is less certain than that of a positive ion.'
const ANION_THRESHOLD =
  'Negative ions are made by charge exchange or sputtering, not by electron-impact ionisation (common practice, no source).'

/** Significant-figure rounding (toPrecision's string round trip was the slowest step of a listing). */
export function round(x: number, digits: number): number {
  if (x === 0 || !Number.isFinite(x)) return x
  const scale = 10 ** (digits - 1 - Math.floor(Math.log10(Math.abs(x))))
  return Math.round(x * scale) / scale
}

/** A method that does not apply here: no number, the reason instead. */
export function notApplicable(method: MethodName, reason: string): Estimate {
  return Object.freeze({ method, eV: null, notApplicable: reason })
}

/** An estimate with its deviation from the reference (eV and percent) where there is one. */
export function estimate(method: MethodName, eV: number, reference: number | null, basis?: string): Estimate {
  const out: { -readonly [K in keyof Estimate]: Estimate[K] } = { method, eV: round(eV, 9) }
  if (reference !== null) {
    out.deviationEv = round(eV - reference, 6)
    out.deviationPercent = round((100 * (eV - reference)) / reference, 4)
  }
  if (basis !== undefined) out.basis = basis
  return out
}

/**
 * The estimate of `method` for a species, or "not applicable" with the reason: outside the
 * method's domain (methods.ts), without a value (`eV` null: `missing` says why), or unphysical.
 */
export function judged(
  method: MethodName,
  species: { z: number; charge: number; electrons: number },
  eV: number | null,
  reference: number | null,
  extra: { basis?: string; missing?: string; corrections?: Estimate['corrections'] } = {},
): Estimate {
  const info = METHODS.find((m) => m.name === method)
  const outside = info ? methodDomainReason(info, species.z, species.charge, species.electrons) : null
  if (outside) return notApplicable(method, outside)
  if (eV === null) return notApplicable(method, extra.missing ?? 'no value')
  const unphysical = unphysicalReason(eV)
  if (unphysical) return notApplicable(method, unphysical)
  const out = estimate(method, eV, reference, extra.basis)
  return extra.corrections ? Object.freeze({ ...out, corrections: extra.corrections }) : Object.freeze(out)
}

const termCache = new Map<string, readonly TermSummary[]>()
function termSummary(shells: readonly Subshell[]): readonly TermSummary[] {
  if (shells.length === 0) return []
  const open = shells.filter((s) => s.electrons < capacity(s.l))
  const key = open.map((s) => `${s.l}.${s.electrons}`).join(' ') + (shells.reduce((sum, s) => sum + s.l * s.electrons, 0) % 2)
  let hit = termCache.get(key)
  if (!hit) {
    hit = Object.freeze(lsTerms(shells).map((t) => Object.freeze({ label: t.label, count: t.count, J: Object.freeze(t.J) })))
    termCache.set(key, hit)
  }
  return hit
}

// Slater rows and total energy (−Σ N_i (Z_eff,i / n*_i)², as slater.ts's slaterTotalEnergyRydberg,
// taken from the rows) per species; the next ion's energy is needed too, so each is made once.
interface SlaterEntry {
  rows: readonly ScreeningRow[]
  energyRydberg: number
}
const slaterCache = new Map<number, SlaterEntry>()
function slater(z: number, charge: number): SlaterEntry {
  const key = z * 128 + charge + 1
  let hit = slaterCache.get(key)
  if (hit === undefined) {
    const shells = readGroundConfiguration(z, charge).subshells
    const rows = slaterScreening(z, shells)
    let sum = 0
    for (let i = 0; i < rows.length; i++) sum += shells[i].electrons * (rows[i].zEff / rows[i].nStar) ** 2
    hit = { rows: Object.freeze(rows.map((r) => Object.freeze(r))), energyRydberg: -sum }
    slaterCache.set(key, hit)
  }
  return hit
}

function compute(z: number, charge: number): SpeciesBase {
  const element = getElement(z)
  if (!element) throw new RangeError(`no element with Z = ${z}`)
  const config = readGroundConfiguration(z, charge)
  const shells = config.subshells
  const term = groundTerm(shells, z, charge)
  const next = nextElectronSubshell(z, charge)
  const ea = charge === -1 ? Object.freeze(electronAffinity(z)) : undefined
  const referenceEv = charge === -1 ? (ea?.bound ? ea.eV : null) : referenceIonisationEv(z, charge)
  const detail = charge >= 0 && referenceEv !== null ? referenceIonisationDetail(z, charge) : null
  const reference: ReferenceValue | null =
    referenceEv === null
      ? null
      : Object.freeze({
          eV: referenceEv,
          source: ea?.source ?? IONISATION_SOURCE,
          ...(detail?.uncertaintyEv != null ? { uncertaintyEv: detail.uncertaintyEv } : {}),
          ...(detail?.kind ? { kind: detail.kind } : {}),
        })
  const own = slater(z, charge)
  let slaterHydrogenic: Estimate | null = null
  let slaterTotalEnergy: Estimate | null = null
  if (next) {
    const row = own.rows[shells.findIndex((s) => s.n === next.n && s.l === next.l)]
    const species = { z, charge, electrons: config.electrons }
    slaterHydrogenic = judged('slater-hydrogenic', species, hydrogenicEv(row.zEff, row.nStar), referenceEv)
    const total = SLATER_RYDBERG_EV * (slater(z, charge + 1).energyRydberg - own.energyRydberg)
    slaterTotalEnergy = judged('slater-total-energy', species, total, referenceEv)
  }
  let productionThreshold: SpeciesBase['productionThreshold'] = null
  let productionThresholdNote: string | undefined
  if (charge === -1) productionThresholdNote = ANION_THRESHOLD
  else if (charge === 0) productionThresholdNote = 'A neutral atom is not made by ionisation.'
  else {
    const below = referenceIonisationEv(z, charge - 1)
    const from = formatSpecies(z, charge - 1).ionic
    if (below === null) productionThresholdNote = `No reference ionisation energy for ${from}.`
    else productionThreshold = Object.freeze({ eV: below, source: IONISATION_SOURCE, from })
  }
  const level = charge === 0 ? referenceGroundLevel(z) : null
  return Object.freeze({
    symbol: element.symbol,
    name: element.name,
    electrons: config.electrons,
    configuration: config.text,
    core: config.core,
    term: term?.level ?? null,
    isoelectronic: config.isoelectronic,
    screening: own.rows,
    reference,
    nextElectron: next ? subshellLabel(next.n, next.l) : null,
    slaterHydrogenic,
    slaterTotalEnergy,
    productionThreshold,
    productionThresholdNote,
    configurationRule: config.rule,
    configurationSource: config.source,
    termRule: term?.rule ?? null,
    termSource: term?.source ?? null,
    unpaired: unpairedElectrons(shells),
    orbitals: Object.freeze(orbitalBoxes(shells)),
    terms: termSummary(shells),
    referenceGroundLevel: level ? Object.freeze(level) : undefined,
    referenceConfiguration: Object.freeze(referenceConfigurationOf(z, charge, shells)),
    electronAffinity: ea,
    notations: Object.freeze(formatSpecies(z, charge)),
    caution: charge === -1 ? CAUTION + ANION_CAUTION : CAUTION,
  })
}

const bases = new Map<number, SpeciesBase>()

/** The frozen (Z, charge) part of the record; throws for a species that cannot exist. */
export function speciesBase(z: number, charge: number): SpeciesBase {
  const key = z * 128 + charge + 1
  let hit = bases.get(key)
  if (!hit) {
    hit = compute(z, charge)
    bases.set(key, hit)
  }
  return hit
}
