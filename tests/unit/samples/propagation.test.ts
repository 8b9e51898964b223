import { describe, expect, it } from 'vitest'
import { getElement } from '../../../shared/physics/index'
import { compositionModel } from '../../../shared/samples/composition-model'
import { deriveSample } from '../../../shared/samples/derived'
import { covariance, monteCarlo, propagateGum, type InputQuantity } from '../../../shared/samples/propagation'
import type { ComponentInput } from '../../../shared/samples/composition'

const natural = (z: number, a: number) => getElement(z)!.naturalIsotopes.find((i) => i.massNumber === a)!.abundance!

describe('the propagation engines against a published example', () => {
  // JCGM 101:2008 §9.2.2 (additive model Y = X₁ + X₂ + X₃ + X₄, each Xᵢ ~ N(0, 1)): the law of
  // propagation gives u(y) = 2.0, and the Monte Carlo method agrees (values from memory of the guide).
  const inputs: InputQuantity[] = [1, 2, 3, 4].map((i) => ({ label: `X${i}`, value: 0, uncertainty: 1 }))
  const model = (x: readonly number[]) => [x.reduce((s, v) => s + v, 0)]

  it('gives u(y) = 2 by first-order propagation and by Monte Carlo (seeded, 10⁵ trials)', () => {
    expect(propagateGum(model, inputs).uncertainties[0]).toBeCloseTo(2, 9)
    const mc = monteCarlo(model, inputs, 100_000, 20261202)
    expect(mc.uncertainties[0]).toBeCloseTo(2, 1)
    expect(Math.abs(mc.means[0]!)).toBeLessThan(0.03)
  })
})

