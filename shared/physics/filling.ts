/**
 * The filling rules behind configuration.ts: Madelung and the irregular neutrals, the removal
 * rule for positive ions, the extra Madelung electron of an anion, and the hydrogenic order of
 * highly charged ions (configuration.ts's header says why each is as it is).
 */
import { IRREGULAR_NEUTRALS } from './data/irregular'
import { MADELUNG_ORDER, type Subshell, canonical, capacity, fillInOrder, largestCore, parseConfiguration } from './subshells'

const HYDROGENIC_ORDER: readonly (readonly [number, number])[] = [1, 2, 3, 4, 5, 6, 7, 8].flatMap((n) =>
  Array.from({ length: Math.min(n, 4) }, (_, l) => [n, l] as const),
)

const NEUTRALS = new Map(IRREGULAR_NEUTRALS.map((e) => [e.z, e]))

// From tungsten on, the closed 4f shell lies below 5s and 5p in the ions, so it joins the core:
// otherwise Ag-like W²⁷⁺ would come out 4d10 5s instead of its 4d10 4f (2F°5/2 in NIST ASD 5.12's
// ground states, data/nist-asd-detail.ts). Before tungsten the closed 4f still gives up electrons
// first (Yb³⁺ is 4f13, 2F°7/2 there). 5f joins the core from Z = 106 on
// by analogy, with no data to check it against.
function neutralCore(z: number, neutral: readonly Subshell[]): Subshell[] {
  const core = [...(largestCore(neutral)?.subshells ?? [])]
  if (z >= 74) core.push({ n: 4, l: 3, electrons: 14 })
  if (z >= 106) core.push({ n: 5, l: 3, electrons: 14 })
  return core
}

/**
 * The ions whose ground configuration is chosen by the lowest Dirac–Kohn–Sham total energy
 * (scf/configuration-search.ts, tabulated in data/dks-configurations.ts): Z ≥ 57, charge 5 and up,
 * and fewer charges than electrons (from there on the hydrogenic order holds).
 */
export function energySearchDomain(z: number, charge: number): boolean {
  return z >= 57 && charge >= 5 && charge < z - charge
}

/** Sort order of the removal rule: highest n first, then highest l. */
export function highestFirst(a: Subshell, b: Subshell): number {
  return b.n - a.n || b.l - a.l
}

// The order the removal rule empties the neutral's subshells in, as indices into them; one
// list per element, so each ion only has to count electrons off it.
const removalOrders = new Map<number, number[]>()

function removalOrder(z: number, neutral: readonly Subshell[]): number[] {
  let order = removalOrders.get(z)
  if (!order) {
    const core = neutralCore(z, neutral)
    const inCore = (s: Subshell) => core.some((c) => c.n === s.n && c.l === s.l)
    const indexed = neutral.map((s, i) => ({ s, i }))
    const byRule = (a: { s: Subshell }, b: { s: Subshell }) => highestFirst(a.s, b.s)
    // Valence electrons (outside the neutral's core) first, then the core, each highest n then l.
    order = [...indexed.filter((x) => !inCore(x.s)).sort(byRule), ...indexed.filter((x) => inCore(x.s)).sort(byRule)].map(
      (x) => x.i,
    )
    removalOrders.set(z, order)
  }
  return order
}

/** The neutral with `count` electrons taken off by the removal rule. */
export function removeElectrons(z: number, neutral: readonly Subshell[], count: number): Subshell[] {
  const work = neutral.map((s) => ({ ...s }))
  let left = count
  for (const i of removalOrder(z, neutral)) {
    const k = Math.min(left, work[i].electrons)
    work[i].electrons -= k
    left -= k
    if (left === 0) break
  }
  if (left > 0) throw new RangeError('no electron left to remove')
  // The neutral is in canonical order and taking electrons away keeps it so.
  return work.filter((s) => s.electrons > 0)
}

/** The neutral plus one electron in the first Madelung subshell with room. */
export function addMadelungElectron(start: readonly Subshell[]): Subshell[] {
  const work = start.map((s) => ({ ...s }))
  for (const [n, l] of MADELUNG_ORDER) {
    const s = work.find((x) => x.n === n && x.l === l)
    if (!s) {
      work.push({ n, l, electrons: 1 })
      return canonical(work)
    }
    if (s.electrons < capacity(l)) {
      s.electrons += 1
      return canonical(work)
    }
  }
  throw new RangeError('no room for another electron')
}

/** The removal rule alone, from the neutral configuration (tables and the high-charge guard aside). */
export function removalRuleConfiguration(z: number, charge: number): Subshell[] {
  return removeElectrons(z, neutralSubshells(z).subshells, charge)
}

interface Neutral {
  subshells: Subshell[]
  madelung: boolean
  source: string | null
}
const neutrals = new Map<number, Neutral>()

/** The neutral atom's configuration: Madelung or the NIST irregular table. Shared: do not change it. */
export function neutralSubshells(z: number): Neutral {
  let hit = neutrals.get(z)
  if (!hit) {
    const entry = NEUTRALS.get(z)
    hit = entry
      ? { subshells: parseConfiguration(entry.configuration), madelung: false, source: entry.source }
      : { subshells: fillInOrder(z, MADELUNG_ORDER), madelung: true, source: null }
    neutrals.set(z, hit)
  }
  return hit
}

// One shared fill per electron count: every element's ions with that many electrons use it.
const hydrogenicFills = new Map<number, Subshell[]>()

/** N electrons in hydrogenic (n, then l) order, shared: do not change it. */
export function hydrogenicFill(electrons: number): Subshell[] {
  let hit = hydrogenicFills.get(electrons)
  if (!hit) {
    hit = fillInOrder(electrons, HYDROGENIC_ORDER)
    hydrogenicFills.set(electrons, hit)
  }
  return hit
}
