/**
 * The Hartree–Fock energy of a single Slater determinant built from central-field radial orbitals:
 * the one-electron energies plus the Coulomb and exchange Slater integrals F^k and G^k with the
 * angular factors of E. U. Condon and G. H. Shortley, "The Theory of Atomic Spectra" (Cambridge,
 * 1935), ch. 6 (Slater–Condon rules for a determinant), and of J. C. Slater, Phys. Rev. 34, 1293
 * (1929) for the average of a configuration. The 3j symbols are Racah's closed form,
 * G. Racah, Phys. Rev. 62, 438 (1942).
 *
 * Evaluated with the orbitals of a local-density solution it is the Hartree–Fock energy functional
 * taken at a point near its minimum (the energy is stationary there, so the error is second order
 * in the orbital difference; common practice, no source).
 */
import { cumulativeX, type RadialGrid } from './grid'

const FACTORIAL: number[] = [1]
for (let i = 1; i <= 40; i++) FACTORIAL.push(FACTORIAL[i - 1] * i)
const fact = (n: number): number => {
  if (n < 0 || !Number.isInteger(n) || n >= FACTORIAL.length) throw new RangeError(`factorial of ${n}`)
  return FACTORIAL[n]
}

/** Wigner 3j symbol (j1 j2 j3; m1 m2 m3) for integer arguments, by Racah's formula. */
export function threeJ(j1: number, j2: number, j3: number, m1: number, m2: number, m3: number): number {
  if (m1 + m2 + m3 !== 0) return 0
  if (j3 < Math.abs(j1 - j2) || j3 > j1 + j2) return 0
  if (Math.abs(m1) > j1 || Math.abs(m2) > j2 || Math.abs(m3) > j3) return 0
  const triangle = (fact(j1 + j2 - j3) * fact(j1 - j2 + j3) * fact(-j1 + j2 + j3)) / fact(j1 + j2 + j3 + 1)
  const norm = Math.sqrt(
    triangle * fact(j1 + m1) * fact(j1 - m1) * fact(j2 + m2) * fact(j2 - m2) * fact(j3 + m3) * fact(j3 - m3),
  )
  const tMin = Math.max(0, j2 - j3 - m1, j1 - j3 + m2)
  const tMax = Math.min(j1 + j2 - j3, j1 - m1, j2 + m2)
  let sum = 0
  for (let t = tMin; t <= tMax; t++) {
    const d = fact(t) * fact(j3 - j2 + t + m1) * fact(j3 - j1 + t - m2) * fact(j1 + j2 - j3 - t) * fact(j1 - t - m1) * fact(j2 - t + m2)
    sum += (t % 2 === 0 ? 1 : -1) / d
  }
  const phase = (j1 - j2 - m3) % 2 === 0 ? 1 : -1
  return phase * norm * sum
}

/** Condon–Shortley c^k(l m, l' m') = (−1)^m √((2l+1)(2l'+1)) (l k l'; 0 0 0)(l k l'; −m m−m' m'). */
export function gauntC(k: number, l1: number, m1: number, l2: number, m2: number): number {
  const phase = m1 % 2 === 0 ? 1 : -1
  return phase * Math.sqrt((2 * l1 + 1) * (2 * l2 + 1)) * threeJ(l1, k, l2, 0, 0, 0) * threeJ(l1, k, l2, -m1, m1 - m2, m2)
}

/** Scratch arrays for slaterIntegral on one grid. */
export interface SlaterWorkspace {
  g: Float64Array
  inner: Float64Array
  outer: Float64Array
  rho: Float64Array
}

export function slaterWorkspace(grid: RadialGrid): SlaterWorkspace {
  const n = grid.size
  return { g: new Float64Array(n), inner: new Float64Array(n), outer: new Float64Array(n), rho: new Float64Array(n) }
}

/**
 * R^k(ab; cd) = ∫∫ P_a(1)P_b(1) r<^k / r>^(k+1) P_c(2)P_d(2) dr1 dr2, hartree, through the screening
 * function Y^k of P_aP_b (running integrals in x = ln r, as hartree() does for k = 0).
 */
export function slaterIntegral(
  grid: RadialGrid,
  k: number,
  a: Float64Array,
  b: Float64Array,
  c: Float64Array,
  d: Float64Array,
  ws: SlaterWorkspace,
): number {
  const { r, h, dr, size } = grid
  const { g, inner, outer, rho } = ws
  for (let i = 0; i < size; i++) {
    rho[i] = a[i] * b[i]
    g[i] = rho[i] * Math.pow(r[i], k + 1)
  }
  cumulativeX(g, h, size, inner)
  for (let i = 0; i < size; i++) g[i] = rho[i] * Math.pow(r[i], -k)
  cumulativeX(g, h, size, outer)
  const total = outer[size - 1]
  let sum = 0
  for (let i = 0; i < size; i++) {
    const y = inner[i] / Math.pow(r[i], k + 1) + Math.pow(r[i], k) * (total - outer[i])
    sum += dr[i] * c[i] * d[i] * y
  }
  return sum
}

