/**
 * The relativistic correction to local exchange of A. K. Rajagopal (J. Phys. C 11, L943, 1978) and
 * A. H. MacDonald and S. H. Vosko (J. Phys. C 12, 2977, 1979), as used for the RLDA column of the
 * NIST atomic reference tables (S. Kotochigova, Z. H. Levine, E. L. Shirley, M. D. Stiles and
 * C. W. Clark, Phys. Rev. A 55, 191, 1997). With β = (3π²n)^{1/3}/c and μ = √(1 + β²) for the
 * unpolarised gas, the exchange energy density is multiplied by
 *   Φ(β) = 1 − (3/2)·[(βμ − ln(β + μ))/β²]²
 * and the exchange potential by
 *   ψ(β) = 3·ln(β + μ)/(2βμ) − ½.
 * Per spin (spin scaling) n → 2n_σ. Correlation is left as it is.
 */
import { LIGHT_SPEED_AU } from './dirac-radial'

const CX = -0.75 * Math.cbrt(6 / Math.PI)
const VX = -Math.cbrt(6 / Math.PI)

/** Φ and ψ of one spin density n_σ (bohr⁻³); both tend to 1 as β → 0. */
export function exchangeFactors(nSpin: number): { energy: number; potential: number } {
  const beta = Math.cbrt(6 * Math.PI * Math.PI * nSpin) / LIGHT_SPEED_AU
  if (beta < 1e-4) {
    // series: Φ ≈ 1 − (2/3)β², ψ ≈ 1 − 2β² (from the expansions of the closed forms above)
    return { energy: 1 - (2 / 3) * beta * beta, potential: 1 - 2 * beta * beta }
  }
  const mu = Math.sqrt(1 + beta * beta)
  const ash = Math.log(beta + mu)
  const a = (beta * mu - ash) / (beta * beta)
  return { energy: 1 - 1.5 * a * a, potential: (3 * ash) / (2 * beta * mu) - 0.5 }
}

/**
 * Adds the correction to spin potentials vUp/vDown filled by lsdOnGrid for radial spin densities
 * p_σ = 4πr²n_σ, and returns the change of the exchange–correlation energy.
 */
export function addRelativisticExchange(
  r: Float64Array,
  dr: Float64Array,
  pUp: Float64Array,
  pDown: Float64Array,
  vUp: Float64Array,
  vDown: Float64Array,
): number {
  let energy = 0
  for (let i = 0; i < r.length; i++) {
    const shell = 4 * Math.PI * r[i] * r[i]
    for (let s = 0; s < 2; s++) {
      const n = Math.max(0, (s === 0 ? pUp[i] : pDown[i]) / shell)
      if (!(n > 1e-30)) continue
      const f = exchangeFactors(n)
      const c = Math.cbrt(n)
      energy += dr[i] * shell * CX * n * c * (f.energy - 1)
      const dv = VX * c * (f.potential - 1)
      if (s === 0) vUp[i] += dv
      else vDown[i] += dv
    }
  }
  return energy
}

/**
 * The same correction for a fully spin-polarised density p = 4πr²n over [0, end) (the
 * self-interaction terms of sic.ts): adds to v and returns the energy change, so that a lone
 * electron's self-exchange still cancels exactly.
 */
export function addRelativisticPolarised(r: Float64Array, dr: Float64Array, p: Float64Array, end: number, v: Float64Array): number {
  let energy = 0
  for (let i = 0; i < end; i++) {
    const shell = 4 * Math.PI * r[i] * r[i]
    const n = p[i] / shell
    if (!(n > 1e-30)) continue
    const f = exchangeFactors(n)
    const c = Math.cbrt(n)
    energy += dr[i] * shell * CX * n * c * (f.energy - 1)
    v[i] += VX * c * (f.potential - 1)
  }
  return energy
}
