/**
 * The best estimate for a species: of the methods that give it a number, the one with the
 * smallest mean deviation from NIST ASD over species of its class, as measured by
 * `npm run bench:accuracy` (which writes data/best-estimate-classes.ts), printed with that
 * mean as its typical error.
 */
import { nextElectronSubshell } from './configuration'
import { CLASS_FIGURES } from './data/best-estimate-classes'
import type { MethodName } from './methods'
import type { Estimate } from './record-parts'

export interface SpeciesClass {
  key: string
  /** as the page prints it after "typically ±x % for" */
  label: string
  /** the wider class this one splits, used where this one has too few species measured */
  parent?: { key: string; label: string }
  /** the kind of subshell the next electron leaves, for the classes split by it */
  shell?: ShellKind
}

export type ShellKind = 'sp' | 'd' | 'f'

const Z_BANDS = [
  { max: 18, key: 'light', text: 'Z ≤ 18' },
  { max: 54, key: 'medium', text: 'Z = 19–54' },
  { max: 118, key: 'heavy', text: 'Z ≥ 55' },
] as const

/**
 * The charge groups. The s, p and d classes of charge ≥ 5 are split at q = 10: in the ions of
 * charge 5–9 losing a d electron the Hartree–Fock ΔSCF (hf-delta) is the closest method and at
 * q ≥ 10 the local-density one (measured in bench/ionisation-accuracy.ts, engine 1.5.0: for Z ≥ 55
 * 0.90 % against 1.31 % at q = 5–9, 0.26 % against 0.15 % at q ≥ 10), so one figure for q ≥ 5
 * would lead Au⁵⁺, Hg⁵⁺ and Hg⁶⁺ with a method 5 % off. The f classes stay whole: over their 43 heavy
 * ions of charge 5–9 the three relativistic local-density methods come within 0.2 % of one another
 * (4.4–4.6 %) against references NIST states to ±5 %, too close to choose by.
 */
const CHARGE_GROUPS = {
  neutral: { key: 'neutral', text: 'neutral atoms' },
  low: { key: 'low', text: 'ions of charge 1–4' },
  high: { key: 'high', text: 'ions of charge ≥ 5' },
  mid: { key: 'mid', text: 'ions of charge 5–9' },
  // keeps the key of the whole group, so the f classes and the q ≥ 10 ones read alike
  fromTen: { key: 'high', text: 'ions of charge ≥ 10' },
} as const

/**
 * The class a species belongs to, for the accuracy figures (one-, two- and three-electron ions
 * and negative ions apart: the few-electron ions have methods of their own).
 */
export function speciesClass(z: number, charge: number): SpeciesClass {
  if (charge < 0) return { key: 'negative', label: 'negative ions' }
  if (z - charge === 1) return { key: 'one-electron', label: 'one-electron ions' }
  if (z - charge === 2 && charge > 0) return { key: 'he-like', label: 'He-like ions' }
  if (z - charge === 3 && charge > 0) return { key: 'li-like', label: 'Li-like ions' }
  const band = Z_BANDS.find((b) => z <= b.max) ?? Z_BANDS[2]
  const group = charge === 0 ? CHARGE_GROUPS.neutral : charge <= 4 ? CHARGE_GROUPS.low : CHARGE_GROUPS.high
  const parent = { key: `${band.key}-${group.key}`, label: `${group.text}, ${band.text}` }
  const l = nextElectronSubshell(z, charge)?.l ?? 0
  const shell: ShellKind = l >= 3 ? 'f' : l === 2 ? 'd' : 'sp'
  const own = group === CHARGE_GROUPS.high && shell !== 'f' ? (charge <= 9 ? CHARGE_GROUPS.mid : CHARGE_GROUPS.fromTen) : group
  return { key: `${band.key}-${own.key}-${shell}`, label: `${own.text}, ${band.text}, ${SHELL_TEXT[shell]}`, parent, shell }
}

/**
 * The many-electron classes are split by the kind of subshell the next electron leaves: the local
 * density methods are far less accurate for removing an f electron than an s, p or d one
 * (measured in bench/ionisation-accuracy.ts, engine 1.4.0: for Z ≥ 55 and q ≥ 5 the best method
 * is off by 0.63 % on average for s and p, 0.20 % for d and 2.9 % for f electrons; for q = 1–4 by
 * 2.4 %, 3.0 % and 5.4 %), so one figure per charge and Z band would promise lanthanide and
 * actinide ions an accuracy they do not get, and hide that the ΔSCF and eigenvalue estimates rank
 * differently for different shells.
 */
const SHELL_TEXT: Readonly<Record<ShellKind, string>> = {
  sp: 'losing an s or p electron',
  d: 'losing a d electron',
  f: 'losing an f electron',
}

/** Every class key, in the order the bench prints them: each wide class, then its parts. */
export const CLASS_KEYS: readonly string[] = [
  ...Z_BANDS.flatMap((b) => [
    ...['neutral', 'low'].flatMap((g) => [`${b.key}-${g}`, ...['sp', 'd', 'f'].map((k) => `${b.key}-${g}-${k}`)]),
    `${b.key}-high`,
    ...['mid-sp', 'mid-d', 'high-sp', 'high-d', 'high-f'].map((k) => `${b.key}-${k}`),
  ]),
  'one-electron',
  'he-like',
  'li-like',
  'negative',
]

/** Does the species belong to the class `key` (its own or the wider one it splits)? */
export function inClass(z: number, charge: number, key: string): boolean {
  const cls = speciesClass(z, charge)
  return cls.key === key || cls.parent?.key === key
}

export interface BestEstimate {
  method: MethodName
  eV: number
  /** mean absolute deviation of this method from NIST ASD over the class, percent */
  typicalPercent: number
  /** how many species of the class with a reference value the mean is over */
  n: number
  classLabel: string
  source: string
}

/** A class figure is trusted from this many species on. */
const MIN_SPECIES = 3
const SOURCE = 'mean absolute deviation from NIST ASD over the species of this class, measured by bench/ionisation-accuracy.ts'

/** The best of the given estimates for (z, charge), or null when none has a class figure. */
export function bestEstimate(z: number, charge: number, estimates: readonly Estimate[]): BestEstimate | null {
  const numbers = new Map(estimates.flatMap((e) => (e.eV === null ? [] : [[e.method, e.eV] as const])))
  const pick = bestFigure(z, charge, (method) => numbers.has(method as MethodName))
  if (!pick) return null
  const [method, typicalPercent, n] = pick.figure
  return { method: method as MethodName, eV: numbers.get(method as MethodName)!, typicalPercent, n, classLabel: pick.label, source: SOURCE }
}

type Figure = readonly [string, number, number]

/**
 * The class figure the best estimate rests on: among the methods `gives` says have a number, the
 * one with the smallest class mean, from the species' own class where it has enough species
 * measured, else from the wider class it splits. `figures` defaults to the generated file; the
 * accuracy bench passes the figures it has just measured.
 */
export function bestFigure(
  z: number,
  charge: number,
  gives: (method: string) => boolean,
  figures: Readonly<Record<string, readonly Figure[]>> = CLASS_FIGURES,
): { figure: Figure; label: string } | null {
  const cls = speciesClass(z, charge)
  for (const c of cls.parent ? [cls, cls.parent] : [cls]) {
    let best: Figure | null = null
    for (const figure of figures[c.key] ?? []) {
      if (figure[2] < MIN_SPECIES || !gives(figure[0])) continue
      if (!best || figure[1] < best[1]) best = figure
    }
    if (best) return { figure: best, label: c.label }
  }
  return null
}
