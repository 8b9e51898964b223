/**
 * Isotopic composition of a sample: from the components a lab manager records (element, isotope
 * or natural, fraction of the sample, and for an isotope either its enrichment or the supplier's
 * full isotopic analysis) to the atom fraction and atomic mass of every isotope, and the sample's
 * mean atomic mass. Isotope masses and natural abundances come from the species engine's nuclide
 * data (see ISOTOPE_DATA_SOURCES for the evaluations behind them).
 */
import { getElement } from '../physics/index'
import { isotopeLabel } from './nuclide'
import type { FractionBasis } from './vocabulary'

export { ISOTOPE_DATA_SOURCES, ISOTOPE_SOURCE } from './isotope-sources'

/** One line of a supplier's isotopic analysis: an isotope's atom fraction in %, with its standard uncertainty in %. */
export interface AnalysisRow {
  massNumber: number
  percent: number
  uncertainty?: number | null
}

/** The isotope percentages of an analysis must add up to 100 within this (percentage points): suppliers round each line. */
export const ANALYSIS_SUM_TOLERANCE = 0.1

/** Fractions must add up to 1 within this (absolute): recorded fractions are rounded, typically to 3–4 digits. */
export const FRACTION_TOLERANCE = 0.001

export interface ComponentInput {
  z: number
  /** null: the element with its natural isotopic composition */
  massNumber: number | null
  /** fraction of the sample, on the basis given */
  fraction: number
  basis: FractionBasis
  /** share of this isotope among the atoms of its element, %; required for a named isotope unless an analysis is given */
  enrichmentPercent?: number | null
  fractionUncertainty?: number | null
  enrichmentUncertainty?: number | null
  /** the full isotopic analysis of this component's element, in place of an enrichment */
  analysis?: readonly AnalysisRow[] | null
}

export interface IsotopeShare {
  massNumber: number
  massU: number
  /** share among the atoms of this component's element */
  share: number
}

export interface ExpandedIsotope {
  z: number
  symbol: string
  massNumber: number
  massU: number
  /** fraction of all atoms in the sample */
  atomFraction: number
  /** the recorded component this isotope belongs to (index in the list) */
  component: number
}

export type Expanded =
  | { ok: true; meanAtomicMassU: number; isotopes: ExpandedIsotope[]; componentMassU: number[]; componentAtomFraction: number[] }
  | { ok: false; message: string }

/** Sum of the recorded fractions. */
export function fractionSum(components: readonly Pick<ComponentInput, 'fraction'>[]): number {
  return components.reduce((s, c) => s + c.fraction, 0)
}

/** The message for fractions that do not add up to 1, or null when they do. */
export function fractionSumProblem(components: readonly Pick<ComponentInput, 'fraction'>[]): string | null {
  if (!components.length) return null
  const sum = fractionSum(components)
  if (Math.abs(sum - 1) <= FRACTION_TOLERANCE) return null
  return `The fractions add up to ${sum.toFixed(4)}; they must add up to 1 (within ±${FRACTION_TOLERANCE})`
}

/** The problem with an isotopic analysis, or null: known isotopes, no repeats, the named isotope listed, a sum of 100 %. */
export function analysisProblem(z: number, massNumber: number | null, analysis: readonly AnalysisRow[]): string | null {
  const element = getElement(z)
  if (!element) return `No element with Z = ${z}`
  if (massNumber === null) return 'An isotopic analysis belongs to a named isotope: choose the isotope the material is enriched in'
  if (analysis.length < 1) return 'List every isotope of the analysis with its atom fraction'
  const seen = new Set<number>()
  for (const r of analysis) {
    if (!element.isotopes.some((i) => i.massNumber === r.massNumber)) return `${r.massNumber}${element.symbol} is not a known nuclide`
    if (seen.has(r.massNumber)) return `${isotopeLabel(z, r.massNumber)} is listed twice in the analysis`
    seen.add(r.massNumber)
  }
  if (!seen.has(massNumber)) return `The analysis must list ${isotopeLabel(z, massNumber)}, the isotope named`
  const sum = analysis.reduce((s, r) => s + r.percent, 0)
  if (Math.abs(sum - 100) > ANALYSIS_SUM_TOLERANCE) return `The isotopes of the analysis add up to ${sum.toFixed(3)} %; they must add up to 100 % (within ±${ANALYSIS_SUM_TOLERANCE} %)`
  return null
}

/** Whether a named isotope needs its enrichment stated: yes unless nature offers no other isotope to make up a remainder. */
export function needsEnrichment(z: number, massNumber: number): boolean {
  const element = getElement(z)
  return !!element && element.naturalIsotopes.some((i) => i.massNumber !== massNumber)
}

/**
 * How the atoms of one component's element divide among its isotopes. Natural: the natural
 * abundances. An isotopic analysis: each isotope's percentage, normalised to their sum. An isotope
 * at enrichment e: that isotope e, and the rest (1 − e) spread over the element's other natural
 * isotopes in their natural proportions — the usual way a supplier's "enriched to e %" is read
 * when the remainder is not itemised. A named isotope without either is an error, never 100 %,
 * unless nature has no other isotope of the element (¹⁹⁷Au, ²⁴¹Am).
 */
