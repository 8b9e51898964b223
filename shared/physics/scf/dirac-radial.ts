/**
 * Bound states of the radial Dirac equation in a central potential on the log grid, the radial
 * problem of D. A. Liberman, D. T. Cromer and J. T. Waber, Comput. Phys. Commun. 2, 107 (1971).
 *
 * With G = r·g (large) and F = r·f (small component), κ = ∓(j + ½) for j = l ± ½, energies without
 * the rest energy and c the speed of light in atomic units, the equations in x = ln r read
 *   dG/dx = −κ·G + r·(E − V + 2c²)/c · F,     dF/dx = κ·F − r·(E − V)/c · G.
 * They are linear, so the implicit four-point Adams–Moulton step (local error h⁵) is solved exactly
 * as a 2×2 system at every point. The eigenvalue is found by shooting as in radial.ts: out from the
 * nucleus and in from the far side to the outermost classical turning point, node counting on G to
 * bracket the state, and the first-order correction δE = c·G·(F_out − F_in) / ∫(G² + F²) dr from
 * the jump of F at the matching point (derived from the Wronskian of two energies; the corrector
 * of the Desclaux and Grant-type codes), bisecting when it would leave the bracket.
 */
import type { RadialGrid } from './grid'

/** speed of light in atomic units, 1/α with α from CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010, 2021) */
export const LIGHT_SPEED_AU = 137.035999084

export interface DiracState {
  energy: number
  /** large and small components G = r·g, F = r·f, with ∫(G² + F²) dr = 1 */
  g: Float64Array
  f: Float64Array
}

/** Scratch arrays for one grid. */
export interface DiracWorkspace {
  g: Float64Array
  f: Float64Array
  dg: Float64Array
  df: Float64Array
}

export function diracWorkspace(grid: RadialGrid): DiracWorkspace {
  const n = grid.size
  return { g: new Float64Array(n), f: new Float64Array(n), dg: new Float64Array(n), df: new Float64Array(n) }
}

/** κ of the subshell l, j = l + s·½ (s = ±1). */
export function kappaOf(l: number, twoJ: number): number {
  return twoJ === 2 * l + 1 ? -(l + 1) : l
}

const WKB_DEPTH = 40
const MAX_STEPS = 300

/**
 * The bound state of potential v (hartree) with n − l − 1 nodes in G, or a failure reason.
 * nucleusRadius (bohr, 0 for a point charge) picks the start of the outward solution: inside a
 * finite nucleus the regular solution goes as r^(l+1), outside a point charge as r^γ.
 */
