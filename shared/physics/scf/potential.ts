/**
 * Electrostatics of spherical charge on the log grid, and the starting potential.
 */
import { cumulativeX, type RadialGrid } from './grid'

/** Scratch arrays for hartree() on one grid. */
export interface HartreeWorkspace {
  inner: Float64Array
  outer: Float64Array
  g: Float64Array
}

/** Scratch space for hartree() on this grid. */
export function hartreeWorkspace(grid: RadialGrid): HartreeWorkspace {
  const n = grid.size
  return { inner: new Float64Array(n), outer: new Float64Array(n), g: new Float64Array(n) }
}

/**
 * Hartree potential V_H(r) = Q(r)/r + ∫_r^∞ p(r')/r' dr' of the radial charge p = 4πr²ρ, written into
 * out; returns the Hartree energy ½∫p·V_H dr. Only [0, end) of p is read (p is zero beyond); out is
 * filled on the whole grid, as Q/r outside.
 */
export function hartree(grid: RadialGrid, p: Float64Array, out: Float64Array, ws: HartreeWorkspace, end = grid.size): number {
  const { r, h, dr } = grid
  const { inner, outer, g } = ws
  const m = Math.max(3, Math.min(end, grid.size))
  for (let i = 0; i < m; i++) g[i] = p[i] * r[i]
  cumulativeX(g, h, m, inner)
  cumulativeX(p, h, m, outer)
  // below the first point p grows like r², so ∫_0^{r0} p dr = p0·r0/3
  const q0 = (p[0] * r[0]) / 3
  const total = outer[m - 1]
  let energy = 0
  for (let i = 0; i < m; i++) {
    out[i] = (q0 + inner[i]) / r[i] + (total - outer[i])
    energy += dr[i] * p[i] * out[i]
  }
  const q = q0 + inner[m - 1]
  for (let i = m; i < grid.size; i++) out[i] = q / r[i]
  return 0.5 * energy
}

/**
 * The Thomas–Fermi screening function φ(x) by the rational fit of R. Latter, Phys. Rev. 99, 510
 * (1955) (coefficients from memory; it only seeds the first iteration, so its exactness does not
 * reach the result).
 */
function thomasFermi(x: number): number {
  const s = Math.sqrt(x)
  return 1 / (1 + s * (0.02747 + s * (1.243 + s * (-0.1486 + s * (0.2302 + s * (0.007298 + s * 0.006944))))))
}

/**
 * Starting potential for Z protons and N electrons: the Thomas–Fermi screening of N electrons
 * spread like the neutral atom's (length 0.8853·Z^{−1/3} bohr), but never shallower than the
 * −(Z − N + 1)/r an outer electron must see (the tail argument of Latter 1955), nor than −1/r, so
 * that an anion's extra electron starts bound too.
 */
export function startingPotential(grid: RadialGrid, z: number, electrons: number): Float64Array {
  const b = 0.8853 / Math.cbrt(z)
  const v = new Float64Array(grid.size)
  const tail = Math.max(1, z - electrons + 1)
  for (let i = 0; i < grid.size; i++) {
    const r = grid.r[i]
    const zr = z - electrons + electrons * thomasFermi(r / b)
    v[i] = -Math.max(zr, tail) / r
  }
  return v
}
