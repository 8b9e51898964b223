/**
 * Which samples need a caution, and of which kind. Used by the sample pages now and by labels
 * and certificates later, so the four kinds and their wording live in one place.
 *
 * The rules are deliberately broad (a false caution costs a glance, a missing one can cost a
 * great deal) and they only ever add cautions to what the record states; they do not replace
 * the supplier's safety data sheet or the institution's own assessment.
 */
import { getElement } from '../physics/index'
import { baseHCode, canonicalHCode } from './ghs'
import { parseNuclide } from './nuclide'
import type { SampleForm } from './vocabulary'

export const HAZARD_KINDS = ['radioactive', 'toxic', 'pyrophoric', 'pressurised'] as const
export type HazardKind = (typeof HAZARD_KINDS)[number]

export const HAZARD_LABELS: Record<HazardKind, string> = {
  radioactive: 'Radioactive',
  toxic: 'Toxic',
  pyrophoric: 'Reacts with air or water',
  pressurised: 'Under pressure',
}

export interface HazardInput {
  form: SampleForm
  formula?: string | null
  radioactive: boolean
  nuclide?: string | null
  hazardStatements: readonly string[]
  components: readonly { z: number; massNumber: number | null }[]
}

export interface Caution {
  kind: HazardKind
  title: string
  /** why this sample gets the caution, one plain sentence each */
  reasons: string[]
  /** what to do: always defers to the institution's officers and local rules */
  advice: string
}

// Elements without any stable isotope: technetium, promethium, and everything from polonium on
// (common practice, no source). Actinides and radium are among them.
const NO_STABLE_ISOTOPE = (z: number) => z === 43 || z === 61 || z >= 84
const ACTINIDE = (z: number) => z >= 89 && z <= 103
// The toxic metals and metalloids a target lab meets most (DESIGN.md §9; common practice, no source).
const TOXIC_ELEMENTS = new Set([4, 33, 48, 80, 81, 82]) // Be, As, Cd, Hg, Tl, Pb
// Alkali metals and the heavier alkaline-earth metals oxidise or ignite in air as bare metal
// (common practice, no source); Be and Mg only as fine powder.
const AIR_REACTIVE_METAL = new Set([3, 11, 19, 37, 55, 87, 20, 38, 56, 88])
const AIR_REACTIVE_POWDER = new Set([4, 12])

// Acute toxicity categories 1–3, germ-cell mutagenicity, carcinogenicity and reproductive toxicity
// category 1, organ toxicity category 1 (UN GHS Rev. 10, Annex 3 — from memory).
const TOXIC_CODES = new Set(['H300', 'H301', 'H310', 'H311', 'H330', 'H331', 'H340', 'H350', 'H360', 'H370', 'H372'])
const PYROPHORIC_CODES = new Set(['H232', 'H250', 'H260', 'H261'])
const PRESSURE_CODES = new Set(['H229', 'H280', 'H281', 'H282', 'H283', 'H284'])
const METAL_FORMS = new Set<SampleForm>(['foil', 'wire', 'powder', 'sputter_cathode', 'other'])

export const CAUTION_ADVICE: Record<HazardKind, string> = {
  radioactive:
    'Store, handle, move and dispose of this sample only as your institution\'s radiation-protection officer has approved and as the licence and local regulations require. These records are no substitute for a survey or a dose assessment.',
  toxic:
    'Work with this sample only under the precautions your institution\'s safety officer has set (enclosure, gloves, waste) and as local regulations require. Avoid making dust, fumes or vapour.',
  pyrophoric:
    'Keep this sample under the protective gas or liquid it came in. Open, cut and mount it only as your institution\'s safety officer has approved and as local regulations require.',
  pressurised:
    'Keep the cylinder secured upright with its valve protected. Connect, store and move it only as your institution\'s safety officer has approved and as local regulations require.',
}

const TITLES: Record<HazardKind, string> = {
  radioactive: 'Radioactive material',
  toxic: 'Toxic material',
  pyrophoric: 'Reacts with air or water',
  pressurised: 'Gas under pressure',
}

