/**
 * The nlj channels of the relativistic solver. Every nl subshell is split into its j = l ∓ ½
 * parts in proportion to their degeneracies 2j + 1 (the statistical split: it is what the
 * non-relativistic limit needs, where both parts share one radial function, and it is how a
 * configuration written in nl is read by other Dirac LDA atom programs); a closed subshell fills
 * both parts exactly.
 *
 * Spin: with the spin-polarised functionals every nl spin channel of channels.ts (Hund's rule) is
 * split the same way, and each nlj part sees the exchange–correlation potential of its spin. That is
 * the spin-diagonal approximation to relativistic spin-density theory: the exchange field is taken
 * along one axis and its coupling of the two spin projections inside a j orbital is left out
 * (A. H. MacDonald and S. H. Vosko, J. Phys. C 12, 2977, 1979 give the full theory; the diagonal
 * form for atoms is common practice, no source). We chose it over a spin-averaged Dirac solution plus
 * a non-relativistic spin-polarisation energy because it needs one solve per species instead of
 * three, keeps the self-interaction correction orbital by orbital, and reduces exactly to the
 * non-relativistic spin-polarised solver as c → ∞.
 */
import { buildChannels, type Channel, type SubshellOccupation } from './channels'
import { kappaOf } from './dirac-radial'
import type { ScfFunctional } from './options'

export interface DiracChannel extends Channel {
  kappa: number
  /** 2j */
  twoJ: number
}

const L_LETTERS = 'spdfghik'

/** The relativistic subshell label, e.g. "2p3/2". */
export function relativisticLabel(n: number, l: number, twoJ: number): string {
  return `${n}${L_LETTERS[l] ?? `[l=${l}]`}${twoJ}/2`
}

/**
 * How an open nl subshell's electrons are shared between j = l ∓ ½: 'statistical' by 2j + 1;
 * 'ordered' fills j = l − ½ first within each of Hund's spin channels (keeps the full spin moment,
 * right where exchange beats spin–orbit coupling); 'jj' fills j = l − ½ first with both spins and
 * then splits each j part by Hund's rule (jj coupling, right where spin–orbit coupling wins).
 */
export type JSplit = 'statistical' | 'ordered' | 'jj'

/**
 * The split used by default: jj coupling for heavy atoms and highly charged ions, where the
 * spin–orbit splitting of the open shell outgrows its exchange splitting, else 'ordered'. The
 * boundary (Z ≥ 50 or charge ≥ 10) was chosen on the accuracy bench (common practice to switch
 * from LS to jj along the periodic table, no source for the exact boundary).
 */
export function defaultJSplit(z: number, charge: number): JSplit {
  return z >= 50 || charge >= 10 ? 'jj' : 'ordered'
}

function jjChannels(subshells: SubshellOccupation[], functional: ScfFunctional): DiracChannel[] {
  const out: DiracChannel[] = []
  for (const s of subshells) {
    const parts = s.l === 0 ? [1] : [2 * s.l - 1, 2 * s.l + 1]
    let left = s.electrons
    for (const twoJ of parts) {
      const q = Math.min(left, twoJ + 1)
      left -= q
      if (q <= 1e-12) continue
      const kappa = kappaOf(s.l, twoJ)
      const half = (twoJ + 1) / 2
      const up = functional === 'lda' ? q / 2 : Math.min(q, half)
      const down = q - up
      if (functional === 'lda' || up === down) {
        out.push({ n: s.n, l: s.l, spin: 'pair', occupation: q, perSpin: q / 2, spins: 2, kappa, twoJ })
        continue
      }
      out.push({ n: s.n, l: s.l, spin: 'up', occupation: up, perSpin: up, spins: 1, kappa, twoJ })
      if (down > 1e-12) out.push({ n: s.n, l: s.l, spin: 'down', occupation: down, perSpin: down, spins: 1, kappa, twoJ })
    }
  }
  return out
}

/** The nlj channels of a configuration under the functional. */
export function buildDiracChannels(subshells: SubshellOccupation[], functional: ScfFunctional, split: JSplit = 'statistical'): DiracChannel[] {
  if (split === 'jj') return jjChannels(subshells, functional)
  const out: DiracChannel[] = []
  for (const ch of buildChannels(subshells, functional)) {
    const parts = ch.l === 0 ? [1] : [2 * ch.l - 1, 2 * ch.l + 1]
    let left = ch.occupation
    for (const twoJ of parts) {
      const room = ((twoJ + 1) / (2 * (2 * ch.l + 1))) * (ch.spins === 2 ? 2 * (2 * ch.l + 1) : 2 * ch.l + 1)
      const occupation = split === 'statistical' ? ch.occupation * ((twoJ + 1) / (2 * (2 * ch.l + 1))) : Math.min(left, room)
      left -= occupation
      if (occupation <= 1e-12) continue
      out.push({
        ...ch,
        occupation,
        perSpin: occupation / ch.spins,
        kappa: kappaOf(ch.l, twoJ),
        twoJ,
      })
    }
  }
  return out
}
