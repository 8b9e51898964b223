/**
 * Uehling vacuum polarisation of the 1s level of a one-electron ion with a finite nucleus, as the
 * expectation value of the Uehling potential (E. A. Uehling, Phys. Rev. 48, 55 (1935)) of a
 * uniformly charged sphere. Units: ħ = c = m_e = 1 (lengths in ħ/(m c), energies in m c²).
 *
 * The point-charge potential is
 *   V(r) = −(2α/3π) (Zα/r) ∫₁^∞ dt e^(−2tr) (1 + 1/(2t²)) √(t²−1) / t²;
 * folded with a uniform sphere of radius R, each Yukawa term e^(−μ|r−r'|)/|r−r'| (μ = 2t) averages
 * over the sphere in closed form (below), leaving the t integral, done numerically with
 * t = cosh θ. The 1s density is the regular solution of the Dirac equation in the sphere's
 * field out to 100 R, joined there to the point-nucleus Dirac one, ∝ r^(2γ) e^(−2Zαr). Tested against the point-nucleus limit −(4/15)(α/π)(Zα)⁴ m c² at low Z and
 * against the published finite-nucleus Uehling shift of U⁹¹⁺.
 */

const ALPHA = 7.2973525693e-3

/** ∫ over a uniform sphere (radius R, unit charge) of e^(−μ|r−r'|)/|r−r'| d³r', at distance r. */
function sphereYukawa(mu: number, r: number, radius: number): number {
  const n = 3 / (2 * mu * r * radius ** 3)
  const m2 = 1 / (mu * mu)
  if (r >= radius) {
    // 2 e^(−μr) [R cosh(μR)/μ − sinh(μR)/μ²], written without overflow
    const a = Math.exp(mu * (radius - r))
    const b = Math.exp(-mu * (radius + r))
    return n * (radius * (a + b) / mu - (a - b) * m2)
  }
  // e^(−μr)·2[r cosh(μr)/μ − sinh(μr)/μ²] + 2 sinh(μr)·[e^(−μr)(r/μ + 1/μ²) − e^(−μR)(R/μ + 1/μ²)]
  const e2 = Math.exp(-2 * mu * r)
  const inner = r * (1 + e2) / mu - (1 - e2) * m2
  const outer = (1 - e2) * (r / mu + m2) - (Math.exp(-mu * (radius - r)) - Math.exp(-mu * (radius + r))) * (radius / mu + m2)
  return n * (inner + outer)
}

// t = cosh θ on a uniform θ grid: the integrand (1 + 1/(2t²)) tanh²θ e^(…) is smooth from θ = 0.
const THETA_STEP = 0.16
const THETA_MAX = 14
const G = { OUT: 40, IN: 16, MID: 50 }

// the θ grid's t = cosh θ and weight (1 + 1/(2t²)) tanh²θ, computed once
const T: number[] = []
const WEIGHT: number[] = []
for (let theta = THETA_STEP / 2; theta < THETA_MAX; theta += THETA_STEP) {
  const t = Math.cosh(theta)
  const th = Math.tanh(theta)
  T.push(t)
  WEIGHT.push((1 + 1 / (2 * t * t)) * th * th)
}

/** The Uehling potential of a uniform sphere of charge Z and radius R at r (units of m c², negative). */
export function uehlingPotential(z: number, r: number, radius: number): number {
  let sum = 0
  for (let i = 0; i < T.length; i++) {
    const t = T[i]
    // outside the sphere the term falls as e^(−2t(r − R)): past e^(−40) it adds nothing at double precision
    if (r > radius && t * (r - radius) > 20) break
    sum += WEIGHT[i] * sphereYukawa(2 * t, r, radius)
  }
  return ((-2 * ALPHA) / (3 * Math.PI)) * z * ALPHA * sum * THETA_STEP
}

/**
 * Regular Dirac 1s solution (radial density G² + F², unnormalised) in the field of a uniform
 * sphere: RK4 from the origin to R on a linear grid, then on a logarithmic grid out to `match`.
 * Outward integration is stable (the irregular solution falls off outward), and by `match` =
 * 100 R the solution has relaxed onto the point-nucleus shape to ~(1/100)^(2γ) (Shabaev 1993).
 */
