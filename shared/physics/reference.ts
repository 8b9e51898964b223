/**
 * Access to the committed reference data (data/nist-asd.ts): ionisation energies by charge state,
 * electron affinities and the neutral ground levels, each with the source to print beside it; and
 * (data/nist-asd-detail.ts) what NIST ASD states about each ionisation energy: its uncertainty,
 * whether it is measured, semi-empirical or theoretical, and the ion's ground shells.
 */
import { NIST_ASD_ROWS, NIST_ASD_SOURCE } from './data/nist-asd'
import { NIST_ASD_DETAIL, NIST_ASD_DETAIL_SOURCE } from './data/nist-asd-detail'
import { parseConfiguration, subshellLabel } from './subshells'

export interface SourcedValue {
  eV: number
  source: string
}

/** A reference ionisation energy with what ASD states about it, where the engine's copy is ASD's current value. */
export interface ReferenceValue extends SourcedValue {
  /** NIST's stated uncertainty, eV */
  uncertaintyEv?: number
  kind?: ReferenceKind
}

export const IONISATION_SOURCE = NIST_ASD_SOURCE
export const IONISATION_DETAIL_SOURCE = NIST_ASD_DETAIL_SOURCE
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

export type ReferenceKind = 'measured' | 'semi-empirical' | 'theoretical'
const KINDS: readonly ReferenceKind[] = ['measured', 'semi-empirical', 'theoretical']

export interface ReferenceIonisationDetail {
  /** NIST's stated uncertainty of the value, eV (null where ASD states none) */
  uncertaintyEv: number | null
  /** how ASD marks the value: measured, semi-empirical ([…]) or theoretical ((…)); null where ASD has revised it by more than its stated uncertainty */
  kind: ReferenceKind | null
  /** the ground shells of the ion being ionised as ASD writes them, e.g. '[Cd].4f11' */
  groundShells: string
  /** ASD 5.12's value where it differs from the engine's copy (pymatgen 2022.11.7), else null */
  revisedEv: number | null
  /** the ion's ground level as ASD gives it ('4I°15/2'); null where it gives none or only a parity */
  groundLevel: string | null
  source: string
}

/**
 * What NIST ASD 5.12 says about the reference ionisation energy of (z, charge) beyond the number:
 * its stated uncertainty and kind, and the ion's ground shells. Null where the engine has no
 * reference value or the export has no row. Where ASD has revised the value since the engine's
 * copy (200 of 5,353, nearly all by less than 1e-4 of it), the uncertainty given is the stated one
 * plus the revision: the engine's copy lies within that of ASD's current value.
 */
export function referenceIonisationDetail(z: number, charge: number): ReferenceIonisationDetail | null {
  const d = NIST_ASD_DETAIL[z - 1]?.[charge]
  const ours = referenceIonisationEv(z, charge)
  if (!d || ours === null) return null
  const revision = d[3] === null ? 0 : Math.abs(d[3] - ours)
  const uncertaintyEv = d[0] === null ? null : Number((d[0] + revision).toPrecision(6))
  // a value revised by more than its stated uncertainty may have changed kind too (Rn⁺: 21.4 → 18.99 eV)
  const kind = d[3] === null || (d[0] !== null && revision <= d[0]) ? KINDS[d[1]] : null
  return { uncertaintyEv, kind, groundShells: d[2], revisedEv: d[3], groundLevel: levelOf(d[4]), source: NIST_ASD_DETAIL_SOURCE }
}

const levelOf = (text: string | undefined) => (text === undefined || text === '' || text === '°' ? null : text)

/** ASD's ground shells of (z, charge) even where its ionisation energy was revised; null where none. */
export function referenceGroundShells(z: number, charge: number): string | null {
  return NIST_ASD_DETAIL[z - 1]?.[charge]?.[2] ?? null
}

/** ASD's ground level of (z, charge) ('4I°15/2'); null where it gives none. */
export function referenceIonGroundLevel(z: number, charge: number): string | null {
  return levelOf(NIST_ASD_DETAIL[z - 1]?.[charge]?.[4])
}

/**
 * ASD's ground shells as occupations by subshell label ('4f' → 11), read with the engine's own
 * configuration parser once ASD's two cores that are not noble gases are written out ([Cd] and
 * [Hg], as the export's notes define them); null where the text cannot be read.
 */
export function groundShellOccupations(shells: string): Map<string, number> | null {
  const text = shells.replace('[Cd]', '[Kr] 4d10 5s2 ').replace('[Hg]', '[Xe] 4f14 5d10 6s2 ').replace(/\./g, ' ')
  try {
    return new Map(parseConfiguration(text).map((s) => [subshellLabel(s.n, s.l), s.electrons]))
  } catch {
    return null
  }
}
