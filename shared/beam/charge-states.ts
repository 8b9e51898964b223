/**
 * Equilibrium charge-state distributions after a stripper: several published semi-empirical
 * formulas side by side. Each gives a mean (or most probable) charge and a width; the fractions
 * are the paper's shape evaluated at every integer charge 0…Z and normalised over that range.
 *
 * Where the coefficients come from: we could not read the papers themselves here. The formulas
 * below were read from published implementations that cite the papers (named per model) and
 * cross-checked against measured equilibrium charges in tests/unit/beam/charge-states.test.ts.
 * The validity flags are ours where the paper's own stated range could not be read; each says so.
 *
 * Left out, and why: Shima, Ishihara & Mikumo (Nucl. Instrum. Methods 200, 605 (1982)) and the
 * 2004 solid-target update of Schiwietz & Grande (Nucl. Instrum. Methods B 225, 4 (2004)) — we
 * could not read their coefficients from the paper or a faithful source, and recalling them is
 * not good enough.
 */
import type { Medium } from './media'

export interface ChargeFraction {
  charge: number
  fraction: number
}

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

export const MODEL_NAMES = ['schiwietz-grande-2001', 'nikolaev-dmitriev-1968', 'sayer-1977', 'baron-1993'] as const
export type ModelName = (typeof MODEL_NAMES)[number]

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

const SG = 'G. Schiwietz and P. L. Grande, Nucl. Instrum. Methods B 175–177, 125 (2001), Eqs. (1)–(6)'
const ND = 'V. S. Nikolaev and I. S. Dmitriev, Phys. Lett. 28A, 277 (1968)'
const SAYER = 'R. O. Sayer, Rev. Phys. Appl. 12, 1543 (1977)'
const BARON = 'E. Baron, M. Bajard and Ch. Ricaud, "Charge exchange of very heavy ions in carbon foils and in the residual gas of GANIL cyclotrons", Nucl. Instrum. Methods A 328, 177 (1993)'

/** Gaussian fractions of mean m and standard deviation d at q = 0…Z, normalised over that range. */
export function gaussianFractions(z: number, mean: number, d: number): ChargeFraction[] {
  return normalise(z, (q) => Math.exp(-0.5 * ((q - mean) / d) ** 2))
}

/**
 * Sayer's asymmetric shape F(q) ∝ exp{−½ t² / (1 + ε t)}, t = (q − q₀)/ρ (Sayer 1977). Where
 * 1 + ε t ≤ 0 the form has no meaning; those states get zero (far in the tail for the fitted ε).
 */
export function sayerFractions(z: number, q0: number, rho: number, epsilon: number): ChargeFraction[] {
  return normalise(z, (q) => {
    const t = (q - q0) / rho
    const den = 1 + epsilon * t
    return den <= 0 ? 0 : Math.exp((-0.5 * t * t) / den)
  })
}

function normalise(z: number, f: (q: number) => number): ChargeFraction[] {
  const raw = Array.from({ length: z + 1 }, (_, q) => f(q))
  const sum = raw.reduce((a, b) => a + b, 0)
  return raw.map((v, charge) => ({ charge, fraction: sum > 0 ? v / sum : 0 }))
}

function finish(base: Omit<ModelResult, 'mostProbable' | 'fractions'>, fractions: ChargeFraction[]): ModelResult {
  const top = fractions.reduce((a, b) => (b.fraction > a.fraction ? b : a), fractions[0]!)
  return { ...base, mostProbable: top.charge, fractions }
}

/**
 * Schiwietz & Grande (2001). Solid: x = [(v/v₀) Zp^−0.52 Zt^(−0.019 Zp^−0.52 v/v₀) / 1.68]^(1 + 1.8/Zp),
 * q̄ = Zp (12x + x⁴) / (0.07/x + 6 + 0.3 x^½ + 10.37 x + x⁴). Gas: x = [(v/v₀) Zp^−0.52
 * Zt^(0.03 − 0.017 Zp^−0.52 v/v₀)]^(1 + 0.4/Zp), q̄ = Zp (376x + x⁶)/(1428 − 1206 x^½ + 690x + x⁶).
 * Width (both): d = 0.7 / [Zp^−0.27 Zt^(0.035 − 0.0009 Zp) f(q̄) f(Zp − q̄)], f(y) = √((y + 0.37 Zp^0.6)/y).
 * Coefficients as carried by S. Schippers' stripping.cxx (Univ. Giessen, GPL), which cites the paper.
 * The paper fits all projectiles and targets with data; it quotes a relative standard deviation of
 * about 2.3 % (solids) and 2.6 % (gases) in q̄ — from memory.
 */