function regularSolution(alphaZ: number, radius: number, match: number, energy: number): { r: number[]; rho: number[] } {
  const v = (r: number) => (r < radius ? (-alphaZ * (3 - (r * r) / (radius * radius))) / (2 * radius) : -alphaZ / r)
  // κ = −1: G' = G/r + (E − V + 1) F,  F' = −F/r − (E − V − 1) G
  const deriv = (r: number, g: number, f: number): [number, number] => [g / r + (energy - v(r) + 1) * f, -f / r - (energy - v(r) - 1) * g]
  let r = radius / 1000
  let g = r
  let f = (-(energy - v(0) - 1) * r * r) / 3
  const rs = [r]
  const rho = [g * g + f * f]
  const advance = (next: number) => {
    const h = next - r
    const [k1g, k1f] = deriv(r, g, f)
    const [k2g, k2f] = deriv(r + h / 2, g + (h / 2) * k1g, f + (h / 2) * k1f)
    const [k3g, k3f] = deriv(r + h / 2, g + (h / 2) * k2g, f + (h / 2) * k2f)
    const [k4g, k4f] = deriv(next, g + h * k3g, f + h * k3f)
    g += (h / 6) * (k1g + 2 * k2g + 2 * k3g + k4g)
    f += (h / 6) * (k1f + 2 * k2f + 2 * k3f + k4f)
    r = next
    rs.push(r)
    rho.push(g * g + f * f)
  }
  for (let i = 1; i <= G.IN; i++) advance((radius * i) / G.IN)
  const ratio = Math.log(match / radius)
  for (let i = 1; i <= G.MID; i++) advance(radius * Math.exp((ratio * i) / G.MID))
  return { r: rs, rho }
}

function lnGamma(x: number): number {
  // Lanczos approximation (g = 7, n = 9), good to ~1e−15 for x > 0.5
  const c = [0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
    12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7]
  const y = x - 1
  let a = c[0]
  const t = y + 7.5
  for (let i = 1; i < 9; i++) a += c[i] / (y + i)
  return 0.5 * Math.log(2 * Math.PI) + (y + 0.5) * Math.log(t) - t + Math.log(a)
}

/**
 * The Uehling shift of the 1s level (negative: the level falls, the binding grows), in units of
 * m c², for a nucleus of charge Z and rms radius rmsFm (a uniform sphere of R = √(5/3) R_rms).
 */
export function uehlingShift1s(z: number, rmsFm: number, comptonFm: number): number {
  const alphaZ = z * ALPHA
  const gamma = Math.sqrt(1 - alphaZ * alphaZ)
  const radius = (Math.sqrt(5 / 3) * rmsFm) / comptonFm
  // point-nucleus radial density P(r) = (2Zα)^(2γ+1)/Γ(2γ+1) r^(2γ) e^(−2Zαr), normalised to 1
  const logNorm = (2 * gamma + 1) * Math.log(2 * alphaZ) - lnGamma(2 * gamma + 1)
  const pointDensity = (r: number) => Math.exp(logNorm + 2 * gamma * Math.log(r) - 2 * alphaZ * r)
  // near the nucleus: the sphere's regular solution, scaled to the point density at 100 R
  const match = 100 * radius
  const near = regularSolution(alphaZ, radius, match, gamma)
  const scale = pointDensity(match) / near.rho[near.rho.length - 1]
  let energy = 0
  for (let i = 1; i < near.r.length; i++) {
    const a = near.r[i - 1]
    const b = near.r[i]
    energy += ((b - a) / 2) * (uehlingPotential(z, a, radius) * near.rho[i - 1] + uehlingPotential(z, b, radius) * near.rho[i]) * scale
  }
  // outside: logarithmic grid from R to where both the potential (range 1/2) and the density have died out
  const end = Math.min(30, 40 / alphaZ)
  const n = G.OUT
  const step = Math.log(end / match) / n
  let outside = 0
  for (let i = 0; i <= n; i++) {
    const r = match * Math.exp(i * step)
    const w = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2
    outside += w * uehlingPotential(z, r, radius) * pointDensity(r) * r
  }
  return energy + (outside * step) / 3
}
