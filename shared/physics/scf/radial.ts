/**
 * Bound states of the radial Schrödinger equation in a central potential on the log grid.
 *
 * With r = e^x and P(r) = r·R(r) = e^{x/2}·y(x), the radial equation becomes
 *   y'' = g(x)·y,   g = (l + ½)² + 2r²·(V(r) − E)        (hartree units)
 * which has no first-derivative term, so B. Numerov's three-point scheme (Mon. Not. R. Astron. Soc.
 * 84, 592, 1924) applies with its h⁴ local error. The eigenvalue is found by shooting: integrate out
 * from the nucleus and in from the far side to the outermost classical turning point, count the nodes
 * of the outward solution to bracket the state, and correct E to first order from the jump in slope
 * at the matching point (δE = y·Δy' / (2∫r²y² dx), read off the Numerov residual there, the
 * corrector of J. W. Cooley, Math. Comp. 15, 363, 1961), bisecting whenever the correction would
 * leave the bracket: the shooting procedure of D. R. Hartree, "The Calculation of Atomic
 * Structures" (Wiley, 1957).
 */
import type { RadialGrid } from './grid'

export interface BoundState {
  energy: number
  /** P(r) = r·R(r) on the grid, normalised so that ∫P² dr = 1, zero beyond the inward start */
  p: Float64Array
}

/** Reusable scratch arrays for one grid, so an SCF run allocates them once. */
export interface RadialWorkspace {
  y: Float64Array
  f: Float64Array
}

/** Scratch space for solveBoundState on this grid. */
export function radialWorkspace(grid: RadialGrid): RadialWorkspace {
  return { y: new Float64Array(grid.size), f: new Float64Array(grid.size) }
}

/** Where the inward solution starts: e^{−WKB_DEPTH} below its value at the turning point. */
const WKB_DEPTH = 48
const MAX_STEPS = 300

/**
 * The bound state with n − l − 1 nodes in potential v (hartree, without the centrifugal term), or a
 * failure reason. guess is a starting energy; the result does not depend on it.
 */
export function solveBoundState(
  grid: RadialGrid,
  v: Float64Array,
  z: number,
  n: number,
  l: number,
  guess: number,
  ws: RadialWorkspace,
  tolerance = 1e-11,
): BoundState | string {
  const { size, h, r } = grid
  const { y, f } = ws
  const nodesWanted = n - l - 1
  const l2 = (l + 0.5) * (l + 0.5)
  const c = (h * h) / 12
  const centrifugal = l * (l + 1) * 0.5

  let eLo = Infinity
  for (let i = 0; i < size; i++) eLo = Math.min(eLo, v[i] + centrifugal / (r[i] * r[i]))
  let eHi = v[size - 1] + centrifugal / (r[size - 1] * r[size - 1])
  if (!(eLo < eHi)) return `no room for a bound ${n},${l} state below the potential at the grid edge`
  const split = () => (eHi < 0 ? -Math.sqrt(eLo * eHi) : 0.5 * (eLo + eHi))
  let e = guess > eLo && guess < eHi ? guess : split()

  for (let step = 0; step < MAX_STEPS; step++) {
    if (eHi - eLo <= 1e-13 * Math.max(1, Math.abs(eHi))) return `no bound ${n},${l} state inside ${r[size - 1].toFixed(0)} bohr`
    let icl = -1
    for (let i = 0; i < size; i++) {
      f[i] = 1 - c * (l2 + 2 * r[i] * r[i] * (v[i] - e))
      if (f[i] > 1) icl = i
    }
    if (icl < 3) {
      eLo = e
      e = split()
      continue
    }
    if (icl >= size - 3) {
      eHi = e
      e = split()
      continue
    }

    // Near the nucleus P ≈ r^{l+1}(1 − Z r/(l+1)), the first two terms of the series.
    const r0 = r[0]
    const r1 = r[1]
    y[0] = Math.pow(r0, l + 0.5) * (1 - (z * r0) / (l + 1))
    y[1] = Math.pow(r1, l + 0.5) * (1 - (z * r1) / (l + 1))
    let nodes = 0
    for (let i = 1; i < icl; i++) {
      y[i + 1] = ((12 - 10 * f[i]) * y[i] - f[i - 1] * y[i - 1]) / f[i + 1]
      if (y[i + 1] * y[i] < 0) nodes++
      if (Math.abs(y[i + 1]) > 1e200) {
        for (let k = 0; k <= i + 1; k++) y[k] *= 1e-200
      }
    }
    if (nodes !== nodesWanted) {
      if (nodes > nodesWanted) eHi = e
      else eLo = e
      e = split()
      continue
    }
    const yMatch = y[icl]

    let imax = icl
    let depth = 0
    while (imax < size - 1 && depth < WKB_DEPTH) {
      imax++
      depth += Math.sqrt(Math.max(0, (1 - f[imax]) / c)) * h
    }
    for (let i = imax + 1; i < size; i++) y[i] = 0
    y[imax] = 1e-30
    y[imax - 1] = ((12 - 10 * f[imax]) * y[imax]) / f[imax - 1]
    for (let i = imax - 1; i > icl; i--) y[i - 1] = ((12 - 10 * f[i]) * y[i] - f[i + 1] * y[i + 1]) / f[i - 1]
    const scale = yMatch / y[icl]
    for (let i = icl; i <= imax; i++) y[i] *= scale

    let norm = 0
    for (let i = 0; i <= imax; i++) norm += grid.dr[i] * r[i] * y[i] * y[i]
    const residual = f[icl + 1] * y[icl + 1] + f[icl - 1] * y[icl - 1] - (12 - 10 * f[icl]) * y[icl]
    const dE = (-yMatch * residual) / (2 * h * norm)

    if (Math.abs(dE) < tolerance * Math.max(1, Math.abs(e))) {
      const p = new Float64Array(size)
      const s = 1 / Math.sqrt(norm)
      for (let i = 0; i <= imax; i++) p[i] = Math.sqrt(r[i]) * y[i] * s
      return { energy: e, p }
    }
    if (dE > 0) eLo = e
    else eHi = e
    const next = e + dE
    e = next > eLo && next < eHi ? next : split()
  }
  return `the ${n},${l} eigenvalue search did not settle in ${MAX_STEPS} steps`
}
