/**
 * Equilibrium charge-state distributions after a stripper: several published semi-empirical
 * formulas side by side. Each gives a mean (or most probable) charge and a width; the fractions
 * are the paper's shape evaluated at every integer charge 0…Z and normalised over that range
 * (`distribution.ts`). The Schiwietz–Grande formulas are in `schiwietz-grande.ts`.
 *
 * Where the coefficients come from: we could not read the papers themselves here. The formulas
 * were read from published implementations that cite the papers (named per model) and
 * cross-checked against measured equilibrium charges in tests/unit/beam/charge-states.test.ts.
 * The validity flags are ours where the paper's own stated range could not be read; each says so.
 *
 * Left out, and why: Shima, Ishihara & Mikumo (Nucl. Instrum. Methods 200, 605 (1982)), the
 * formula with X = v/(v₀ Z^0.45) and a target-Z correction. Searched for a faithful source of
 * its coefficients and width: the code index (semantic search for the formula and the authors;
 * exact-string search for "Shima", "Mikumo", "Shima et al" and for its coefficients as they
 * would be written in code), the documentation index and stored web pages (the formula, the
 * paper, and the authors' 1986 compilation in At. Data Nucl. Data Tables 34, 357, whose
 * "Mean Charge" and "Distribution Width" sections would carry it but of which only the contents
 * page could be read). None gave the coefficients; recalling them is not good enough.
 */
import { finish, gaussianFractions, sayerFractions, type ModelResult, type NotApplicableModel, type StripInput } from './distribution'
import { schiwietzGrande, schiwietzGrande2004 } from './schiwietz-grande'

export type { ChargeFraction, ModelName, ModelResult, NotApplicableModel, StripInput } from './distribution'
export { MODEL_NAMES, gaussianFractions, sayerFractions } from './distribution'
export { schiwietzGrande, schiwietzGrande2004 } from './schiwietz-grande'

const ND = 'V. S. Nikolaev and I. S. Dmitriev, Phys. Lett. 28A, 277 (1968)'
const SAYER = 'R. O. Sayer, Rev. Phys. Appl. 12, 1543 (1977)'
const BARON = 'E. Baron, M. Bajard and Ch. Ricaud, "Charge exchange of very heavy ions in carbon foils and in the residual gas of GANIL cyclotrons", Nucl. Instrum. Methods A 328, 177 (1993)'

/**
 * Nikolaev & Dmitriev (1968), solid strippers: q̄/Z = [1 + (v / (v′ Z^α))^(−1/k)]^(−k) with
 * v′ = 3.6 × 10⁸ cm/s, α = 0.45, k = 0.6 — first recalled, since found as written here in
 * PyBEAMING (R. Snuggs, after R. Haar's BEAMNG; function gbar), which cites the paper (TREKIS-4
 * writes v′ = (4/3) v₀ ≈ 2.9 × 10⁸ cm/s instead; we keep 3.6 × 10⁸); width
 * d = 0.5 [q̄ (1 − (q̄/Z)^(1/k))]^½ **from memory**, checked against measured mean charges in the
 * tests. Meant for heavy ions (Z ≳ 20) in light solid strippers (carbon, celluloid).
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
      coefficients: 'v′ = 3.6e8 cm/s, α = 0.45, k = 0.6 as carried by PyBEAMING (after R. Haar\'s BEAMNG), which cites the paper; width d₀ = 0.5 from memory; checked against measured mean charges',
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
  const variance = q1 * (0.07535 + 0.19 * y - 0.2654 * y * y)
  const width = Math.sqrt(Math.max(variance, 1e-6))
  const warnings: string[] = []
  if (variance <= 1e-6) warnings.push('Close to the bare ion the width formula gives no spread: the distribution shown is a single charge state, which the paper does not claim.')
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

export interface ChargeStateEstimates {
  /** the formulas that give a number here, in a fixed order */
  models: ModelResult[]
  /** the formulas that do not apply to this stripper, with the reason */
  notApplicable: NotApplicableModel[]
}

/** Every formula, in a fixed order: those that apply with their numbers, the others with why not. */
export function chargeStateEstimates(input: StripInput): ChargeStateEstimates {
  const all = [schiwietzGrande(input), schiwietzGrande2004(input), nikolaevDmitriev(input), sayer(input), baron(input)]
  return {
    models: all.filter((m): m is ModelResult => 'fractions' in m),
    notApplicable: all.filter((m): m is NotApplicableModel => 'reason' in m),
  }
}

/** The formulas that give a number for this input, in a fixed order. */
export function chargeStateModels(input: StripInput): ModelResult[] {
  return chargeStateEstimates(input).models
}