function symbols(zs: Iterable<number>): string {
  return [...new Set(zs)].map((z) => getElement(z)?.symbol ?? `Z${z}`).join(', ')
}

/** The sample is one element only, recorded as that element (or with no formula): bare metal. */
function isBareElement(s: HazardInput): number | null {
  const zs = new Set(s.components.map((c) => c.z))
  if (zs.size !== 1) return null
  const z = [...zs][0]!
  const f = s.formula?.trim()
  if (f && f !== getElement(z)?.symbol) return null
  return z
}

/** The cautions a sample calls for, in a fixed order; empty when none. */
export function classifyHazards(s: HazardInput): Caution[] {
  const reasons: Record<HazardKind, string[]> = { radioactive: [], toxic: [], pyrophoric: [], pressurised: [] }
  // Matched on the GHS code a statement refines, but listed as stored: H350i stays H350i.
  const codes = new Map(s.hazardStatements.map((c) => [canonicalHCode(c) ?? c, baseHCode(c)] as const))
  const listed = (set: Set<string>) => [...codes].filter(([, base]) => !!base && set.has(base)).map(([c]) => c).sort()

  if (s.radioactive) reasons.radioactive.push(s.nuclide ? `Recorded as radioactive (${s.nuclide}).` : 'Recorded as radioactive.')
  const unstable = s.components.filter((c) => NO_STABLE_ISOTOPE(c.z)).map((c) => c.z)
  if (unstable.length) reasons.radioactive.push(`Contains ${symbols(unstable)}, which has no stable isotope.`)
  const synthetic = s.components.filter((c) => c.massNumber !== null && !NO_STABLE_ISOTOPE(c.z) && getElement(c.z)?.isotopes.find((i) => i.massNumber === c.massNumber)?.abundance === null)
  for (const c of synthetic) reasons.radioactive.push(`Contains ${c.massNumber}${getElement(c.z)!.symbol}, a nuclide not found in nature and therefore unstable.`)
  const nuclide = s.nuclide ? parseNuclide(s.nuclide) : null
  if (!s.radioactive && nuclide) reasons.radioactive.push(`A nuclide is named (${s.nuclide}).`)
  if (!s.radioactive && reasons.radioactive.length) reasons.radioactive.push('The radioactive flag is not set: check the record.')

  const toxic = s.components.filter((c) => TOXIC_ELEMENTS.has(c.z)).map((c) => c.z)
  if (toxic.length) reasons.toxic.push(`Contains ${symbols(toxic)}.`)
  if (listed(TOXIC_CODES).length) reasons.toxic.push(`Hazard statements ${listed(TOXIC_CODES).join(', ')}.`)

  const bare = isBareElement(s)
  if (bare !== null && METAL_FORMS.has(s.form) && (AIR_REACTIVE_METAL.has(bare) || (s.form === 'powder' && AIR_REACTIVE_POWDER.has(bare)))) {
    reasons.pyrophoric.push(`${getElement(bare)!.name} as bare metal reacts with air and moisture.`)
  }
  const actinides = s.components.filter((c) => ACTINIDE(c.z)).map((c) => c.z)
  if (s.form === 'powder' && actinides.length) reasons.pyrophoric.push(`Fine powders of ${symbols(actinides)} can ignite in air.`)
  if (listed(PYROPHORIC_CODES).length) reasons.pyrophoric.push(`Hazard statements ${listed(PYROPHORIC_CODES).join(', ')}.`)

  if (s.form === 'gas_cylinder') reasons.pressurised.push('Stored as a gas cylinder.')
  if (listed(PRESSURE_CODES).length) reasons.pressurised.push(`Hazard statements ${listed(PRESSURE_CODES).join(', ')}.`)

  return HAZARD_KINDS.filter((k) => reasons[k].length).map((kind) => ({ kind, title: TITLES[kind], reasons: reasons[kind], advice: CAUTION_ADVICE[kind] }))
}

/** Just the kinds, for storing beside the record and filtering on. */
export function hazardKinds(s: HazardInput): HazardKind[] {
  return classifyHazards(s).map((c) => c.kind)
}
