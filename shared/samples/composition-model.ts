/**
 * The measurement model of a sample's composition, as a function of its uncertain inputs, for
 * propagation.ts: x = (component fractions, enrichments, analysis lines, areal density) →
 * y = (atom fraction of every isotope, mean atomic mass, atoms per cm² of every isotope).
 * Inputs recorded without an uncertainty are held fixed.
 */
import { getElement } from '../physics/index'
import { combine, isotopicMakeUp, type ComponentInput, type IsotopeShare } from './composition'
import { AVOGADRO_CONSTANT } from './constants'
import { isotopeLabel } from './nuclide'
import type { InputQuantity } from './propagation'

export interface CompositionModel {
  inputs: InputQuantity[]
  /** outputs: [x₁ … xₙ, M̄, N₁ … Nₙ] (the N only when an areal density is known) */
  evaluate: (x: readonly number[]) => number[]
  isotopeCount: number
  hasAreal: boolean
}

type ShareFn = (x: readonly number[]) => IsotopeShare[]

/**
 * The model of `components` (valid ones: isotopicMakeUp succeeds for each) and an areal density
 * in µg/cm², or null when the nominal composition does not expand.
 */
export function compositionModel(components: readonly ComponentInput[], areal: { value: number; uncertainty: number | null } | null): CompositionModel | null {
  const inputs: InputQuantity[] = []
  // An input with an uncertainty gets a slot in x; without one, its recorded value is used.
  const slot = (label: string, value: number, uncertainty: number | null | undefined): ((x: readonly number[]) => number) => {
    if (!uncertainty || !(uncertainty > 0)) return () => value
    const j = inputs.push({ label, value, uncertainty }) - 1
    return (x) => x[j]!
  }
  const fractionOf: ((x: readonly number[]) => number)[] = []
  const sharesOf: ShareFn[] = []
  let isotopeCount = 0
  for (const c of components) {
    const nominal = isotopicMakeUp(c.z, c.massNumber, c.enrichmentPercent, c.analysis)
    if (!nominal.ok) return null
    isotopeCount += nominal.shares.length
    const label = isotopeLabel(c.z, c.massNumber)
    fractionOf.push(slot(`fraction of ${label}`, c.fraction, c.fractionUncertainty))
    if (c.analysis && c.analysis.length) {
      const lines = c.analysis.map((r) => slot(`analysis ${isotopeLabel(c.z, r.massNumber)} %`, r.percent, r.uncertainty))
      sharesOf.push((x) => {
        const y = lines.map((f) => f(x))
        const sum = y.reduce((s, v) => s + v, 0)
        return nominal.shares.map((s, k) => ({ ...s, share: y[k]! / sum }))
      })
    } else if (c.massNumber !== null && nominal.shares.length > 1) {
      const e = slot(`enrichment of ${label} %`, c.enrichmentPercent ?? 100, c.enrichmentUncertainty)
      const others = getElement(c.z)!.naturalIsotopes.filter((i) => i.massNumber !== c.massNumber)
      const total = others.reduce((s, i) => s + i.abundance!, 0)
      const abundance = new Map(others.map((i) => [i.massNumber, i.abundance! / total]))
      sharesOf.push((x) => {
        const share = e(x) / 100
        return nominal.shares.map((s) => ({ ...s, share: s.massNumber === c.massNumber ? share : (1 - share) * abundance.get(s.massNumber)! }))
      })
    } else {
      sharesOf.push(() => nominal.shares)
    }
  }
  const rho = areal ? slot('areal density µg/cm²', areal.value, areal.uncertainty) : null
  const evaluate = (x: readonly number[]): number[] => {
    const expanded = combine(components, fractionOf.map((f) => f(x)), sharesOf.map((f) => f(x)))
    if (!expanded.ok) return []
    const fractions = expanded.isotopes.map((i) => i.atomFraction)
    const out = [...fractions, expanded.meanAtomicMassU]
    if (rho) {
      const perArea = (rho(x) * 1e-6 * AVOGADRO_CONSTANT) / expanded.meanAtomicMassU
      out.push(...fractions.map((f) => perArea * f))
    }
    return out
  }
  return { inputs, evaluate, isotopeCount, hasAreal: !!rho }
}
