/**
 * Slater's rules: J. C. Slater, "Atomic shielding constants", Phys. Rev. 36, 57 (1930).
 *
 * Electrons are grouped (1s)(2s,2p)(3s,3p)(3d)(4s,4p)(4d)(4f)(5s,5p)(5d)(5f)(6s,6p)(6d)(7s,7p)…
 * — by n, and within n the s,p group before d before f. For an electron in a group, the screening
 * constant σ collects 0.35 from every other electron of its group (0.30 within 1s), nothing from
 * groups to its right, and from the groups to its left: for an s,p electron 0.85 from each
 * electron with principal quantum number n − 1 and 1.00 from each deeper one; for a d or f
 * electron 1.00 from each. Z_eff = Z − σ. Slater's effective principal quantum number n* is
 * 1, 2, 3, 3.7, 4.0, 4.2 for n = 1…6; the paper stops at n = 6, and we keep 4.2 for n = 7 and 8
 * (our extension, needed for the 7s, 7p and 8s electrons of the heaviest elements).
 */
import { type Subshell, subshellLabel } from './subshells'

export interface ScreeningRow {
  subshell: string
  nStar: number
  sigma: number
  zEff: number
}

const N_STAR = [0, 1, 2, 3, 3.7, 4.0, 4.2]

/** Slater's effective principal quantum number n* for principal quantum number n. */
export function nStar(n: number): number {
  return N_STAR[Math.min(n, 6)]
}

// Position of a subshell's group in Slater's ordering: n, then s,p (0) < d (1) < f (2) < g (3).
function group(s: { n: number; l: number }): number {
  return s.n * 4 + Math.max(0, s.l - 1)
}

// Sums of 0.35, 0.85 … in floating point leave 9.500000000000002; Slater's σ is a multiple of 0.05.
const tidy = (x: number) => Math.round(x * 1e6) / 1e6

/** σ for one electron in `target`, screened by the other electrons of the configuration. */
export function screeningConstant(subshells: readonly Subshell[], target: { n: number; l: number }): number {
  const g = group(target)
  const sp = target.l <= 1
  let sigma = 0
  for (const s of subshells) {
    const others = s.n === target.n && s.l === target.l ? s.electrons - 1 : s.electrons
    if (others <= 0) continue
    const gs = group(s)
    if (gs === g) sigma += others * (target.n === 1 ? 0.3 : 0.35)
    else if (gs < g) sigma += others * (sp && s.n === target.n - 1 ? 0.85 : 1.0)
  }
  return tidy(sigma)
}

/** One screening row (subshell, n*, σ, Z_eff) per occupied subshell, in canonical order. */
export function slaterScreening(z: number, subshells: readonly Subshell[]): ScreeningRow[] {
  return subshells.map((s) => {
    const sigma = screeningConstant(subshells, s)
    return { subshell: subshellLabel(s.n, s.l), nStar: nStar(s.n), sigma, zEff: tidy(z - sigma) }
  })
}

/** Slater's total electronic energy −R Σ N_i (Z_eff,i / n*_i)², in units of R (13.6057 eV). */
export function slaterTotalEnergyRydberg(z: number, subshells: readonly Subshell[]): number {
  let sum = 0
  for (const s of subshells) {
    const zEff = z - screeningConstant(subshells, s)
    sum += s.electrons * (zEff / nStar(s.n)) ** 2
  }
  return -sum
}
