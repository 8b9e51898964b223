/**
 * What a container label says about its sample: the code and its scan URL, the name, the main
 * species or element, the GHS pictogram codes and a radiation caution. Layout is the PDF's job.
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
}

export interface LabelContent {
  code: string
  url: string
  name: string
  /** e.g. "⁵⁸Ni 99.6 %" or "Ca · CaF₂" */
  mainSpecies: string | null
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

// The main species: the enriched isotope if one is named (the largest share among them), else
// the first component recorded, which the sample form lists as the element of interest
// (UF₄ is a uranium target, TiH₂ a titanium one).
function mainSpecies(s: LabelSampleInput): string | null {
  if (!s.components.length) return s.formula ? formulaText(s.formula) : null
  const named = s.components.filter((c) => c.massNumber !== null).sort((a, b) => b.fraction - a.fraction)
  const c = named[0] ?? s.components[0]!
  let text = isotopeLabel(c.z, c.massNumber)
  if (c.massNumber !== null && c.enrichmentPercent !== null) text += ` ${formatValue(c.enrichmentPercent, 4)} %`
  const symbol = getElement(c.z)?.symbol
  if (s.formula && s.formula !== symbol) text += ` · ${formulaText(s.formula)}`
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
    mainSpecies: mainSpecies(s),
    pictograms,
    radiation: radioactive ? { nuclide: nuclide && parseNuclide(nuclide) ? nuclide : null } : null,
    otherCautions,
  }
}
