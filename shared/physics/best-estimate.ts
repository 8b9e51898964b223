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
}

const Z_BANDS = [
  { max: 18, key: 'light', text: 'Z ≤ 18' },
  { max: 54, key: 'medium', text: 'Z = 19–54' },
  { max: 118, key: 'heavy', text: 'Z ≥ 55' },
] as const

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
  const parent =
    charge === 0
      ? { key: `${band.key}-neutral`, label: `neutral atoms, ${band.text}` }
      : charge <= 4
        ? { key: `${band.key}-low`, label: `ions of charge 1–4, ${band.text}` }
        : { key: `${band.key}-high`, label: `ions of charge ≥ 5, ${band.text}` }
  const shell = SHELL_KINDS[Math.min(nextElectronSubshell(z, charge)?.l ?? 0, 3)]!
  return { key: `${parent.key}-${shell.key}`, label: `${parent.label}, ${shell.text}`, parent }
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
const SHELL_KINDS = [
  { key: 'sp', text: 'losing an s or p electron' },
  { key: 'sp', text: 'losing an s or p electron' },
  { key: 'd', text: 'losing a d electron' },
  { key: 'f', text: 'losing an f electron' },
] as const

/** Every class key, in the order the bench prints them: each wide class, then its parts. */
export const CLASS_KEYS: readonly string[] = [
  ...Z_BANDS.flatMap((b) =>
    ['neutral', 'low', 'high'].flatMap((g) => [`${b.key}-${g}`, ...['sp', 'd', 'f'].map((k) => `${b.key}-${g}-${k}`)]),
  ),
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
  const cls = speciesClass(z, charge)
  // the narrow class where it has enough species measured, else the wider one it splits
  for (const c of cls.parent ? [cls, cls.parent] : [cls]) {
    const figures = CLASS_FIGURES[c.key] ?? []
    let best: BestEstimate | null = null
    for (const e of estimates) {
      if (e.eV === null) continue
      const figure = figures.find(([method]) => method === e.method)
      if (!figure || figure[2] < MIN_SPECIES) continue
      if (!best || figure[1] < best.typicalPercent) {
        best = { method: e.method, eV: e.eV, typicalPercent: figure[1], n: figure[2], classLabel: c.label, source: SOURCE }
      }
    }
    if (best) return best
  }
  return null
}