export function isotopicMakeUp(
  z: number,
  massNumber: number | null,
  enrichmentPercent?: number | null,
  analysis?: readonly AnalysisRow[] | null,
): { ok: true; shares: IsotopeShare[] } | { ok: false; message: string } {
  const element = getElement(z)
  if (!element) return { ok: false, message: `No element with Z = ${z}` }
  if (analysis && analysis.length) {
    const problem = analysisProblem(z, massNumber, analysis)
    if (problem) return { ok: false, message: problem }
    const sum = analysis.reduce((s, r) => s + r.percent, 0)
    return { ok: true, shares: analysis.map((r) => ({ massNumber: r.massNumber, massU: element.isotopes.find((i) => i.massNumber === r.massNumber)!.massU, share: r.percent / sum })) }
  }
  if (massNumber === null) {
    if (!element.naturalIsotopes.length) return { ok: false, message: `${element.symbol} has no natural isotopic composition: name an isotope` }
    return { ok: true, shares: element.naturalIsotopes.map((i) => ({ massNumber: i.massNumber, massU: i.massU, share: i.abundance! })) }
  }
  const isotope = element.isotopes.find((i) => i.massNumber === massNumber)
  if (!isotope) return { ok: false, message: `${massNumber}${element.symbol} is not a known nuclide` }
  if ((enrichmentPercent === null || enrichmentPercent === undefined) && needsEnrichment(z, massNumber)) {
    return { ok: false, message: `Give the enrichment of ${isotopeLabel(z, massNumber)} in % (as on the supplier's certificate), or its full isotopic analysis` }
  }
  return enrichedShares(z, massNumber, (enrichmentPercent ?? 100) / 100)
}

/** The make-up at enrichment `e` (a fraction, not %): used by the propagation, which varies e. */
export function enrichedShares(z: number, massNumber: number, e: number): { ok: true; shares: IsotopeShare[] } | { ok: false; message: string } {
  const element = getElement(z)!
  const isotope = element.isotopes.find((i) => i.massNumber === massNumber)!
  const shares: IsotopeShare[] = [{ massNumber, massU: isotope.massU, share: e }]
  const rest = 1 - e
  if (rest > 1e-12) {
    const others = element.naturalIsotopes.filter((i) => i.massNumber !== massNumber)
    const total = others.reduce((s, i) => s + i.abundance!, 0)
    if (!others.length || total <= 0) {
      return { ok: false, message: `${element.symbol} has no other natural isotope to make up the remaining ${(rest * 100).toPrecision(3)} %: record the remainder as its own component` }
    }
    for (const i of others) shares.push({ massNumber: i.massNumber, massU: i.massU, share: (rest * i.abundance!) / total })
  }
  return { ok: true, shares }
}

/** Mean atomic mass of a set of isotope shares, u: Σ share · mass. */
export function meanMass(shares: readonly IsotopeShare[]): number {
  return shares.reduce((s, i) => s + i.share * i.massU, 0)
}

/**
 * Every isotope of the sample with its atom fraction, and the sample's mean atomic mass.
 * Mass fractions w_c become atom fractions x_c = (w_c / M_c) / Σ (w_j / M_j), with M_c the
 * component's mean atomic mass; each component's atoms then divide by its isotopic make-up.
 * Fractions are normalised by their sum, so a sum within the tolerance gives exact shares.
 */
export function expandComposition(components: readonly ComponentInput[]): Expanded {
  if (!components.length) return { ok: false, message: 'No composition recorded' }
  const bases = new Set(components.map((c) => c.basis))
  if (bases.size > 1) return { ok: false, message: 'Give every fraction on the same basis: all atom fractions or all mass fractions' }
  const makeUps: IsotopeShare[][] = []
  for (const c of components) {
    const m = isotopicMakeUp(c.z, c.massNumber, c.enrichmentPercent, c.analysis)
    if (!m.ok) return m
    makeUps.push(m.shares)
  }
  return combine(components, components.map((c) => c.fraction), makeUps)
}

/**
 * The sample's isotopes from each component's fraction and isotopic make-up: the second half of
 * expandComposition, apart so the uncertainty propagation can run it on varied inputs.
 */
export function combine(components: readonly Pick<ComponentInput, 'z' | 'basis'>[], fractions: readonly number[], makeUps: readonly (readonly IsotopeShare[])[]): Expanded {
  const componentMassU = makeUps.map(meanMass)
  const weights = components.map((c, i) => (c.basis === 'mass' ? fractions[i]! / componentMassU[i]! : fractions[i]!))
  const total = weights.reduce((s, w) => s + w, 0)
  if (!(total > 0)) return { ok: false, message: 'The fractions must be positive' }
  const componentAtomFraction = weights.map((w) => w / total)
  const isotopes: ExpandedIsotope[] = []
  components.forEach((c, i) => {
    const symbol = getElement(c.z)!.symbol
    for (const s of makeUps[i]!) {
      isotopes.push({ z: c.z, symbol, massNumber: s.massNumber, massU: s.massU, atomFraction: componentAtomFraction[i]! * s.share, component: i })
    }
  })
  const meanAtomicMassU = isotopes.reduce((s, i) => s + i.atomFraction * i.massU, 0)
  return { ok: true, meanAtomicMassU, isotopes, componentMassU, componentAtomFraction }
}
