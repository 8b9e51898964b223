/**
 * Electron-impact ionisation cross-sections from the Lotz formula (W. Lotz, Z. Phys. 206, 205
 * (1967); Z. Phys. 216, 241 (1968)):
 *   σ = Σᵢ aᵢ qᵢ ln(E/Pᵢ) / (E Pᵢ) · {1 − bᵢ exp[−cᵢ (E/Pᵢ − 1)]},  E ≥ Pᵢ,
 * summed over the occupied subshells i with qᵢ electrons bound by Pᵢ. We use the simplified
 * constants Lotz gives for highly charged ions, a = 4.5 × 10⁻¹⁴ cm² eV², b = c = 0, for every
 * step: the fitted (aᵢ, bᵢ, cᵢ) Lotz tabulated for low charge states (q ≲ 3) were not read here,
 * so those steps carry a warning. Non-relativistic: flagged above 50 keV electron energy.
 * The uncertainty shown is the ±30–40 % usually quoted for the formula (common practice; no
 * single source read here) — we show ±35 %.
 */
import type { SubshellBinding } from './binding'

export const LOTZ_A_CM2_EV2 = 4.5e-14
export const LOTZ_UNCERTAINTY = 0.35
export const LOTZ_SOURCE = 'W. Lotz, Z. Phys. 206, 205 (1967); Z. Phys. 216, 241 (1968), simplified constants a = 4.5e-14 cm² eV², b = c = 0'

/** Lotz cross-section, cm², for electrons of energy E (eV) on subshells bound by Pᵢ. */
export function lotzCrossSection(electronEnergyEv: number, subshells: readonly Pick<SubshellBinding, 'electrons' | 'eV'>[]): number {
  let sigma = 0
  for (const s of subshells) {
    if (electronEnergyEv <= s.eV) continue
    sigma += (LOTZ_A_CM2_EV2 * s.electrons * Math.log(electronEnergyEv / s.eV)) / (electronEnergyEv * s.eV)
  }
  return sigma
}
