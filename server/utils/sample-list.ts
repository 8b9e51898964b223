import type { Knex } from 'knex'
import type { SampleListParams } from '../../shared/schemas/samples'
import { CLP_VARIANTS } from '../../shared/samples/ghs'
import { countRows } from './count'
import { parseIsotopeToken } from '../../shared/physics/notation'

// The sample list's SQL, in one place for the list route, its CSV export and bench/registry.ts
// (which times this same SQL straight through Knex). Plain imports only, no Nitro auto-imports.

const SORT_COLUMNS: Record<string, string> = {
  code: 's.code',
  name: 's.name',
  material: 's.material',
  form: 's.form',
  status: 's.status',
  arealDensity: 's.areal_density_ug_cm2',
  thickness: 's.thickness_nm',
  receivedOn: 's.received_on',
  recertifyBy: 's.recertify_by',
  location: 'l.code',
  updatedAt: 's.updated_at',
}

export const DEFAULT_SAMPLE_SORT = '-code'

/** Escapes LIKE's wildcards so a typed % or _ matches itself. */
function likeTerm(term: string): string {
  return `%${term.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`
}

// A place and everything inside it. As `= any(array(…))` the set is computed once (an InitPlan)
// and the sample side can use its location index.
const PLACE_AND_INSIDE = `array(with recursive sub as (
    select id from locations where id = ?
    union select c.id from locations c join sub on c.parent_id = sub.id) select id from sub)`

/** Samples joined to their place, narrowed by the list's search and filters (no order, no paging). */
export function filteredSamples(db: Knex, p: SampleListParams): Knex.QueryBuilder {
  const query = db('samples as s').leftJoin('locations as l', 'l.id', 's.location_id')
  const terms = (p.q ?? '').split(/\s+/).filter(Boolean).slice(0, 6)
  // search_text also holds the codes and names of the sample's place and the places around it.
  // A term naming an isotope ("Ni-58", "58Ni", "Ni58") also finds the samples holding that
  // isotope as a component, however it is written; the text still matches too, since a place
  // code such as B11 reads like an isotope.
  for (const term of terms) {
    const isotope = parseIsotopeToken(term)
    query.where((w) => {
      w.whereRaw(`s.search_text like ? escape '\\'`, [likeTerm(term)])
      if (isotope) w.orWhereExists((e) => e.select(db.raw('1')).from('sample_components as c').whereRaw('c.sample_id = s.id').where({ 'c.z': isotope.z, 'c.mass_number': isotope.massNumber }))
    })
  }
  if (p.status === undefined) query.whereNot('s.status', 'retired')
  else if (p.status !== 'any') query.where('s.status', p.status)
  if (p.form) query.where('s.form', p.form)
  if (p.location) query.whereRaw(`s.location_id = any(${PLACE_AND_INSIDE})`, [p.location])
  if (p.element !== undefined) {
    query.whereExists((e) => e.select(db.raw('1')).from('sample_components as c').whereRaw('c.sample_id = s.id').where('c.z', p.element!))
  }
  if (p.isotope) {
    query.whereExists((e) => e.select(db.raw('1')).from('sample_components as c').whereRaw('c.sample_id = s.id').where({ 'c.z': p.isotope!.z, 'c.mass_number': p.isotope!.massNumber }))
  }
  if (p.due === 'overdue') query.whereRaw('s.recertify_by <= current_date')
  else if (p.due) query.whereRaw('s.recertify_by <= current_date + ?::int', [Number(p.due)])
  if (p.hazard) {
    // a GHS code also finds its EU CLP refinements (H360 finds H360FD), not the other way round
    const codes = [p.hazard, ...Object.keys(CLP_VARIANTS).filter((v) => CLP_VARIANTS[v]!.base === p.hazard)]
    if (/^H\d/.test(p.hazard)) query.whereRaw('s.hazard_statements && ?::text[]', [codes])
    else query.whereRaw('s.hazard_kinds @> array[?]::text[]', [p.hazard])
  }
  return query
}

/** The ORDER BY of the list: the chosen column (empty values last), then the code. */
export function orderSamples(query: Knex.QueryBuilder, sort: string | undefined): Knex.QueryBuilder {
  const s = sort || DEFAULT_SAMPLE_SORT
  const desc = s.startsWith('-')
  const column = SORT_COLUMNS[s.replace(/^-/, '')] ?? 's.code'
  query.orderByRaw(`${column} ${desc ? 'desc' : 'asc'} nulls last`)
  if (column !== 's.code') query.orderBy('s.code', desc ? 'desc' : 'asc')
  return query
}

// The components of each listed sample as [z, mass number, fraction] triples; PostgreSQL
// evaluates this after the sort and LIMIT, for the rows of the page only (25 sub-plan loops).
const COMPOSITION = `(select coalesce(json_agg(json_build_array(c.z, c.mass_number, c.fraction) order by c.position), '[]') from sample_components c where c.sample_id = s.id) as composition`

export const LIST_COLUMNS = [
  's.id', 's.code', 's.name', 's.material', 's.formula', 's.form', 's.status', 's.areal_density_ug_cm2', 's.areal_density_unc_ug_cm2',
  's.thickness_nm', 's.mass_mg', 's.supplier', 's.lot', 's.received_on', 's.recertify_by', 's.hazard_kinds', 's.radioactive', 's.updated_at',
  'l.code as location_code', 'l.name as location_name',
]

export interface SampleListRow {
  id: string
  code: string
  name: string
  material: string
  formula: string | null
  form: string
  status: string
  areal_density_ug_cm2: number | null
  areal_density_unc_ug_cm2: number | null
  thickness_nm: number | null
  mass_mg: number | null
  supplier: string | null
  lot: string | null
  received_on: string | null
  recertify_by: string | null
  hazard_kinds: string[]
  radioactive: boolean
  updated_at: Date
  location_code: string | null
  location_name: string | null
  composition: [number, number | null, number][]
}

/**
 * One page of the list and the count of all matches, in one statement: the matching rows are
 * found once and counted by a window over them (two statements read the same rows twice). Only a
 * page past the end, which has no row to carry the count, asks for the count on its own.
 */
export async function samplePage(db: Knex, p: SampleListParams): Promise<{ rows: SampleListRow[]; total: number }> {
  const rows = (await orderSamples(filteredSamples(db, p).select(...LIST_COLUMNS, db.raw(COMPOSITION), db.raw('count(*) over () as total')), p.sort)
    .limit(p.pageSize)
    .offset((p.page - 1) * p.pageSize)) as (SampleListRow & { total: string })[]
  if (rows.length) return { rows, total: Number(rows[0]!.total) }
  return { rows: [], total: p.page > 1 ? await countRows(filteredSamples(db, p)) : 0 }
}

/** A list row as the API answers it. */
export function listItem(r: SampleListRow) {
  return {
    id: r.id,
    code: r.code,
    name: r.name,
    material: r.material,
    formula: r.formula,
    form: r.form,
    status: r.status,
    arealDensity: r.areal_density_ug_cm2,
    arealDensityUncertainty: r.areal_density_unc_ug_cm2,
    thickness: r.thickness_nm,
    massMg: r.mass_mg,
    supplier: r.supplier,
    lot: r.lot,
    receivedOn: r.received_on,
    recertifyBy: r.recertify_by,
    hazardKinds: r.hazard_kinds,
    radioactive: r.radioactive,
    location: r.location_code ? { code: r.location_code, name: r.location_name } : null,
    components: r.composition.map(([z, massNumber, fraction]) => ({ z, massNumber, fraction })),
    updatedAt: r.updated_at,
  }
}