/** One radial orbital of a configuration: its subshell, occupation, P(r) and one-electron energy ⟨T + V_nuc⟩. */
export interface RadialOrbital {
  n: number
  l: number
  occupation: number
  p: Float64Array
  /** ⟨P| −½d²/dr² + l(l+1)/2r² − Z/r |P⟩ (or with the finite nucleus), hartree */
  oneElectron: number
}

interface SpinOrbital {
  orbital: number
  m: number
  up: boolean
}

/**
 * The spin orbitals of the Hund's-rule determinant of each subshell: spin up first, m from +l down,
 * then spin down from +l down. For a single open subshell this determinant is the M_L = L, M_S = S
 * component of the ground (Hund) term and its energy is that term's; with several open subshells it
 * is the highest-spin determinant (common practice, no source).
 */
function hundDeterminant(orbitals: readonly RadialOrbital[]): SpinOrbital[] {
  const out: SpinOrbital[] = []
  orbitals.forEach((o, index) => {
    const q = Math.round(o.occupation)
    if (Math.abs(q - o.occupation) > 1e-9) throw new RangeError('a determinant needs whole occupations')
    const up = Math.min(q, 2 * o.l + 1)
    for (let i = 0; i < up; i++) out.push({ orbital: index, m: o.l - i, up: true })
    for (let i = 0; i < q - up; i++) out.push({ orbital: index, m: o.l - i, up: false })
  })
  return out
}

/** F^k and G^k of every pair of orbitals, memoised. */
function integrals(grid: RadialGrid, orbitals: readonly RadialOrbital[]) {
  const ws = slaterWorkspace(grid)
  const cache = new Map<string, number>()
  const get = (kind: 'F' | 'G', k: number, i: number, j: number): number => {
    const [x, y] = i <= j ? [i, j] : [j, i]
    const key = `${kind}${k}:${x}:${y}`
    let v = cache.get(key)
    if (v === undefined) {
      const a = orbitals[x].p
      const b = orbitals[y].p
      v = kind === 'F' || x === y ? slaterIntegral(grid, k, a, a, b, b, ws) : slaterIntegral(grid, k, a, b, a, b, ws)
      cache.set(key, v)
    }
    return v
  }
  return get
}

/** Hartree–Fock energy of the Hund's-rule determinant of these orbitals, hartree. */
export function determinantEnergy(grid: RadialGrid, orbitals: readonly RadialOrbital[]): number {
  const spin = hundDeterminant(orbitals)
  const get = integrals(grid, orbitals)
  let energy = 0
  for (const s of spin) energy += orbitals[s.orbital].oneElectron
  for (let i = 0; i < spin.length; i++) {
    const si = spin[i]
    const li = orbitals[si.orbital].l
    for (let j = i + 1; j < spin.length; j++) {
      const sj = spin[j]
      const lj = orbitals[sj.orbital].l
      for (let k = 0; k <= 2 * Math.min(li, lj); k += 2) {
        const a = gauntC(k, li, si.m, li, si.m) * gauntC(k, lj, sj.m, lj, sj.m)
        if (a !== 0) energy += a * get('F', k, si.orbital, sj.orbital)
      }
      if (si.up !== sj.up) continue
      for (let k = Math.abs(li - lj); k <= li + lj; k += 2) {
        const c = gauntC(k, li, si.m, lj, sj.m)
        if (c !== 0) energy -= c * c * get('G', k, si.orbital, sj.orbital)
      }
    }
  }
  return energy
}

/** Hartree–Fock average energy of the configuration (Slater 1929), hartree; fractional occupations allowed. */
export function averageEnergy(grid: RadialGrid, orbitals: readonly RadialOrbital[]): number {
  const get = integrals(grid, orbitals)
  let energy = 0
  orbitals.forEach((a, i) => {
    const q = a.occupation
    energy += q * a.oneElectron
    let self = get('F', 0, i, i)
    for (let k = 2; k <= 2 * a.l; k += 2) self -= ((2 * a.l + 1) / (4 * a.l + 1)) * threeJ(a.l, k, a.l, 0, 0, 0) ** 2 * get('F', k, i, i)
    energy += ((q * (q - 1)) / 2) * self
    for (let j = i + 1; j < orbitals.length; j++) {
      const b = orbitals[j]
      let pair = get('F', 0, i, j)
      for (let k = Math.abs(a.l - b.l); k <= a.l + b.l; k += 2) pair -= 0.5 * threeJ(a.l, k, b.l, 0, 0, 0) ** 2 * get('G', k, i, j)
      energy += q * b.occupation * pair
    }
  })
  return energy
}
