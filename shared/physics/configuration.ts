/**
 * Ground-state electron configuration of any element in any charge state from −1 to Z.
 *
 * Neutral atoms: Madelung filling, except the irregular atoms NIST ASD lists (data/irregular.ts).
 *
 * Positive ions: electrons leave the subshell of highest n first and, within that n, the one of
 * highest l (so 4s before 3d, 6s before 4f) — first from the valence subshells, those outside the
 * neutral atom's closed-shell core, and only then from the core in the same order. The proviso is
 * ours: without it Nd³⁺ would lose a 5p electron ahead of 4f and come out 4f4 5p5 instead of the
 * 4f3 that NIST ASD gives (Nd IV 4I9/2, from memory), and U³⁺ would lose 6p before 5f. A curated
 * table of ions whose NIST ground configuration departs from the rule overrides it.
 *
 * Highly charged ions: once the charge is at least the number of electrons left (Z ≥ 2N) the
 * nuclear field dominates and the levels follow the hydrogenic order, n first and then l
 * (common practice, no source); the engine fills N electrons in that order. The removal rule
 * gives the same result there for every Z (checked in tests/unit/physics/configuration.test.ts,
 * which also compares highly charged ions with their isoelectronic sequence), so this states the
 * physics rather than correcting anything.
 *
 * Anions (charge −1): the neutral configuration plus one electron in the first subshell in
 * Madelung order that has room, except the anions tabulated in data/irregular.ts.
 */
import { IRREGULAR_ANIONS, IRREGULAR_IONS, IRREGULAR_NEUTRALS } from './data/irregular'
import { MAX_Z, symbolOf } from './elements'
import {
  MADELUNG_ORDER,
  type Subshell,
  canonical,
  capacity,
  fillInOrder,
  formatConfiguration,
  formatWithCore,
  largestCore,
  parseConfiguration,
} from './subshells'

export type ConfigurationRule =
  | 'madelung'
  | 'irregular-neutral'
  | 'removal-rule'
  | 'hydrogenic-order'
  | 'irregular-ion'
  | 'anion-madelung'
  | 'irregular-anion'
  | 'bare-nucleus'

export interface GroundConfiguration {
  z: number
  charge: number
  electrons: number
  /** occupied subshells sorted by n then l */
  subshells: Subshell[]
  /** '1s2 2s2 2p6 3s2 3p1'; '' for a bare nucleus */
  text: string
  /** '[Ne] 3s2 3p1'; '' for a bare nucleus */
  core: string
  /** 'Al-like': the neutral atom with the same number of electrons; null for 0 or 119 electrons */
  isoelectronic: string | null
  /** which rule or table gave the configuration */
  rule: ConfigurationRule
  /** the table's source for tabulated configurations, otherwise null */
  source: string | null
}

const HYDROGENIC_ORDER: readonly (readonly [number, number])[] = [1, 2, 3, 4, 5, 6, 7, 8].flatMap((n) =>
  Array.from({ length: Math.min(n, 4) }, (_, l) => [n, l] as const),
)

const key = (z: number, charge: number) => `${z}:${charge}`
const TABLE = new Map(
  [...IRREGULAR_NEUTRALS, ...IRREGULAR_IONS, ...IRREGULAR_ANIONS].map((e) => [key(e.z, e.charge), e]),
)

// From tungsten on, the closed 4f shell lies below 5s and 5p in the ions (Pm-like W¹³⁺ is
// 4f14 5s, from memory), so it joins the core; before it (Yb³⁺ 4f13, NIST Yb IV, from memory)
// it still gives up electrons first. 5f from Z = 106 on by analogy, with no data to check.
function neutralCore(z: number, neutral: readonly Subshell[]): Subshell[] {
  const core = [...(largestCore(neutral)?.subshells ?? [])]
  if (z >= 74) core.push({ n: 4, l: 3, electrons: 14 })
  if (z >= 106) core.push({ n: 5, l: 3, electrons: 14 })
  return core
}

const highestFirst = (a: Subshell, b: Subshell) => b.n - a.n || b.l - a.l

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

