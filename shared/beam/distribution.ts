/**
 * What every charge-state formula answers, and the two distribution shapes they use. The
 * fractions are the shape evaluated at every integer charge 0…Z and normalised over that range.
 */
import type { Medium } from './media'

export interface ChargeFraction {
  charge: number
  fraction: number
}

export const MODEL_NAMES = ['schiwietz-grande-2001', 'schiwietz-grande-2004', 'nikolaev-dmitriev-1968', 'sayer-1977', 'baron-1993'] as const
export type ModelName = (typeof MODEL_NAMES)[number]

export interface ModelResult {
  model: ModelName
  /** the paper, as it should be cited */
  source: string
  /** where the coefficients were read */
  coefficients: string
  /** the validity range as we state it, in words */
  range: string
  shape: 'gaussian' | 'sayer-asymmetric'
  meanCharge: number
  width: number
  mostProbable: number
  fractions: ChargeFraction[]
  warnings: string[]
}

/** A formula that gives no number for this stripper (e.g. a solid-only formula and a gas), and why. */
export interface NotApplicableModel {
  model: ModelName
  source: string
  reason: string
}

export interface StripInput {
  /** projectile atomic number */
  z: number
  beta: number
  /** velocity in atomic units v/v₀ */
  vOverV0: number
  /** kinetic energy, MeV/u */
  mevPerU: number
  medium: Medium
}

/** Gaussian fractions of mean m and standard deviation d at q = 0…Z, normalised over that range. */
export function gaussianFractions(z: number, mean: number, d: number): ChargeFraction[] {
  return normalise(z, mean, (q) => -0.5 * ((q - mean) / d) ** 2)
}

/**
 * Sayer's asymmetric shape F(q) ∝ exp{−½ t² / (1 + ε t)}, t = (q − q₀)/ρ (Sayer 1977). Where
 * 1 + ε t ≤ 0 the form has no meaning; those states get zero (far in the tail for the fitted ε).
 */
export function sayerFractions(z: number, q0: number, rho: number, epsilon: number): ChargeFraction[] {
  return normalise(z, q0, (q) => {
    const t = (q - q0) / rho
    const den = 1 + epsilon * t
    return den <= 0 ? -Infinity : (-0.5 * t * t) / den
  })
}

/**
 * Fractions from the logarithm of an unnormalised shape, scaled by its largest value first so a
 * narrow shape cannot underflow to all zeros; a shape that is zero everywhere puts the whole
 * beam in the state nearest its centre.
 */
function normalise(z: number, centre: number, logF: (q: number) => number): ChargeFraction[] {
  const logs = Array.from({ length: z + 1 }, (_, q) => logF(q))
  const top = Math.max(...logs.filter((v) => !Number.isNaN(v)))
  if (!Number.isFinite(top)) {
    const at = Math.min(Math.max(Math.round(centre), 0), z)
    return logs.map((_, charge) => ({ charge, fraction: charge === at ? 1 : 0 }))
  }
  const raw = logs.map((v) => (Number.isNaN(v) ? 0 : Math.exp(v - top)))
  const sum = raw.reduce((a, b) => a + b, 0)
  return raw.map((v, charge) => ({ charge, fraction: v / sum }))
}

/** A model's result with its most probable state filled in from its fractions. */
export function finish(base: Omit<ModelResult, 'mostProbable' | 'fractions'>, fractions: ChargeFraction[]): ModelResult {
  const top = fractions.reduce((a, b) => (b.fraction > a.fraction ? b : a), fractions[0]!)
  return { ...base, mostProbable: top.charge, fractions }
}
