/**
 * All LS (Russell–Saunders) terms of a configuration, by counting microstates.
 *
 * Each open subshell's microstates are tallied by (M_L, M_S) — choosing k of its 2(2l + 1)
 * spin-orbitals — and the tallies of several subshells are convolved, which is the same as
 * listing every microstate of the whole configuration but far cheaper (4f7 5d 6s has 68,640). A
 * term (S, L) owns one microstate in each cell |M_L| ≤ L, |M_S| ≤ S, so the number of terms with
 * exactly S, L is N(L, S) − N(L+1, S) − N(L, S+1) + N(L+1, S+1), N being the tally at M_L = L,
 * M_S = S. Closed subshells add only ¹S and are skipped.
 */
import { capacity, subshellLetter } from './subshells'

export interface LsTerm {
  /** '3P', '2D°' */
  label: string
  /** 2S + 1 */
  multiplicity: number
  S: number
  L: number
  /** true for odd parity (°) */
  odd: boolean
  /** how many times the term occurs (d3 has two ²D) */
  count: number
  /** possible J, as text: '1/2', '2' */
  J: string[]
}

/** Open-subshell description: l and the number of electrons (n does not change the terms). */
export interface OpenSubshell {
  l: number
  electrons: number
}

// L letters skip J and do not repeat S and P (common practice, no source).
const L_LETTERS = 'SPDFGHIKLMNOQRTUVWXYZ'

/** The term letter for total orbital angular momentum L. */
export function lLetter(L: number): string {
  return L_LETTERS[L] ?? `[L=${L}]`
}

/** A half-integer written as the trade writes it: 1.5 → '3/2', 2 → '2'. */
export function halfInteger(x: number): string {
  const twice = Math.round(2 * x)
  return twice % 2 === 0 ? String(twice / 2) : `${twice}/2`
}

/** Tally of microstates indexed [ML + maxL][2MS + maxS2], with their offsets. */
interface Tally {
  maxL: number
  maxS2: number
  cells: number[][]
}

const tallies = new Map<string, Tally>()

function subshellTally(l: number, k: number): Tally {
  // A subshell with k electrons has the terms of one with k holes (common practice, no source).
  if (2 * k > capacity(l)) return subshellTally(l, capacity(l) - k)
  const key = `${l}.${k}`
  const hit = tallies.get(key)
  if (hit) return hit
  const maxL = k * l
  const maxS2 = k
  const width = 2 * maxS2 + 1
  const size = (2 * maxL + 1) * width
  // layers[j] tallies the ways to pick j spin-orbitals so far, by (ML, 2MS) in one flat array;
  // going through j downwards lets each spin-orbital be added in place, at most once.
  const layers = Array.from({ length: k + 1 }, () => new Float64Array(size))
  layers[0][maxL * width + maxS2] = 1
  for (let ml = -l; ml <= l; ml++) {
    for (const s2 of [1, -1]) {
      const shift = ml * width + s2
      for (let j = k - 1; j >= 0; j--) {
        const from = layers[j]
        const to = layers[j + 1]
        const lo = Math.max(0, -shift)
        const hi = Math.min(size, size - shift)
        for (let c = lo; c < hi; c++) if (from[c] !== 0) to[c + shift] += from[c]
      }
    }
  }
  const cells: number[][] = []
  for (let i = 0; i <= 2 * maxL; i++) cells.push(Array.from(layers[k].subarray(i * width, (i + 1) * width)))
  const tally = { maxL, maxS2, cells }
  tallies.set(key, tally)
  return tally
}

function convolve(a: Tally, b: Tally): Tally {
  const maxL = a.maxL + b.maxL
  const maxS2 = a.maxS2 + b.maxS2
  const cells = Array.from({ length: 2 * maxL + 1 }, () => new Array<number>(2 * maxS2 + 1).fill(0))
  for (let i = 0; i < a.cells.length; i++) {
    const row = a.cells[i]
    for (let j = 0; j < row.length; j++) {
      const x = row[j]
      if (x === 0) continue
      for (let i2 = 0; i2 < b.cells.length; i2++) {
        const row2 = b.cells[i2]
        const out = cells[i + i2]
        for (let j2 = 0; j2 < row2.length; j2++) if (row2[j2] !== 0) out[j + j2] += x * row2[j2]
      }
    }
  }
  return { maxL, maxS2, cells }
}

const cache = new Map<string, LsTerm[]>()

/**
 * All LS terms of a configuration: '3d2', 'p3', '4f7 5d1 6s1' or a list of {l, electrons}.
 * Sorted by S then L, each with its count and J values.
 */
export function lsTerms(configuration: string | readonly OpenSubshell[]): LsTerm[] {
  const shells = typeof configuration === 'string' ? parseShells(configuration) : [...configuration]
  const open = shells.filter((s) => s.electrons > 0 && s.electrons < capacity(s.l))
  const odd = shells.reduce((sum, s) => sum + s.l * s.electrons, 0) % 2 === 1
  const key = `${open.map((s) => `${s.l}.${s.electrons}`).join(' ')}|${odd}`
  const hit = cache.get(key)
  if (hit) return hit.map((t) => ({ ...t, J: [...t.J] }))
  let tally: Tally = { maxL: 0, maxS2: 0, cells: [[1]] }
  for (const s of open) tally = convolve(tally, subshellTally(s.l, s.electrons))
  const at = (L: number, s2: number) =>
    L > tally.maxL || s2 > tally.maxS2 ? 0 : tally.cells[L + tally.maxL][s2 + tally.maxS2]
  const terms: LsTerm[] = []
  for (let s2 = tally.maxS2 % 2; s2 <= tally.maxS2; s2 += 2) {
    for (let L = 0; L <= tally.maxL; L++) {
      const count = at(L, s2) - at(L + 1, s2) - at(L, s2 + 2) + at(L + 1, s2 + 2)
      if (count > 0) terms.push(makeTerm(s2 / 2, L, odd, count))
    }
  }
  cache.set(key, terms)
  return terms.map((t) => ({ ...t, J: [...t.J] }))
}

/** One term with its label and J values |L − S| … L + S. */
export function makeTerm(S: number, L: number, odd: boolean, count = 1): LsTerm {
  const J: string[] = []
  for (let j = Math.abs(L - S); j <= L + S + 1e-9; j += 1) J.push(halfInteger(j))
  return { label: `${2 * S + 1}${lLetter(L)}${odd ? '°' : ''}`, multiplicity: 2 * S + 1, S, L, odd, count, J }
}

function parseShells(text: string): OpenSubshell[] {
  return text
    .trim()
    .split(/\s+/)
    .filter(Boolean)
    .map((token) => {
      const m = /^(\d*)([spdfghik])(\d*)$/.exec(token)
      if (!m) throw new SyntaxError(`not a subshell: ${token.slice(0, 12)}`)
      const l = 'spdfghik'.indexOf(m[2])
      const electrons = m[3] === '' ? 1 : Number(m[3])
      if (electrons > capacity(l) || subshellLetter(l) !== m[2]) throw new SyntaxError(`impossible subshell: ${token.slice(0, 12)}`)
      return { l, electrons }
    })
}