function removeElectrons(z: number, neutral: readonly Subshell[], count: number): Subshell[] {
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

function addMadelungElectron(start: readonly Subshell[]): Subshell[] {
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
  rule: ConfigurationRule
  source: string | null
}
const neutrals = new Map<number, Neutral>()

// Callers copy before changing anything: the result is shared.
function neutralSubshells(z: number): Neutral {
  let hit = neutrals.get(z)
  if (!hit) {
    const entry = TABLE.get(key(z, 0))
    hit = entry
      ? { subshells: parseConfiguration(entry.configuration), rule: 'irregular-neutral', source: entry.source }
      : { subshells: fillInOrder(z, MADELUNG_ORDER), rule: 'madelung', source: null }
    neutrals.set(z, hit)
  }
  return hit
}

// One shared fill per electron count: every element's ions with that many electrons use it.
const hydrogenicFills = new Map<number, Subshell[]>()
function hydrogenicFill(electrons: number): Subshell[] {
  let hit = hydrogenicFills.get(electrons)
  if (!hit) {
    hit = fillInOrder(electrons, HYDROGENIC_ORDER)
    hydrogenicFills.set(electrons, hit)
  }
  return hit
}

// The text forms of shared subshell arrays (the hydrogenic fills), written once.
const formatted = new WeakMap<readonly Subshell[], { text: string; core: string }>()

// Cached entries are never changed after this, so entries may share subshell arrays.
function compute(z: number, charge: number): GroundConfiguration {
  const electrons = z - charge
  const entry = TABLE.get(key(z, charge))
  let subshells: Subshell[]
  let rule: ConfigurationRule
  let source: string | null = null
  if (entry && charge !== 0) {
    subshells = parseConfiguration(entry.configuration)
    rule = charge < 0 ? 'irregular-anion' : 'irregular-ion'
    source = entry.source
  } else if (charge === 0) {
    const neutral = neutralSubshells(z)
    subshells = neutral.subshells.map((x) => ({ ...x }))
    rule = neutral.rule
    source = neutral.source
  } else if (charge < 0) {
    subshells = addMadelungElectron(neutralSubshells(z).subshells)
    rule = 'anion-madelung'
  } else if (electrons === 0) {
    subshells = []
    rule = 'bare-nucleus'
  } else if (charge >= electrons) {
    subshells = hydrogenicFill(electrons)
    rule = 'hydrogenic-order'
  } else {
    subshells = removeElectrons(z, neutralSubshells(z).subshells, charge)
    rule = 'removal-rule'
  }
  let texts = formatted.get(subshells)
  if (!texts) {
    texts = { text: formatConfiguration(subshells), core: formatWithCore(subshells) }
    formatted.set(subshells, texts)
  }
  return {
    z,
    charge,
    electrons,
    subshells,
    text: texts.text,
    core: texts.core,
    isoelectronic: electrons >= 1 && electrons <= MAX_Z ? `${symbolOf(electrons)}-like` : null,
    rule,
    source,
  }
}

const cache = new Map<number, GroundConfiguration>()

// The shared cached object: for this module's own reads only.
function cached(z: number, charge: number): GroundConfiguration {
  if (!Number.isInteger(z) || z < 1 || z > MAX_Z) throw new RangeError(`Z must be an integer from 1 to ${MAX_Z}`)
  if (!Number.isInteger(charge) || charge < -1 || charge > z) throw new RangeError(`charge must be an integer from -1 to ${z}`)
  const k = z * 128 + charge + 1
  let hit = cache.get(k)
  if (!hit) {
    hit = compute(z, charge)
    cache.set(k, hit)
  }
  return hit
}

/** The same as groundConfiguration but shared, not copied: for callers that only read it. */
export function readGroundConfiguration(z: number, charge: number): Readonly<GroundConfiguration> {
  return cached(z, charge)
}

/** Ground configuration of element z with the given charge (−1 ≤ charge ≤ z); throws outside that. */
export function groundConfiguration(z: number, charge: number): GroundConfiguration {
  const hit = cached(z, charge)
  // Callers get their own arrays so that a mutation cannot poison the cache.
  return { ...hit, subshells: hit.subshells.map((s) => ({ ...s })) }
}

/**
 * The subshell the next electron leaves on going from charge q to q + 1: the one that loses most,
 * ties to the highest n then l (null for a bare nucleus).
 */
export function nextElectronSubshell(z: number, charge: number): Subshell | null {
  if (charge >= z) return null
  const here = cached(z, charge).subshells
  const next = cached(z, charge + 1).subshells
  let best: Subshell | null = null
  let bestLoss = 0
  for (const s of here) {
    const loss = s.electrons - (next.find((t) => t.n === s.n && t.l === s.l)?.electrons ?? 0)
    if (loss > bestLoss || (loss === bestLoss && loss > 0 && best && highestFirst(s, best) < 0)) {
      best = s
      bestLoss = loss
    }
  }
  return best ? { ...best } : null
}

/** Fills N electrons in hydrogenic (n, then l) order: the high-charge limit of a sequence. */
export function hydrogenicOrderConfiguration(electrons: number): Subshell[] {
  return fillInOrder(electrons, HYDROGENIC_ORDER)
}
