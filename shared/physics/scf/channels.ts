/**
 * From subshell occupations to the radial "channels" the solver iterates: one radial function per
 * subshell and spin (or per subshell when the atom is not spin-polarised).
 */
import type { ScfFunctional } from './options'

export interface SubshellOccupation {
  n: number
  l: number
  electrons: number
}

export type Spin = 'up' | 'down' | 'pair'

export interface Channel {
  n: number
  l: number
  spin: Spin
  /** electrons carried by this channel (both spins for 'pair') */
  occupation: number
  /** electrons per spin that share this radial function */
  perSpin: number
  /** spin directions the channel stands for: 2 for 'pair', else 1 */
  spins: number
}

const L_LETTERS = 'spdfghik'

/** The subshell label used in outputs, e.g. "3d". */
export function subshellLabel(n: number, l: number): string {
  return `${n}${L_LETTERS[l] ?? `[l=${l}]`}`
}

/** Throws a RangeError naming the first impossible subshell; returns the ones with electrons. */
export function checkSubshells(z: number, subshells: SubshellOccupation[]): SubshellOccupation[] {
  if (!Number.isInteger(z) || z < 1) throw new RangeError('the nuclear charge must be a positive integer')
  const seen = new Set<string>()
  const kept: SubshellOccupation[] = []
  for (const s of subshells) {
    const label = `n=${s.n}, l=${s.l}`
    if (!Number.isInteger(s.n) || !Number.isInteger(s.l) || s.n < 1 || s.l < 0 || s.l >= s.n)
      throw new RangeError(`no such subshell: ${label}`)
    if (!Number.isFinite(s.electrons) || s.electrons < 0 || s.electrons > 2 * (2 * s.l + 1))
      throw new RangeError(`subshell ${label} cannot hold ${s.electrons} electrons`)
    if (seen.has(label)) throw new RangeError(`subshell ${label} is listed twice`)
    seen.add(label)
    if (s.electrons > 0) kept.push(s)
  }
  return kept
}

/**
 * Hund's-rule spin split of a subshell: as many electrons as possible with spin up, the rest down
 * (common practice for the spherical spin-polarised atom, no source).
 */
export function hundSplit(l: number, electrons: number): { up: number; down: number } {
  const up = Math.min(electrons, 2 * l + 1)
  return { up, down: electrons - up }
}

/** The channels for a configuration under the given functional. */
export function buildChannels(subshells: SubshellOccupation[], functional: ScfFunctional): Channel[] {
  const polarised =
    functional !== 'lda' && subshells.some((s) => {
      const { up, down } = hundSplit(s.l, s.electrons)
      return up !== down
    })
  const channels: Channel[] = []
  for (const s of subshells) {
    if (!polarised) {
      channels.push({ n: s.n, l: s.l, spin: 'pair', occupation: s.electrons, perSpin: s.electrons / 2, spins: 2 })
      continue
    }
    const { up, down } = hundSplit(s.l, s.electrons)
    if (up > 0) channels.push({ n: s.n, l: s.l, spin: 'up', occupation: up, perSpin: up, spins: 1 })
    if (down > 0) channels.push({ n: s.n, l: s.l, spin: 'down', occupation: down, perSpin: down, spins: 1 })
  }
  return channels
}

/**
 * The orbitals sharing one channel's radial function, as occupations per orbital: full ones and at
 * most one fractional one. Self-interaction is removed orbital by orbital, so a lone electron in a
 * p shell loses all of its self-repulsion, not a third of it.
 */
export function orbitalPieces(perSpin: number): Array<{ fraction: number; count: number }> {
  const full = Math.floor(perSpin + 1e-12)
  const rest = perSpin - full
  const pieces: Array<{ fraction: number; count: number }> = []
  if (full > 0) pieces.push({ fraction: 1, count: full })
  if (rest > 1e-12) pieces.push({ fraction: rest, count: 1 })
  return pieces
}