describe('an enrichment carries its uncertainty, fully correlated, into every other isotope', () => {
  // ⁵⁸Ni at 99.3 ± 0.1 %: the rest, 0.7 %, divides over ⁶⁰Ni, ⁶¹Ni, ⁶²Ni, ⁶⁴Ni in natural proportions,
  // so u(x₆₀) = u(e) · a₆₀ / Σa(others): relative u(e)/(1 − e) = 0.1/0.7 ≈ 14 % (the "about ±15 %").
  const ni: ComponentInput[] = [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', enrichmentPercent: 99.3, enrichmentUncertainty: 0.1 }]

  it('gives ⁶⁰Ni about 14 % relative, as the closed form says', () => {
    const d = deriveSample({ arealDensity: 500, arealDensityUncertainty: null, thickness: null, bulkDensity: null, components: ni })
    if (!d.composition?.ok) throw new Error('expected a composition')
    const rest = 1 - natural(28, 58)
    const ni60 = d.composition.isotopes.find((i) => i.massNumber === 60)!
    expect(ni60.atomFraction).toBeCloseTo((0.007 * natural(28, 60)) / rest, 12)
    expect(ni60.atomFractionUncertainty!).toBeCloseTo((0.001 * natural(28, 60)) / rest, 9)
    expect(ni60.atomFractionUncertainty! / ni60.atomFraction).toBeCloseTo(0.1 / 0.7, 6)
    const ni58 = d.composition.isotopes.find((i) => i.massNumber === 58)!
    expect(ni58.atomFractionUncertainty).toBeCloseTo(0.001, 9)
    // u(N₆₀)/N₆₀ follows u(x₆₀)/x₆₀ (the mean mass moves little): far more than the 5 % of the old sum in quadrature.
    expect(ni60.atomsPerCm2Uncertainty! / ni60.atomsPerCm2!).toBeGreaterThan(0.14)
  })

  it('makes the named and the other isotopes exactly anti-correlated (their fractions sum to 1)', () => {
    const model = compositionModel(ni, null)!
    const p = propagateGum(model.evaluate, model.inputs)
    const n = model.isotopeCount
    for (let i = 0; i < n; i++) {
      const rowSum = Array.from({ length: n }, (_, j) => covariance(p, model.inputs, i, j)).reduce((s, v) => s + v, 0)
      expect(Math.abs(rowSum)).toBeLessThan(1e-15)
    }
  })
})

describe('a full isotopic analysis under the closure Σx = 1, checked by Monte Carlo (JCGM 101:2008)', () => {
  // A fictional supplier analysis of a ⁵⁸Ni lot (demo data), atom %, standard uncertainties.
  const analysis = [
    { massNumber: 58, percent: 99.3, uncertainty: 0.05 },
    { massNumber: 60, percent: 0.55, uncertainty: 0.04 },
    { massNumber: 61, percent: 0.03, uncertainty: 0.01 },
    { massNumber: 62, percent: 0.1, uncertainty: 0.02 },
    { massNumber: 64, percent: 0.02, uncertainty: 0.01 },
  ]
  const components: ComponentInput[] = [
    { z: 28, massNumber: 58, fraction: 0.9, fractionUncertainty: 0.01, basis: 'atom', analysis },
    { z: 6, massNumber: null, fraction: 0.1, fractionUncertainty: 0.01, basis: 'atom' },
  ]
  const areal = { value: 500, uncertainty: 15 }

  it('agrees with 2·10⁴ Monte Carlo trials to within 3 % on every output (seeded)', () => {
    const model = compositionModel(components, areal)!
    const gum = propagateGum(model.evaluate, model.inputs)
    const mc = monteCarlo(model.evaluate, model.inputs, 20_000, 58)
    expect(gum.values).toHaveLength(2 * model.isotopeCount + 1)
    gum.uncertainties.forEach((u, m) => {
      expect(mc.means[m]! / gum.values[m]!).toBeCloseTo(1, 2)
      if (u > 0) expect(Math.abs(mc.uncertainties[m]! / u - 1)).toBeLessThan(0.03)
    })
  })

  it('matches the closed form of the normalisation: u²(xᵢ) = Σₖ ((δᵢₖ − xᵢ)/Σy)² u²(yₖ)', () => {
    const alone: ComponentInput[] = [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', analysis }]
    const d = deriveSample({ arealDensity: null, arealDensityUncertainty: null, thickness: null, bulkDensity: null, components: alone })
    if (!d.composition?.ok) throw new Error('expected a composition')
    const sum = analysis.reduce((s, r) => s + r.percent, 0)
    analysis.forEach((r, i) => {
      const x = r.percent / sum
      const u2 = analysis.reduce((s, k, j) => s + (((i === j ? 1 : 0) - x) / sum) ** 2 * k.uncertainty ** 2, 0)
      const iso = d.composition!.ok ? d.composition!.isotopes.find((t) => t.massNumber === r.massNumber)! : null
      expect(iso!.atomFractionUncertainty!).toBeCloseTo(Math.sqrt(u2), 9)
    })
    // The mean atomic mass: u²(M̄) = Σₖ (Σᵢ mᵢ ∂xᵢ/∂yₖ)² u²(yₖ) = Σₖ ((mₖ − M̄)/Σy)² u²(yₖ).
    const m = (a: number) => getElement(28)!.isotopes.find((i) => i.massNumber === a)!.massU
    const mean = d.composition.meanAtomicMassU
    const u2m = analysis.reduce((s, k) => s + ((m(k.massNumber) - mean) / sum) ** 2 * k.uncertainty ** 2, 0)
    expect(d.composition.meanAtomicMassUncertainty!).toBeCloseTo(Math.sqrt(u2m), 9)
  })

  it('leaves a lone component fraction without effect: normalised, 1 ± 0.01 is still all of the sample', () => {
    const d = deriveSample({ arealDensity: null, arealDensityUncertainty: null, thickness: null, bulkDensity: null, components: [{ z: 79, massNumber: null, fraction: 1, fractionUncertainty: 0.01, basis: 'atom' }] })
    if (!d.composition?.ok) throw new Error('expected a composition')
    expect(d.composition.isotopes[0]!.atomFractionUncertainty ?? 0).toBeLessThan(1e-12)
  })
})
