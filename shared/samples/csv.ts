/**
 * The sample CSV: the columns the export writes and the import reads, and how a composition is
 * written in one cell: components separated by ";", each "Symbol[-A] fraction[±u]" and, for an
 * enriched isotope, "enr e[±u]%" — e.g. "Ca-48 1 enr 97.8±0.2%" or "Ca-48 0.2 enr 97.8%; C 0.2; O 0.6".
 * A symbol without a mass number is the natural element. The basis (atom or mass) has its own column.
 */
import { getElement } from '../physics/index'
import type { ComponentBody } from '../schemas/samples'

export const CSV_COLUMNS = [
  'code', 'name', 'material', 'formula', 'form', 'status', 'areal_density_ug_cm2', 'areal_density_unc_ug_cm2', 'thickness_nm',
  'bulk_density_g_cm3', 'mass_mg', 'backing', 'supplier', 'lot', 'received_on', 'recertify_by', 'location', 'hazard_statements',
  'radioactive', 'nuclide', 'activity_bq', 'composition', 'fraction_basis', 'notes',
] as const
export type CsvColumn = (typeof CSV_COLUMNS)[number]

/** The columns an import must have; the others may be left out. */
export const REQUIRED_COLUMNS: CsvColumn[] = ['name', 'material', 'form']

/** Which CSV column holds each field of the sample form (for pointing at errors). */
export const COLUMN_OF_FIELD: Record<string, CsvColumn> = {
  name: 'name', material: 'material', formula: 'formula', form: 'form', status: 'status', arealDensity: 'areal_density_ug_cm2',
  arealDensityUncertainty: 'areal_density_unc_ug_cm2', thickness: 'thickness_nm', bulkDensity: 'bulk_density_g_cm3', massMg: 'mass_mg',
  backing: 'backing', supplier: 'supplier', lot: 'lot', receivedOn: 'received_on', recertifyBy: 'recertify_by', locationId: 'location',
  hazardStatements: 'hazard_statements', radioactive: 'radioactive', nuclide: 'nuclide', activityBq: 'activity_bq', components: 'composition', notes: 'notes',
}

type ComponentText = Pick<ComponentBody, 'z' | 'massNumber' | 'fraction' | 'enrichmentPercent' | 'fractionUncertainty' | 'enrichmentUncertainty'>

const num = (n: number) => String(Number(n.toPrecision(10)))

/** One cell for a composition. */
export function formatComposition(components: readonly ComponentText[]): string {
  return components
    .map((c) => {
      const symbol = getElement(c.z)?.symbol ?? `Z${c.z}`
      let s = `${symbol}${c.massNumber === null ? '' : `-${c.massNumber}`} ${num(c.fraction)}${c.fractionUncertainty != null ? `±${num(c.fractionUncertainty)}` : ''}`
      if (c.enrichmentPercent != null) s += ` enr ${num(c.enrichmentPercent)}${c.enrichmentUncertainty != null ? `±${num(c.enrichmentUncertainty)}` : ''}%`
      return s
    })
    .join('; ')
}

const PART = /^([A-Za-z]{1,2})(?:-(\d{1,3}))?\s+([0-9.eE+-]+)(?:\s*(?:±|\+\/-)\s*([0-9.eE+-]+))?(?:\s+enr\s+([0-9.eE+-]+)(?:\s*(?:±|\+\/-)\s*([0-9.eE+-]+))?\s*%)?$/

/** Reads a composition cell; numbers stay text here so the schema reports bad ones in its words. */
export function parseComposition(cell: string, basis: string): { components: Record<string, unknown>[]; problem: string | null } {
  const parts = cell.split(';').map((p) => p.trim()).filter(Boolean)
  const components: Record<string, unknown>[] = []
  for (const [i, part] of parts.entries()) {
    const m = PART.exec(part)
    const element = m ? getElement(m[1]!) : undefined
    if (!m || !element || element.symbol.toLowerCase() !== m[1]!.toLowerCase()) {
      return { components: [], problem: `Component ${i + 1} ("${part.slice(0, 40)}") should read like "Ni 1", "Ca-48 1 enr 97.8%" or "O 0.6±0.01"` }
    }
    components.push({
      z: element.z,
      massNumber: m[2] ? Number(m[2]) : null,
      fraction: m[3],
      basis,
      enrichmentPercent: m[5] ?? null,
      fractionUncertainty: m[4] ?? null,
      enrichmentUncertainty: m[6] ?? null,
    })
  }
  return { components, problem: null }
}

const TRUE = new Set(['yes', 'y', 'true', '1'])
const FALSE = new Set(['no', 'n', 'false', '0', ''])
const word = (v: string) => v.trim().toLowerCase().replace(/[\s-]+/g, '_')

export interface CsvRowProblem {
  column: string
  message: string
}

/**
 * A CSV record (header → cell) as the input SampleBody takes, plus what is wrong before the
 * schema even looks (a place that does not exist, a yes/no that is neither).
 */
export function csvRecordToInput(record: Record<string, string>, placeIdByCode: ReadonlyMap<string, string>): { input: Record<string, unknown>; problems: CsvRowProblem[] } {
  const problems: CsvRowProblem[] = []
  const cell = (c: CsvColumn) => (record[c] ?? '').trim()
  if (cell('code')) problems.push({ column: 'code', message: 'Leave the code empty: the import registers new samples and Ionfolio gives each its code' })
  const radio = cell('radioactive').toLowerCase()
  if (!TRUE.has(radio) && !FALSE.has(radio)) problems.push({ column: 'radioactive', message: 'Write yes or no' })
  let locationId: string | null = null
  if (cell('location')) {
    locationId = placeIdByCode.get(cell('location').toLowerCase()) ?? null
    if (!locationId) problems.push({ column: 'location', message: 'No storage place has this code; create it first or fix the code' })
  }
  const basis = word(cell('fraction_basis')) || 'atom'
  const composition = parseComposition(cell('composition'), basis)
  if (composition.problem) problems.push({ column: 'composition', message: composition.problem })
  return {
    input: {
      name: cell('name'),
      material: cell('material'),
      formula: cell('formula'),
      form: word(cell('form')),
      status: cell('status') ? word(cell('status')) : undefined,
      arealDensity: cell('areal_density_ug_cm2'),
      arealDensityUncertainty: cell('areal_density_unc_ug_cm2'),
      thickness: cell('thickness_nm'),
      bulkDensity: cell('bulk_density_g_cm3'),
      massMg: cell('mass_mg'),
      backing: cell('backing'),
      supplier: cell('supplier'),
      lot: cell('lot'),
      receivedOn: cell('received_on'),
      recertifyBy: cell('recertify_by'),
      locationId,
      hazardStatements: cell('hazard_statements'),
      radioactive: TRUE.has(radio),
      nuclide: cell('nuclide'),
      activityBq: cell('activity_bq'),
      notes: cell('notes'),
      components: composition.components,
    },
    problems,
  }
}
