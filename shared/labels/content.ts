/**
 * What a container label says about its sample: the code and its scan URL, the name, every
 * component, the storage place, the GHS pictograms and a radiation caution. Layout is the PDF's job.
 */
import { classifyHazards, HAZARD_LABELS, type HazardInput } from '../samples/hazards'
import { isotopeLabel, parseNuclide, formatNuclide } from '../samples/nuclide'
import { getElement } from '../physics/elements'
import type { SampleForm } from '../samples/vocabulary'
import { formatValue } from '../certificates/format'
import { pictogramsFor, type Pictogram } from './pictograms'

export interface LabelSampleInput {
  code: string
  name: string
  formula: string | null
  form: SampleForm
  radioactive: boolean
  nuclide: string | null
  hazardStatements: string[]
  components: { z: number; massNumber: number | null; fraction: number; basis: 'atom' | 'mass'; enrichmentPercent: number | null }[]
  /** where it is kept: the place's path of codes and its name */
  place?: { path: string; name: string } | null
}

export interface LabelContent {
  code: string
  url: string
  name: string
  /** every component in recorded order, then the formula: "⁵⁸Ni 99.6 %", "⁷Li 99.9 % + F · LiF" */
  composition: string | null
  /** the storage place, its own code and name ("C3 (Target cabinet)"), or null when none is recorded */
  place: string | null
  pictograms: Pictogram[]
  /** the radiation caution: null when the sample is not radioactive */
  radiation: { nuclide: string | null } | null
  /** cautions the pictograms do not already carry (e.g. "Reacts with air or water") */
  otherCautions: string[]
}

/** The scan URL a label's QR code carries: the bench card of the sample. */
export function scanUrl(baseUrl: string, code: string): string {
  return `${baseUrl.replace(/\/+$/, '')}/scan/${encodeURIComponent(code)}`
}

const SUB = '₀₁₂₃₄₅₆₇₈₉'

/** A chemical formula with its counts as subscripts (CaF2 → CaF₂). */
export function formulaText(formula: string): string {
  return formula.replace(/(?<=[A-Za-z)\]])\d+/g, (d) => [...d].map((c) => SUB[Number(c)]).join(''))
}

// Every component, in the order the sample form records them (the element of interest first:
// UF₄ is a uranium target, TiH₂ a titanium one), each enriched isotope with its enrichment, then
// the formula where it says more than the one element.
function composition(s: LabelSampleInput): string | null {
  if (!s.components.length) return s.formula ? formulaText(s.formula) : null
  let text = s.components
    .map((c) => isotopeLabel(c.z, c.massNumber) + (c.massNumber !== null && c.enrichmentPercent !== null ? ` ${formatValue(c.enrichmentPercent, 4)} %` : ''))
    .join(' + ')
  const only = s.components.length === 1 ? getElement(s.components[0]!.z)?.symbol : null
  if (s.formula && s.formula !== only) text += ` · ${formulaText(s.formula)}`
  return text
}

/** The content of one label for `s`, with its QR code pointing under `baseUrl`. */
export function labelContent(s: LabelSampleInput, baseUrl: string): LabelContent {
  const hazards: HazardInput = { form: s.form, formula: s.formula, radioactive: s.radioactive, nuclide: s.nuclide, hazardStatements: s.hazardStatements, components: s.components }
  const cautions = classifyHazards(hazards)
  const pictograms = pictogramsFor(s.hazardStatements)
  const radioactive = cautions.some((c) => c.kind === 'radioactive')
  const unstable = s.components.find((c) => c.massNumber !== null && (c.z === 43 || c.z === 61 || c.z >= 84))
  const nuclide = s.nuclide ?? (unstable ? formatNuclide({ symbol: getElement(unstable.z)!.symbol, massNumber: unstable.massNumber! }) : null)
  // A caution whose hazard a pictogram already shows needs no words as well.
  const shown: Record<string, Pictogram[]> = { toxic: ['GHS06', 'GHS08'], pyrophoric: ['GHS02'], pressurised: ['GHS04'] }
  const otherCautions = cautions
    .filter((c) => c.kind !== 'radioactive' && !(shown[c.kind] ?? []).some((p) => pictograms.includes(p)))
    .map((c) => HAZARD_LABELS[c.kind])
  return {
    code: s.code,
    url: scanUrl(baseUrl, s.code),
    name: s.name,
    composition: composition(s),
    // The innermost place is what finds the container; the whole path rarely fits a label.
    place: s.place ? `${s.place.path.split(' › ').at(-1)} (${s.place.name})` : null,
    pictograms,
    radiation: radioactive ? { nuclide: nuclide && parseNuclide(nuclide) ? nuclide : null } : null,
    otherCautions,
  }
}