export function solveDiracState(
  grid: RadialGrid,
  v: Float64Array,
  z: number,
  n: number,
  kappa: number,
  guess: number,
  ws: DiracWorkspace,
  tolerance = 1e-11,
  nucleusRadius = 0,
): DiracState | string {
  const { size, h, r } = grid
  const { g, f, dg, df } = ws
  const l = kappa < 0 ? -kappa - 1 : kappa
  const nodesWanted = n - l - 1
  const c = LIGHT_SPEED_AU
  const c2 = 2 * c * c
  const centrifugal = l * (l + 1) * 0.5
  const k9 = (9 * h) / 24
  const k1 = h / 24

  let eLo = Infinity
  for (let i = 0; i < size; i++) eLo = Math.min(eLo, v[i] + centrifugal / (r[i] * r[i]))
  // the Dirac levels lie slightly below the Schrödinger bound for the same potential, and every
  // bound level above the lower continuum, E > −mc² (e > −2c² without the rest energy): below it the
  // inward start has no decaying solution, and bisecting there lost the level for Z ≥ 113
  eLo = Math.max(eLo < 0 ? eLo * 1.5 - 1 : eLo - 1, -c2)
  let eHi = v[size - 1] + centrifugal / (r[size - 1] * r[size - 1])
  if (!(eLo < eHi)) return `no room for a bound ${n},κ=${kappa} state below the potential at the grid edge`
  const split = () => (eHi < 0 ? -Math.sqrt(eLo * eHi) : 0.5 * (eLo + eHi))
  let e = guess > eLo && guess < eHi ? guess : split()
  const inside = nucleusRadius > r[0]
  const gamma = Math.sqrt(Math.max(1e-6, kappa * kappa - (z / c) ** 2))

  for (let step = 0; step < MAX_STEPS; step++) {
    if (eHi - eLo <= 1e-13 * Math.max(1, Math.abs(eHi))) return `no bound ${n},κ=${kappa} state inside ${r[size - 1].toFixed(0)} bohr`
    let icl = -1
    for (let i = size - 1; i >= 0; i--) {
      if (v[i] + centrifugal / (r[i] * r[i]) < e) {
        icl = i
        break
      }
    }
    if (icl < 4) {
      eLo = e
      e = split()
      continue
    }
    if (icl >= size - 4) {
      eHi = e
      e = split()
      continue
    }

    // outward: series start on the first three points, then Adams–Moulton
    for (let i = 0; i < 3; i++) {
      const ri = r[i]
      if (inside) {
        const v0 = v[0]
        if (kappa < 0) {
          g[i] = Math.pow(ri, l + 1)
          f[i] = (-(e - v0) / (c * (2 * l + 3))) * ri * g[i]
        } else {
          g[i] = Math.pow(ri, l + 1)
          f[i] = ((2 * l + 1) * c) / (e - v0 + c2) / ri * g[i]
        }
      } else {
        g[i] = Math.pow(ri, gamma)
        f[i] = ((gamma + kappa) * c * g[i]) / z
      }
      const a = (ri * (e - v[i] + c2)) / c
      const b = (ri * (e - v[i])) / c
      dg[i] = -kappa * g[i] + a * f[i]
      df[i] = kappa * f[i] - b * g[i]
    }
    let nodes = 0
    for (let i = 2; i < icl; i++) {
      const j = i + 1
      const a = (r[j] * (e - v[j] + c2)) / c
      const b = (r[j] * (e - v[j])) / c
      const sg = g[i] + k1 * (19 * dg[i] - 5 * dg[i - 1] + dg[i - 2])
      const sf = f[i] + k1 * (19 * df[i] - 5 * df[i - 1] + df[i - 2])
      // (1 + k9κ)G − k9·a·F = sg ;  k9·b·G + (1 − k9κ)F = sf
      const m11 = 1 + k9 * kappa
      const m12 = -k9 * a
      const m21 = k9 * b
      const m22 = 1 - k9 * kappa
      const det = m11 * m22 - m12 * m21
      g[j] = (m22 * sg - m12 * sf) / det
      f[j] = (m11 * sf - m21 * sg) / det
      dg[j] = -kappa * g[j] + a * f[j]
      df[j] = kappa * f[j] - b * g[j]
      if (g[j] * g[i] < 0) nodes++
      if (Math.abs(g[j]) > 1e200) {
        for (let k = 0; k <= j; k++) {
          g[k] *= 1e-200
          f[k] *= 1e-200
          dg[k] *= 1e-200
          df[k] *= 1e-200
        }
      }
    }
    if (nodes !== nodesWanted) {
      if (nodes > nodesWanted) eHi = e
      else eLo = e
      e = split()
      continue
    }
    const gOut = g[icl]
    const fOut = f[icl]

    // inward: from where the WKB exponent has grown by WKB_DEPTH, with the asymptotic ratio F/G
    let imax = icl
    let depth = 0
    while (imax < size - 1 && depth < WKB_DEPTH) {
      imax++
      depth += Math.sqrt(Math.max(0, 2 * (v[imax] + centrifugal / (r[imax] * r[imax]) - e))) * r[imax] * h
    }
    for (let i = imax + 1; i < size; i++) {
      g[i] = 0
      f[i] = 0
    }
    for (let i = imax; i > imax - 3; i--) {
      const q = Math.max(1e-12, v[i] + centrifugal / (r[i] * r[i]) - e)
      const lambda = Math.sqrt(2 * q * (1 + (e - v[i]) / c2))
      g[i] = 1e-30 * Math.exp(-lambda * (r[i] - r[imax]))
      f[i] = (-c * lambda * g[i]) / (e - v[i] + c2)
      const a = (r[i] * (e - v[i] + c2)) / c
      const b = (r[i] * (e - v[i])) / c
      dg[i] = -kappa * g[i] + a * f[i]
      df[i] = kappa * f[i] - b * g[i]
    }
    for (let i = imax - 2; i > icl; i--) {
      const j = i - 1
      const a = (r[j] * (e - v[j] + c2)) / c
      const b = (r[j] * (e - v[j])) / c
      const sg = g[i] - k1 * (19 * dg[i] - 5 * dg[i + 1] + dg[i + 2])
      const sf = f[i] - k1 * (19 * df[i] - 5 * df[i + 1] + df[i + 2])
      // (1 − k9κ)G + k9·a·F = sg ;  −k9·b·G + (1 + k9κ)F = sf
      const m11 = 1 - k9 * kappa
      const m12 = k9 * a
      const m21 = -k9 * b
      const m22 = 1 + k9 * kappa
      const det = m11 * m22 - m12 * m21
      g[j] = (m22 * sg - m12 * sf) / det
      f[j] = (m11 * sf - m21 * sg) / det
      dg[j] = -kappa * g[j] + a * f[j]
      df[j] = kappa * f[j] - b * g[j]
    }
    const scale = gOut / g[icl]
    const fIn = f[icl] * scale
    for (let i = icl; i <= imax; i++) {
      g[i] *= scale
      f[i] *= scale
    }
    let norm = 0
    for (let i = 0; i <= imax; i++) norm += grid.dr[i] * (g[i] * g[i] + f[i] * f[i])
    // the outward F at the matching point was overwritten by the inward pass: use the saved one
    const dE = (c * gOut * (fOut - fIn)) / norm
    if (Math.abs(dE) < tolerance * Math.max(1, Math.abs(e))) {
      const s = 1 / Math.sqrt(norm)
      const gr = new Float64Array(size)
      const fr = new Float64Array(size)
      for (let i = 0; i <= imax; i++) {
        gr[i] = g[i] * s
        fr[i] = f[i] * s
      }
      fr[icl] = 0.5 * (fOut + fIn) * s
      return { energy: e, g: gr, f: fr }
    }
    if (dE > 0) eLo = e
    else eHi = e
    const next = e + dE
    e = next > eLo && next < eHi ? next : split()
  }
  return `the ${n},κ=${kappa} eigenvalue search did not settle in ${MAX_STEPS} steps`
}
