/**
 * Uncertainty propagation for a sample's composition.
 *
 * Method: GUM first-order propagation (JCGM 100:2008, §5.1.2, the law of propagation of
 * uncertainty for uncorrelated input quantities), applied to the whole model at once: every
 * recorded input with a standard uncertainty — component fractions, enrichments, the lines of an
 * isotopic analysis, the areal density — is an input quantity; every isotope's atom fraction, the
 * mean atomic mass and every isotope's atoms per cm² are output quantities. The sensitivity
 * coefficients are the partial derivatives of the model, taken by central differences.
 *
 * The closure constraint is part of the model, so its correlations are carried, not dropped:
 * - an enrichment e fixes the other isotopes at (1 − e)·aᵢ/Σa, so u(e) reaches each of them fully
 *   (negatively) correlated with the named isotope: u(xᵢ) = u(e)·aᵢ/Σa;
 * - an analysis yₖ is normalised, xᵢ = yᵢ/Σyₖ, with ∂xᵢ/∂yₖ = (δᵢₖ − xᵢ)/Σy: the covariance of the
 *   fractions, cov(xᵢ, xⱼ) = Σₖ (∂xᵢ/∂yₖ)(∂xⱼ/∂yₖ)·u²(yₖ), has rows that sum to zero (Σx = 1), and
 *   it is carried into M̄ and Nᵢ through the same derivatives;
 * - component fractions are normalised to their sum in the same way.
 * Masses of isotopes (AME relative uncertainties ~10⁻⁹) and natural abundances are taken as exact.
 *
 * Checked against a Monte Carlo propagation of distributions (JCGM 101:2008) in
 * tests/unit/samples/propagation.test.ts; `monteCarlo` below is that check's engine.
 */

/** An input quantity: its estimate and standard uncertainty. */
export interface InputQuantity {
  label: string
  value: number
  uncertainty: number
}

/** Output estimates and their standard uncertainties, in the model's output order. */
export interface Propagated {
  values: number[]
  uncertainties: number[]
  /** the sensitivity coefficients ∂yₘ/∂xⱼ (rows: outputs, columns: inputs) */
  jacobian: number[][]
}

/**
 * GUM first-order propagation of uncorrelated inputs through `model`:
 * u²(yₘ) = Σⱼ (∂yₘ/∂xⱼ)² u²(xⱼ). Central differences with a step of u(xⱼ)/1000.
 */
export function propagateGum(model: (x: readonly number[]) => number[], inputs: readonly InputQuantity[]): Propagated {
  const x0 = inputs.map((i) => i.value)
  const values = model(x0)
  const jacobian = values.map(() => new Array<number>(inputs.length).fill(0))
  inputs.forEach((input, j) => {
    const h = input.uncertainty > 0 ? input.uncertainty * 1e-3 : 0
    if (h === 0) return
    const up = [...x0]
    const down = [...x0]
    up[j] = x0[j]! + h
    down[j] = x0[j]! - h
    const yUp = model(up)
    const yDown = model(down)
    for (let m = 0; m < values.length; m++) jacobian[m]![j] = (yUp[m]! - yDown[m]!) / (2 * h)
  })
  const uncertainties = jacobian.map((row) => Math.sqrt(row.reduce((s, c, j) => s + (c * inputs[j]!.uncertainty) ** 2, 0)))
  return { values, uncertainties, jacobian }
}

/** Covariance of two outputs from the same propagation: Σⱼ (∂yₐ/∂xⱼ)(∂y_b/∂xⱼ) u²(xⱼ). */
export function covariance(p: Propagated, inputs: readonly InputQuantity[], a: number, b: number): number {
  return inputs.reduce((s, input, j) => s + p.jacobian[a]![j]! * p.jacobian[b]![j]! * input.uncertainty ** 2, 0)
}

/** A seeded pseudo-random generator in [0, 1) (mulberry32, public domain): the same draws every run. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0
  return () => {
    a = (a + 0x6d2b79f5) >>> 0
    let t = a
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}

/** Standard normal draws from a uniform generator (Box–Muller). */
export function normalDraws(random: () => number): () => number {
  let spare: number | null = null
  return () => {
    if (spare !== null) {
      const s = spare
      spare = null
      return s
    }
    let u = 0
    while (u <= Number.EPSILON) u = random()
    const v = random()
    const r = Math.sqrt(-2 * Math.log(u))
    spare = r * Math.sin(2 * Math.PI * v)
    return r * Math.cos(2 * Math.PI * v)
  }
}

/**
 * Monte Carlo propagation of distributions (JCGM 101:2008, §7): each input drawn from a normal
 * distribution N(x, u²), the model evaluated `trials` times; answers each output's mean and
 * standard deviation.
 */
export function monteCarlo(model: (x: readonly number[]) => number[], inputs: readonly InputQuantity[], trials: number, seed: number): { means: number[]; uncertainties: number[] } {
  const normal = normalDraws(seededRandom(seed))
  let sums: number[] | null = null
  let squares: number[] | null = null
  for (let t = 0; t < trials; t++) {
    const x = inputs.map((i) => i.value + i.uncertainty * normal())
    const y = model(x)
    sums ??= new Array<number>(y.length).fill(0)
    squares ??= new Array<number>(y.length).fill(0)
    for (let m = 0; m < y.length; m++) {
      sums[m]! += y[m]!
      squares[m]! += y[m]! * y[m]!
    }
  }
  const means = sums!.map((s) => s / trials)
  const uncertainties = squares!.map((q, m) => Math.sqrt(Math.max(0, (q - trials * means[m]! ** 2) / (trials - 1))))
  return { means, uncertainties }
}