export function schiwietzGrande(input: StripInput): ModelResult {
  const { z, vOverV0, medium } = input
  const zt = medium.zEff
  const vz = vOverV0 * z ** -0.52
  const warnings: string[] = []
  let mean: number
  if (medium.phase === 'solid') {
    const x = ((vz * zt ** (-0.019 * vz)) / 1.68) ** (1 + 1.8 / z)
    mean = (z * (12 * x + x ** 4)) / (0.07 / x + 6 + 0.3 * Math.sqrt(x) + 10.37 * x + x ** 4)
  } else {
    const x = (vz * zt ** (0.03 - 0.017 * vz)) ** (1 + 0.4 / z)
    mean = (z * (376 * x + x ** 6)) / (1428 - 1206 * Math.sqrt(x) + 690 * x + x ** 6)
  }
  mean = Math.min(Math.max(mean, 1e-6), z - 1e-6)
  const a = 0.37 * z ** 0.6
  const f1 = Math.sqrt((mean + a) / mean)
  const f2 = Math.sqrt((z - mean + a) / (z - mean))
  const width = 0.7 / (z ** -0.27 * zt ** (0.035 - 0.0009 * z) * f1 * f2)
  if (medium.parts.length > 1) warnings.push('Compound stripper: its mean atomic number stands in for Zt, which the paper does not do.')
  if (z - mean < 0.5) warnings.push('Nearly bare ion: the Gaussian width formula is least reliable here.')
  return finish(
    {
      model: 'schiwietz-grande-2001',
      source: SG,
      coefficients: "read from S. Schippers' implementation stripping.cxx, which cites the paper",
      range: `${medium.phase === 'solid' ? 'Solid' : 'Gas'} targets, all projectiles and velocities of the data fitted; ~2–3 % in q̄ (from memory)`,
      shape: 'gaussian',
      meanCharge: mean,
      width,
      warnings,
    },
    gaussianFractions(z, mean, width),
  )
}

/**
 * Nikolaev & Dmitriev (1968), solid strippers: q̄/Z = [1 + (v / (v′ Z^α))^(−1/k)]^(−k) with
 * v′ = 3.6 × 10⁸ cm/s, α = 0.45, k = 0.6; width d = 0.5 [q̄ (1 − (q̄/Z)^(1/k))]^½ — both
 * **from memory**, checked against measured mean charges in the tests. Meant for heavy ions
 * (Z ≳ 20) in light solid strippers (carbon, celluloid).
 */
export function nikolaevDmitriev(input: StripInput): ModelResult {
  const { z, beta, medium } = input
  const vCmS = beta * 2.99792458e10
  const ratio = vCmS / (3.6e8 * z ** 0.45)
  const mean = z * (1 + ratio ** (-1 / 0.6)) ** -0.6
  const width = 0.5 * Math.sqrt(Math.max(mean * (1 - (mean / z) ** (1 / 0.6)), 1e-6))
  const warnings: string[] = []
  if (medium.phase === 'gas') warnings.push('This formula describes solid strippers; the stripper here is a gas.')
  if (z < 20) warnings.push('This formula was fitted for heavy ions (Z ≳ 20); this ion is lighter.')
  if (medium.zEff > 13) warnings.push('This formula was fitted for light solid strippers; this stripper is heavier.')
  return finish(
    {
      model: 'nikolaev-dmitriev-1968',
      source: ND,
      coefficients: 'from memory (v′ = 3.6e8 cm/s, α = 0.45, k = 0.6, d₀ = 0.5), checked against measured mean charges',
      range: 'Heavy ions (Z ≳ 20) in light solid strippers',
      shape: 'gaussian',
      meanCharge: mean,
      width,
      warnings,
    },
    gaussianFractions(z, mean, width),
  )
}

/**
 * Sayer (1977), carbon foils and dilute gases, with its asymmetric shape. Carbon:
 * q₀ = Z[1 − 1.03 exp(−47.3 Z^−0.38 β^0.86)], ρ = 0.48 Z^0.45 [(q₀/Z)(1 − q₀/Z)]^0.26,
 * ε = ρ (0.0007 Z − 0.7 β). Gas: q₀ = Z[1 − 1.08 exp(−80.1 Z^−0.504 β^0.996)],
 * ρ = 0.35 Z^0.55 [(q₀/Z)(1 − q₀/Z)]^0.27, ε = ρ (0.17 + 0.0012 Z − 3.3 β).
 * Coefficients as carried by T. Kurita's octave-m eq_charge_dist.m, which cites the paper. The
 * paper's abstract states rms deviations of about 0.5 in q₀, 4 % in q₀/Z and 5–7 % in ρ.
 */
