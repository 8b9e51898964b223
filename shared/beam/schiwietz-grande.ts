/**
 * The Schiwietz–Grande mean-charge formulas: the 2001 one for gases and solids, and its 2004
 * update for solids. Both take the width from the 2001 paper (see each model's `coefficients`).
 */
import { finish, gaussianFractions, type ModelResult, type NotApplicableModel, type StripInput } from './distribution'

const SG2001 = 'G. Schiwietz and P. L. Grande, Nucl. Instrum. Methods B 175–177, 125 (2001), Eqs. (1)–(6)'
const SG2004 = 'G. Schiwietz, K. Czerski, M. Roth, F. Staufenbiel and P. L. Grande, Nucl. Instrum. Methods B 225, 4 (2004)'

/**
 * The 2001 width d = 0.7 / [Zp^−0.27 Zt^(0.035 − 0.0009 Zp) f(q̄) f(Zp − q̄)],
 * f(y) = √((y + 0.37 Zp^0.6)/y), for a mean q̄ kept inside (0, Zp).
 */
function width2001(z: number, zt: number, mean: number): number {
  const a = 0.37 * z ** 0.6
  const f1 = Math.sqrt((mean + a) / mean)
  const f2 = Math.sqrt((z - mean + a) / (z - mean))
  return 0.7 / (z ** -0.27 * zt ** (0.035 - 0.0009 * z) * f1 * f2)
}

const inside = (z: number, mean: number) => Math.min(Math.max(mean, 1e-6), z - 1e-6)

function commonWarnings(input: StripInput, mean: number): string[] {
  const warnings: string[] = []
  if (input.medium.parts.length > 1) warnings.push('Compound stripper: its mean atomic number stands in for Zt, which the paper does not do.')
  if (input.z - mean < 0.5) warnings.push('Nearly bare ion: the Gaussian width formula is least reliable here.')
  return warnings
}

/**
 * Schiwietz & Grande (2001). Solid: x = [(v/v₀) Zp^−0.52 Zt^(−0.019 Zp^−0.52 v/v₀) / 1.68]^(1 + 1.8/Zp),
 * q̄ = Zp (12x + x⁴) / (0.07/x + 6 + 0.3 x^½ + 10.37 x + x⁴). Gas: x = [(v/v₀) Zp^−0.52
 * Zt^(0.03 − 0.017 Zp^−0.52 v/v₀)]^(1 + 0.4/Zp), q̄ = Zp (376x + x⁶)/(1428 − 1206 x^½ + 690x + x⁶).
 * Width: `width2001`. Coefficients as carried by S. Schippers' stripping.cxx (Univ. Giessen, GPL),
 * which cites the paper. The paper fits all projectiles and targets with data; it quotes a
 * relative standard deviation of about 2.3 % (solids) and 2.6 % (gases) in q̄ — from memory.
 */
export function schiwietzGrande(input: StripInput): ModelResult {
  const { z, vOverV0, medium } = input
  const zt = medium.zEff
  const vz = vOverV0 * z ** -0.52
  let mean: number
  if (medium.phase === 'solid') {
    const x = ((vz * zt ** (-0.019 * vz)) / 1.68) ** (1 + 1.8 / z)
    mean = (z * (12 * x + x ** 4)) / (0.07 / x + 6 + 0.3 * Math.sqrt(x) + 10.37 * x + x ** 4)
  } else {
    const x = (vz * zt ** (0.03 - 0.017 * vz)) ** (1 + 0.4 / z)
    mean = (z * (376 * x + x ** 6)) / (1428 - 1206 * Math.sqrt(x) + 690 * x + x ** 6)
  }
  mean = inside(z, mean)
  const width = width2001(z, zt, mean)
  return finish(
    {
      model: 'schiwietz-grande-2001',
      source: SG2001,
      coefficients: "read from S. Schippers' implementation stripping.cxx, which cites the paper",
      range: `${medium.phase === 'solid' ? 'Solid' : 'Gas'} targets, all projectiles and velocities of the data fitted; ~2–3 % in q̄ (from memory)`,
      shape: 'gaussian',
      meanCharge: mean,
      width,
      warnings: commonWarnings(input, mean),
    },
    gaussianFractions(z, mean, width),
  )
}

/**
 * Schiwietz et al. (2004), solid strippers only:
 *   v̂ = Zp^−0.543 v/v₀,  c₁ = 1 − 0.26 exp(−Zt/11 − (Zt − Zp)²/9),  c₂ = 1 + 0.03 v̂ ln Zt,
 *   x = c₁ [v̂ / (1.54 c₂)]^(1 + 1.83/Zp),  q̄ = Zp (8.29x + x⁴) / (0.06/x + 4 + 7.4x + x⁴).
 * Coefficients as carried by two codes that cite the paper and agree term by term: N. Medvedev's
 * TREKIS-4 (Source_files/SHI_charge_state.f90, case 3) and the catima library
 * (calculations.cpp, z_eff_Schiwietz). The paper's own width could not be read; the 2001 width
 * (`width2001`) is used with this mean, and `coefficients` says so.
 * Worked value (tests): ²⁰⁸Pb at 4.2 MeV/u in carbon, q̄ = 52.78.
 */
export function schiwietzGrande2004(input: StripInput): ModelResult | NotApplicableModel {
  const { z, vOverV0, medium, mevPerU } = input
  if (medium.phase === 'gas') {
    return {
      model: 'schiwietz-grande-2004',
      source: SG2004,
      reason: 'This update is for solid strippers only and the stripper here is a gas; schiwietz-grande-2001 covers gases.',
    }
  }
  const zt = medium.zEff
  const vHat = z ** -0.543 * vOverV0
  const c1 = 1 - 0.26 * Math.exp(-zt / 11 - (zt - z) ** 2 / 9)
  const c2 = 1 + 0.03 * vHat * Math.log(zt)
  const x = c1 * (vHat / (c2 * 1.54)) ** (1 + 1.83 / z)
  const mean = inside(z, (z * (8.29 * x + x ** 4)) / (0.06 / x + 4 + 7.4 * x + x ** 4))
  const width = width2001(z, zt, mean)
  const warnings = commonWarnings(input, mean)
  if (z > 16 && mevPerU >= 1 && mevPerU <= 4) {
    warnings.push('Between 1 and 4 MeV/u this formula was found good for projectiles up to Z = 16 and less good for heavier ones (M. Kaur, S. Kumar and T. Nandi, arXiv:2502.04831, abstract).')
  }
  return finish(
    {
      model: 'schiwietz-grande-2004',
      source: SG2004,
      coefficients:
        "read from N. Medvedev's TREKIS-4 (SHI_charge_state.f90) and the catima library (calculations.cpp), both citing the paper; the 2004 paper's own width formula could not be read, so the width is the 2001 paper's formula taken at this mean",
      range: 'Solid strippers only, all projectiles; the paper’s stated accuracy could not be read',
      shape: 'gaussian',
      meanCharge: mean,
      width,
      warnings,
    },
    gaussianFractions(z, mean, width),
  )
}
