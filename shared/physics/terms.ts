/**
 * The ground term by Hund's rules, and the orbital boxes a diagram of it needs.
 *
 * One open subshell: maximum S, then maximum L for that S, then J = |L − S| below half filling,
 * J = L + S above it, and L = 0, J = S when exactly half filled (F. Hund, 1925; common practice).
 * Several open subshells: the maximum-S, maximum-L term of the whole configuration couples the
 * Hund terms of each subshell with S = ΣS_i and L = ΣL_i (for electrons in different subshells
 * every combination is allowed, so the maxima add; lsTerms confirms it by counting microstates).
 * The third rule then has no single filling fraction to go by; we let the open subshell of
 * largest l that is not exactly half filled decide (its spin–orbit coupling is the strongest in
 * the atom — 5f/4f over 6d/5d, d over s), and take J = S when every open subshell is half filled.
 * That reproduces every neutral ground level in NIST ASD with more than one open subshell except
 * Ce (see data/irregular.ts), e.g. Gd 9D°2, U 5L°6, Pa 4K11/2, Pt 3D3, Nb 6D1/2.
 */
import { NON_HUND_TERMS } from './data/irregular'
import { halfInteger, lLetter } from './ls-terms'
import { type Subshell, capacity, subshellLabel } from './subshells'

export interface GroundTerm {
  /** '2P°1/2' */
  level: string
  /** '2P°' */
  term: string
  S: number
  L: number
  J: number
  odd: boolean
  /** 'hund' when computed, 'table' when taken from the cited exceptions */
  rule: 'hund' | 'table'
  source: string | null
}

export interface OrbitalBox {
  readonly ml: number
  /** electrons in the box: [] empty, ['up'] single, ['up', 'down'] paired */
  readonly spins: readonly ('up' | 'down')[]
}

export interface SubshellBoxes {
  readonly subshell: string
  readonly electrons: number
  readonly boxes: readonly OrbitalBox[]
}

interface ShellSpin {
  l: number
  electrons: number
  S: number
  L: number
}

// Boxes fill from m_l = +l downwards, so `count` electrons of one spin sum to this M_L.
function mlSum(l: number, count: number): number {
  return count * l - (count * (count - 1)) / 2
}

/** Hund's S and L of one subshell: unpaired spins, and the M_L sum of the filled boxes. */
function hundShell(l: number, k: number): ShellSpin {
  const orbitals = 2 * l + 1
  const up = Math.min(k, orbitals)
  const down = k - up
  return { l, electrons: k, S: (up - down) / 2, L: mlSum(l, up) + mlSum(l, down) }
}

const tableTerms = new Map(NON_HUND_TERMS.map((e) => [`${e.z}:${e.charge}`, e]))

/** Hund's-rules ground term of a configuration (null for a bare nucleus), or the tabulated one. */
export function groundTerm(subshells: readonly Subshell[], z?: number, charge?: number): GroundTerm | null {
  if (subshells.length === 0) return null
  const odd = subshells.reduce((sum, s) => sum + s.l * s.electrons, 0) % 2 === 1
  const entry = z === undefined ? undefined : tableTerms.get(`${z}:${charge}`)
  if (entry) return parseLevel(entry.term, 'table', entry.source)
  const open = subshells.filter((s) => s.electrons < capacity(s.l)).map((s) => hundShell(s.l, s.electrons))
  const S = open.reduce((sum, s) => sum + s.S, 0)
  const L = open.reduce((sum, s) => sum + s.L, 0)
  const deciding = open
    .filter((s) => 2 * s.electrons !== capacity(s.l))
    .sort((a, b) => b.l - a.l)[0]
  const J = !deciding ? S : 2 * deciding.electrons < capacity(deciding.l) ? Math.abs(L - S) : L + S
  const term = `${2 * S + 1}${lLetter(L)}${odd ? '°' : ''}`
  return { level: `${term}${halfInteger(J)}`, term, S, L, J, odd, rule: 'hund', source: null }
}

/** Parses '2P°1/2' into its parts (throws on anything else). */
export function parseLevel(level: string, rule: 'hund' | 'table' = 'table', source: string | null = null): GroundTerm {
  const m = /^(\d+)([A-Z])(°?)(\d+)(?:\/(2))?$/.exec(level)
  if (!m) throw new SyntaxError(`not an LS level: ${level.slice(0, 16)}`)
  const multiplicity = Number(m[1])
  const L = 'SPDFGHIKLMNOQRTUVWXYZ'.indexOf(m[2])
  const J = m[5] ? Number(m[4]) / 2 : Number(m[4])
  const odd = m[3] === '°'
  return { level, term: `${m[1]}${m[2]}${m[3]}`, S: (multiplicity - 1) / 2, L, J, odd, rule, source }
}

// Shared, frozen diagrams per (n, l, occupancy): a full record of every species repeats them often.
const boxCache = new Map<number, SubshellBoxes>()

function subshellBoxes(s: Subshell): SubshellBoxes {
  const key = (s.n * 8 + s.l) * 32 + s.electrons
  let hit = boxCache.get(key)
  if (!hit) {
    const orbitals = 2 * s.l + 1
    const up = Math.min(s.electrons, orbitals)
    const down = s.electrons - up
    const boxes: OrbitalBox[] = []
    for (let i = 0; i < orbitals; i++) {
      const spins: ('up' | 'down')[] = []
      if (i < up) spins.push('up')
      if (i < down) spins.push('down')
      boxes.push(Object.freeze({ ml: s.l - i, spins: Object.freeze(spins) }))
    }
    hit = Object.freeze({ subshell: subshellLabel(s.n, s.l), electrons: s.electrons, boxes: Object.freeze(boxes) })
    boxCache.set(key, hit)
  }
  return hit
}

/** Box diagram: m_l from +l to −l, spin-up electrons first in every box, then spin-down (frozen). */
export function orbitalBoxes(subshells: readonly Subshell[]): SubshellBoxes[] {
  return subshells.map(subshellBoxes)
}

/** Unpaired electrons in the Hund's-rule filling: one per singly occupied box. */
export function unpairedElectrons(subshells: readonly Subshell[]): number {
  return subshells.reduce((sum, s) => {
    const orbitals = 2 * s.l + 1
    return sum + (s.electrons <= orbitals ? s.electrons : 2 * orbitals - s.electrons)
  }, 0)
}
