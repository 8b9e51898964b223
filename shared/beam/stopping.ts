/**
 * Electronic energy loss of a heavy ion in the stripper.
 *
 * Proton stopping from the Bethe formula (H. Bethe, Ann. Phys. 5, 325 (1930); relativistic form
 * as in the Review of Particle Physics, "Passage of particles through matter"):
 *   S_p = K (Z/A) (1/β²) [½ ln(2 mₑc² β²γ² T_max / I²) − β²],  K = 0.307075 MeV cm²/mol,
 * with the Bloch correction for z = 1, −y² Σₙ 1/[n(n² + y²)], y = α/β (F. Bloch, Ann. Phys. 16,
 * 285 (1933)). Left out, and so limiting the range: the shell correction (important below a few
 * MeV/u, more so in heavy targets), the Barkas term and the density effect (negligible below
 * ~100 MeV/u). The heavy ion's stopping is the proton's at the same velocity times the square of
 * its effective charge (the effective-charge scaling of L. C. Northcliffe, Annu. Rev. Nucl. Sci.
 * 13, 67 (1963)), with z_eff = Z [1 − exp(−0.95 v/(v₀ Z^(2/3)))] (T. E. Pierce and M. Blann,
 * Phys. Rev. 173, 390 (1968) — from memory).
 *
 * Range as we state it (our judgement, no source): at least 1 MeV/u, where the left-out shell
 * correction stays at the level of ~10 % for light targets; an uncertainty of ±15 % is shown
 * with every value, larger than that for heavy targets below 5 MeV/u (flagged). Below 1 MeV/u
 * the answer is "not estimated here".
 */
import { C_IN_BOHR, ELECTRON_MASS_MEV } from './kinematics'
import type { Medium } from './media'

const K_MEV_CM2_MOL = 0.307075 // PDG Review of Particle Physics, Table "Atomic and nuclear properties"
const PROTON_MASS_MEV = 938.27208816 // CODATA 2018
export const MIN_MEV_PER_U = 1

export const STOPPING_SOURCE =
  'Bethe (1930) proton stopping with the Bloch (1933) correction, scaled by the Pierce–Blann (1968) effective charge squared (Northcliffe 1963)'

/** Bloch's correction to the stopping number, −y² Σ 1/[n(n² + y²)] (exact series, Bloch 1933). */
export function blochCorrection(y: number): number {
  let sum = 0
  for (let n = 1; n <= 2000; n++) sum += 1 / (n * (n * n + y * y))
  return -y * y * sum
}

/** Electronic stopping of a proton of velocity β in a medium (Z/A, I), MeV cm²/g. */
export function protonStopping(beta: number, zOverA: number, iEv: number): number {
  const b2 = beta * beta
  const g2 = 1 / (1 - b2)
  const gamma = Math.sqrt(g2)
  const me = ELECTRON_MASS_MEV
  const r = me / PROTON_MASS_MEV
  const tMax = (2 * me * b2 * g2) / (1 + 2 * gamma * r + r * r)
  const iMeV = iEv * 1e-6
  const lNumber = 0.5 * Math.log((2 * me * b2 * g2 * tMax) / (iMeV * iMeV)) - b2 + blochCorrection(1 / (C_IN_BOHR * beta))
  return ((K_MEV_CM2_MOL * zOverA) / b2) * lNumber
}

/** Pierce–Blann effective charge of an ion Z moving at v/v₀ (from memory). */
export function effectiveCharge(z: number, vOverV0: number): number {
  return z * (1 - Math.exp((-0.95 * vOverV0) / z ** (2 / 3)))
}

export interface EnergyLoss {
  estimated: true
  /** areal density used, µg/cm² */
  arealDensityUgCm2: number
  /** stopping at entry, MeV cm²/mg */
  stoppingMeVCm2PerMg: number
  effectiveCharge: number
  /** energy lost in the foil, MeV (total) */
  lossMeV: number
  lossMeVPerU: number
  exitMeVPerU: number
  /** relative uncertainty we show with it */
  uncertainty: number
  method: string
  warnings: string[]
}

export interface NotEstimated {
  estimated: false
  reason: string
}

/**
 * Energy lost by the ion crossing `arealDensityUgCm2` of the medium, integrated in 20 steps so
 * a thick foil's slowing down is followed. Below 1 MeV/u: not estimated.
 */
export function energyLoss(opts: {
  z: number
  massU: number
  mevPerU: number
  medium: Medium
  arealDensityUgCm2: number
  velocity: (mevPerU: number) => { beta: number; vOverV0: number }
}): EnergyLoss | NotEstimated {
  const { z, massU, medium, arealDensityUgCm2 } = opts
  if (opts.mevPerU < MIN_MEV_PER_U) {
    return { estimated: false, reason: `Energy loss not estimated here: below ${MIN_MEV_PER_U} MeV/u the Bethe formula without shell corrections does not hold.` }
  }
  const stepsGcm2 = (arealDensityUgCm2 * 1e-6) / 20
  let e = opts.mevPerU
  let first = 0
  let firstCharge = 0
  for (let i = 0; i < 20; i++) {
    const v = opts.velocity(e)
    const zeff = effectiveCharge(z, v.vOverV0)
    const s = zeff * zeff * protonStopping(v.beta, medium.zOverA, medium.iEv) // MeV cm²/g per ion
    if (i === 0) {
      first = s
      firstCharge = zeff
    }
    e -= (s * stepsGcm2) / massU
    if (e < MIN_MEV_PER_U) {
      return { estimated: false, reason: 'Energy loss not estimated here: the ion would slow below 1 MeV/u inside the foil, where the formula does not hold.' }
    }
  }
  const warnings: string[] = [...medium.notes]
  let uncertainty = 0.15
  if (medium.zEff > 13 && opts.mevPerU < 5) {
    uncertainty = 0.3
    warnings.push('Heavy stripper below 5 MeV/u: shell corrections left out of this estimate matter; take it as ±30 %.')
  }
  if (opts.mevPerU > 100) warnings.push('Above about 100 MeV/u the density effect, left out of this estimate, begins to lower the stopping: take the loss as an upper estimate.')
  const loss = opts.mevPerU - e
  if (loss / opts.mevPerU > 0.05) warnings.push('The foil takes more than 5 % of the energy: the charge-state estimate uses the entry energy.')
  return {
    estimated: true,
    arealDensityUgCm2,
    stoppingMeVCm2PerMg: first / 1000,
    effectiveCharge: firstCharge,
    lossMeV: loss * massU,
    lossMeVPerU: loss,
    exitMeVPerU: e,
    uncertainty,
    method: STOPPING_SOURCE,
    warnings,
  }
}
