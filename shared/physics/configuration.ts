/**
 * Ground-state electron configuration of any element in any charge state from −1 to Z.
 *
 * Neutral atoms: Madelung filling, except the irregular atoms NIST ASD lists (data/irregular.ts).
 *
 * Positive ions: electrons leave the subshell of highest n first and, within that n, the one of
 * highest l (so 4s before 3d, 6s before 4f) — first from the valence subshells, those outside the
 * neutral atom's closed-shell core, and only then from the core in the same order. The proviso is
 * ours: without it Nd³⁺ would lose a 5p electron ahead of 4f and come out 4f4 5p5 instead of the
 * 4f3 that NIST ASD gives (Nd IV 4I°9/2, data/nist-asd-detail.ts), and U³⁺ would lose 6p before 5f. A curated
 * table of ions whose NIST ground configuration departs from the rule overrides it.
 *
 * Heavy ions (Z ≥ 57, charge 5 and up, fewer charges than electrons): 4f (5f) competes with
 * 5s/5p (6s/6p) and no filling order holds across the charge states (In-like Yb²¹⁺ is 4d10 4f3
 * in NIST ASD, not the rule's 4d10 5s2 5p; tungsten ions lose 4f before 5s from W¹³⁺ on). There the
 * ground configuration is the one of lowest Dirac–Kohn–Sham total energy among those that share
 * the electrons among the outer subshells (scf/configuration-search.ts), computed once and
 * tabulated in data/dks-configurations.ts where it is not the rule's. The table of data/irregular.ts
 * overrides the search too, where NIST ASD's ground shells rest on spectra (W⁷⁺, W¹¹⁺, W¹⁶⁺).
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
import { DKS_GROUND_CONFIGURATIONS } from './data/dks-configurations'
import { IRREGULAR_ANIONS, IRREGULAR_IONS } from './data/irregular'
import { MAX_Z, symbolOf } from './elements'
import { addMadelungElectron, energySearchDomain, highestFirst, hydrogenicFill, neutralSubshells, removeElectrons } from './filling'
import { type Subshell, formatConfiguration, formatWithCore, parseConfiguration } from './subshells'

export { energySearchDomain, removalRuleConfiguration } from './filling'

export type ConfigurationRule =
  | 'madelung'
  | 'irregular-neutral'
  | 'removal-rule'
  | 'hydrogenic-order'
  | 'irregular-ion'
  | 'lowest-dks-energy'
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

const TABLE = new Map([...IRREGULAR_IONS, ...IRREGULAR_ANIONS].map((e) => [`${e.z}:${e.charge}`, e]))
const BY_ENERGY = new Map(DKS_GROUND_CONFIGURATIONS.map(([z, charge, configuration]) => [`${z}:${charge}`, configuration]))

/** The source named for a configuration chosen by energy. */
export const LOWEST_DKS_ENERGY_SOURCE =
  'lowest Dirac–Kohn–Sham total energy of the competing configurations (the engine\'s own relativistic solver; data/dks-configurations.ts)'

// One frozen object per (n, l, occupancy), shared by every cached configuration: a listing of
// all species then holds arrays of a few hundred objects instead of a hundred thousand.
const interned = new Map<number, Subshell>()
function intern(s: Subshell): Subshell {
  const key = (s.n * 8 + s.l) * 32 + s.electrons
  let hit = interned.get(key)
  if (!hit) {
    hit = Object.freeze({ n: s.n, l: s.l, electrons: s.electrons })
    interned.set(key, hit)
  }
  return hit
}

const internedFills = new WeakMap<readonly Subshell[], Subshell[]>()
function internedFill(fill: readonly Subshell[]): Subshell[] {
  let hit = internedFills.get(fill)
  if (!hit) {
    hit = fill.map(intern)
    internedFills.set(fill, hit)
  }
  return hit
}

// The text forms of shared subshell arrays (the hydrogenic fills), written once.
const formatted = new WeakMap<readonly Subshell[], { text: string; core: string }>()

// Cached entries are never changed after this, so entries may share subshell arrays.
function compute(z: number, charge: number): GroundConfiguration {
  const electrons = z - charge
  const entry = TABLE.get(`${z}:${charge}`)
  let subshells: readonly Subshell[]
  let rule: ConfigurationRule
  let source: string | null = null
  if (entry) {
    subshells = parseConfiguration(entry.configuration)
    rule = charge < 0 ? 'irregular-anion' : 'irregular-ion'
    source = entry.source
  } else if (charge === 0) {
    const neutral = neutralSubshells(z)
    subshells = neutral.subshells
    rule = neutral.madelung ? 'madelung' : 'irregular-neutral'
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
  } else if (energySearchDomain(z, charge) && BY_ENERGY.has(`${z}:${charge}`)) {
    subshells = parseConfiguration(BY_ENERGY.get(`${z}:${charge}`)!)
    rule = 'lowest-dks-energy'
    source = LOWEST_DKS_ENERGY_SOURCE
  } else {
    subshells = removeElectrons(z, neutralSubshells(z).subshells, charge)
    rule = 'removal-rule'
  }
  // Hydrogenic fills are shared between elements: intern each array once, so its text is cached.
  const shared = rule === 'hydrogenic-order' ? internedFill(subshells) : subshells.map(intern)
  let texts = formatted.get(shared)
  if (!texts) {
    texts = { text: formatConfiguration(shared), core: formatWithCore(shared) }
    formatted.set(shared, texts)
  }
  return {
    z,
    charge,
    electrons,
    subshells: shared,
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
