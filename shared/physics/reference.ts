/**
 * Access to the committed reference data (data/nist-asd.ts): ionisation energies by charge state,
 * electron affinities and the neutral ground levels, each with the source to print beside it.
 */
import { NIST_ASD_ROWS, NIST_ASD_SOURCE } from './data/nist-asd'

export interface SourcedValue {
  eV: number
  source: string
}

export const IONISATION_SOURCE = NIST_ASD_SOURCE
export const ELECTRON_AFFINITY_SOURCE = 'electron affinity as carried by pymatgen 2022.11.7 periodic_table.json (which names no source)'

/** NIST ASD energy to remove the next electron from the ion of this charge (≥ 0), or null. */
export function referenceIonisationEv(z: number, charge: number): number | null {
  const row = NIST_ASD_ROWS[z - 1]
  if (!row || charge < 0) return null
  return row[4][charge] ?? null
}

/** All reference ionisation energies of element z by charge (index = charge; null where missing). */
export function referenceIonisationSeries(z: number): readonly (number | null)[] {
  return NIST_ASD_ROWS[z - 1]?.[4] ?? []
}

export type ElectronAffinity =
  | { bound: true; eV: number; source: string }
  | { bound: false; statement: 'not bound'; source: string }
  | { bound: null; statement: 'no reference value'; source: null }

/**
 * The electron affinity of element z as the binding energy of its anion. The data give zero or
 * negative numbers for anions that are not bound (He⁻, Be⁻, N⁻, the noble gases …); those are
 * reported as 'not bound' rather than as a negative energy.
 */
export function electronAffinity(z: number): ElectronAffinity {
  const ea = NIST_ASD_ROWS[z - 1]?.[3] ?? null
  if (ea === null) return { bound: null, statement: 'no reference value', source: null }
  if (ea <= 0) return { bound: false, statement: 'not bound', source: ELECTRON_AFFINITY_SOURCE }
  return { bound: true, eV: ea, source: ELECTRON_AFFINITY_SOURCE }
}

export interface ReferenceGroundLevel {
  /** as NIST gives it, e.g. '[Ar] 3d6 4s2'; null where the data have none (Z ≥ 104) */
  configuration: string | null
  tentative: boolean
  /** e.g. '5D4'; a few entries carry only J or a jj-coupled label */
  level: string | null
  source: string
}

/** NIST ASD ground configuration and level of the neutral atom, as carried in the data. */
export function referenceGroundLevel(z: number): ReferenceGroundLevel | null {
  const row = NIST_ASD_ROWS[z - 1]
  if (!row || (row[0] === null && row[2] === null)) return null
  return { configuration: row[0], tentative: row[1] === 1, level: row[2], source: NIST_ASD_SOURCE }
}