export function sayer(input: StripInput): ModelResult {
  const { z, beta, medium } = input
  const warnings: string[] = []
  let q0: number, rho: number, eps: number
  if (medium.phase === 'solid') {
    q0 = z * (1 - 1.03 * Math.exp(-47.3 * z ** -0.38 * beta ** 0.86))
    if (q0 > 0) rho = 0.48 * z ** 0.45 * ((q0 / z) * (1 - q0 / z)) ** 0.26
    else rho = 1
    eps = rho * (0.0007 * z - 0.7 * beta)
    if (medium.label !== 'C') warnings.push('Fitted for carbon foils; this solid stripper is not carbon.')
  } else {
    q0 = z * (1 - 1.08 * Math.exp(-80.1 * z ** -0.504 * beta ** 0.996))
    if (q0 > 0) rho = 0.35 * z ** 0.55 * ((q0 / z) * (1 - q0 / z)) ** 0.27
    else rho = 1
    eps = rho * (0.17 + 0.0012 * z - 3.3 * beta)
  }
  if (q0 <= 0) {
    warnings.push('Below the formula\'s range: it gives no positive charge at this velocity; shown for completeness only.')
    q0 = Math.max(q0, 0)
  }
  if (q0 >= z - 0.5) warnings.push('Close to the bare ion, where the fitted width loses its meaning.')
  const fractions = sayerFractions(z, q0, rho, eps)
  const mean = fractions.reduce((s, f) => s + f.charge * f.fraction, 0)
  return finish(
    {
      model: 'sayer-1977',
      source: SAYER,
      coefficients: "read from T. Kurita's implementation eq_charge_dist.m (octave-m), which cites the paper",
      range: `${medium.phase === 'solid' ? 'Carbon foils' : 'Dilute gases'}; rms ≈ 0.5 in q₀ (paper's abstract)`,
      shape: 'sayer-asymmetric',
      meanCharge: mean,
      width: rho,
      warnings,
    },
    fractions,
  )
}

/**
 * Baron et al. (1993), carbon foils at GANIL energies, with the high-Z correction:
 * q̄₁ = Z[1 − exp(−83.275 β / Z^0.447)], q̄ = q̄₁ [1 − exp(−12.905 + 0.2124 Z − 0.00122 Z²)],
 * d = [q̄₁ (0.07535 + 0.19 Y − 0.2654 Y²)]^½ with Y = q̄₁/Z. Coefficients as carried by the FRIB
 * FLAME envelope code (chg_stripper.cpp, "Baron's formula for carbon foil"), which names the paper.
 * The paper's range is above about 1.3 MeV/u — from memory.
 */
export function baron(input: StripInput): ModelResult {
  const { z, beta, mevPerU, medium } = input
  const q1 = z * (1 - Math.exp((-83.275 * beta) / z ** 0.447))
  const mean = q1 * (1 - Math.exp(-12.905 + 0.2124 * z - 0.00122 * z * z))
  const y = q1 / z
  const width = Math.sqrt(Math.max(q1 * (0.07535 + 0.19 * y - 0.2654 * y * y), 1e-6))
  const warnings: string[] = []
  if (medium.phase === 'gas' || medium.label !== 'C') warnings.push('Fitted for carbon foils only; this stripper is not a carbon foil.')
  if (mevPerU < 1.3) warnings.push('Below about 1.3 MeV/u, under the range the paper fitted (from memory).')
  return finish(
    {
      model: 'baron-1993',
      source: BARON,
      coefficients: 'read from the FRIB FLAME code (chg_stripper.cpp), which names the paper',
      range: 'Carbon foils, above about 1.3 MeV/u (from memory)',
      shape: 'gaussian',
      meanCharge: mean,
      width,
      warnings,
    },
    gaussianFractions(z, mean, width),
  )
}

/** Every model, in a fixed order. */
export function chargeStateModels(input: StripInput): ModelResult[] {
  return [schiwietzGrande(input), nikolaevDmitriev(input), sayer(input), baron(input)]
}
