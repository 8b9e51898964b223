/**
 * The sample CSV: the columns the export writes and the import reads, and how a composition is
 * written in one cell: components separated by ";", each "Symbol[-A] fraction[±u]" and, for an
 * enriched isotope, "enr e[±u]%" — e.g. "Ca-48 1 enr 97.8±0.2%" or "Ca-48 0.2 enr 97.8%; C 0.2; O 0.6" —
 * or, for an isotope with the supplier's full isotopic analysis, "iso[A=p±u A=p±u …]%" with every
 * isotope's atom % — e.g. "Ni-58 1 iso[58=99.30±0.05 60=0.55±0.04 61=0.03±0.01 62=0.10±0.02 64=0.02±0.01]%".
 * A symbol without a mass number is the natural element. The basis (atom or mass) has its own column.
 */
import { getElement } from '../physics/index'
import type { ComponentBody } from '../schemas/samples'
import { csvMeasured } from '../format/measured'

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

type ComponentText = Pick<ComponentBody, 'z' | 'massNumber' | 'fraction' | 'enrichmentPercent' | 'fractionUncertainty' | 'enrichmentUncertainty'> & { analysis?: ComponentBody['analysis'] }

const num = (n: number) => String(Number(n.toPrecision(10)))

// "value±u" with both rounded to the uncertainty (two significant digits of u, JCGM 100:2008 §7.2.6), or the value alone.
function pair(v: number, u: number | null | undefined): string {
  if (u == null) return num(v)
  const [value, unc] = csvMeasured(v, u)
  return unc ? `${value}±${unc}` : `${value}±0`
}

/** One cell for a composition. */
export function formatComposition(components: readonly ComponentText[]): string {
  return components
    .map((c) => {
      const symbol = getElement(c.z)?.symbol ?? `Z${c.z}`
      let s = `${symbol}${c.massNumber === null ? '' : `-${c.massNumber}`} ${pair(c.fraction, c.fractionUncertainty)}`
      if (c.enrichmentPercent != null) s += ` enr ${pair(c.enrichmentPercent, c.enrichmentUncertainty)}%`
      if (c.analysis?.length) s += ` iso[${c.analysis.map((r) => `${r.massNumber}=${pair(r.percent, r.uncertainty)}`).join(' ')}]%`
      return s
    })
    .join('; ')
}

const PART = /^([A-Za-z]{1,2})(?:-(\d{1,3}))?\s+([0-9.eE+-]+)(?:\s*(?:±|\+\/-)\s*([0-9.eE+-]+))?(?:\s+enr\s+([0-9.eE+-]+)(?:\s*(?:±|\+\/-)\s*([0-9.eE+-]+))?\s*%)?(?:\s+iso\[([^\]]*)\]\s*%)?$/
const LINE = /^(\d{1,3})=([0-9.eE+-]+)(?:(?:±|\+\/-)([0-9.eE+-]+))?$/

/** Reads a composition cell; numbers stay text here so the schema reports bad ones in its words. */
export function parseComposition(cell: string, basis: string): { components: Record<string, unknown>[]; problem: string | null } {
  const parts = cell.split(';').map((p) => p.trim()).filter(Boolean)
  const components: Record<string, unknown>[] = []
  for (const [i, part] of parts.entries()) {
    const m = PART.exec(part)
    const element = m ? getElement(m[1]!) : undefined
    if (!m || !element || element.symbol.toLowerCase() !== m[1]!.toLowerCase()) {
      return { components: [], problem: `Component ${i + 1} ("${part.slice(0, 40)}") should read like "Ni 1", "Ca-48 1 enr 97.8%", "Ni-58 1 iso[58=99.3±0.05 60=0.7±0.05]%" or "O 0.6±0.01"` }
    }
    let analysis: Record<string, unknown>[] | null = null
    if (m[7] !== undefined) {
      const lines = m[7].trim().split(/\s+/).filter(Boolean)
      const parsed = lines.map((l) => LINE.exec(l))
      if (!lines.length || parsed.some((p) => !p)) {
        return { components: [], problem: `Component ${i + 1}: write its isotopic analysis like "iso[58=99.30±0.05 60=0.55±0.04]%"` }
      }
      analysis = parsed.map((p) => ({ massNumber: p![1], percent: p![2], uncertainty: p![3] ?? null }))
    }
    components.push({
      z: element.z,
      massNumber: m[2] ? Number(m[2]) : null,
      fraction: m[3],
      basis,
      enrichmentPercent: m[5] ?? null,
      fractionUncertainty: m[4] ?? null,
      enrichmentUncertainty: m[6] ?? null,
      analysis,
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
