/**
 * The best estimate for a species: of the methods that give it a number, the one with the
 * smallest mean deviation from NIST ASD over species of its class, as measured by
 * `npm run bench:accuracy` (which writes data/best-estimate-classes.ts), printed with that
 * mean as its typical error.
 */
import { CLASS_FIGURES } from './data/best-estimate-classes'
import type { MethodName } from './methods'
import type { Estimate } from './record-parts'

export interface SpeciesClass {
  key: string
  /** as the page prints it after "typically ±x % for" */
  label: string
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
  if (charge === 0) return { key: `${band.key}-neutral`, label: `neutral atoms, ${band.text}` }
  if (charge <= 4) return { key: `${band.key}-low`, label: `ions of charge 1–4, ${band.text}` }
  return { key: `${band.key}-high`, label: `ions of charge ≥ 5, ${band.text}` }
}

/** Every class key, in the order the bench prints them. */
export const CLASS_KEYS: readonly string[] = [
  ...Z_BANDS.flatMap((b) => [`${b.key}-neutral`, `${b.key}-low`, `${b.key}-high`]),
  'one-electron',
  'he-like',
  'li-like',
  'negative',
]

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
  const figures = CLASS_FIGURES[cls.key] ?? []
  let best: BestEstimate | null = null
  for (const e of estimates) {
    if (e.eV === null) continue
    const figure = figures.find(([method]) => method === e.method)
    if (!figure || figure[2] < MIN_SPECIES) continue
    if (!best || figure[1] < best.typicalPercent) {
      best = { method: e.method, eV: e.eV, typicalPercent: figure[1], n: figure[2], classLabel: cls.label, source: SOURCE }
    }
  }
  return best
}
