import type { Knex } from 'knex'
import type { H3Event } from 'h3'
import type { SampleComponentRow, SampleRow } from '#shared/types/db'
import type { SampleData } from '#shared/schemas/samples'
import { analysesOf, insertComponents } from './sample-columns'

export type SampleRecord = ReturnType<typeof sampleRecord>

/** Where a sample is kept: the place and the chain of places around it ("B2-114 › C3 › S2"). */
export interface PlaceRef {
  id: string
  parentId: string | null
  code: string
  name: string
  kind: string
  path: string
}

/** Every place with its full path, by id. Few enough rows to read whole. */
export async function placesById(db: Knex | Knex.Transaction): Promise<Map<string, PlaceRef>> {
  const rows = await db('locations').select('id', 'parent_id', 'kind', 'code', 'name')
  const byId = new Map(rows.map((r) => [r.id, r]))
  const pathOf = (id: string, depth = 0): string => {
    const r = byId.get(id)!
    return r.parent_id && depth < 10 && byId.has(r.parent_id) ? `${pathOf(r.parent_id, depth + 1)} › ${r.code}` : r.code
  }
  return new Map(rows.map((r) => [r.id, { id: r.id, parentId: r.parent_id, code: r.code, name: r.name, kind: r.kind, path: pathOf(r.id) }]))
}

type AnalysisOut = { massNumber: number; percent: number; uncertainty: number | null }[]

function componentOut(c: SampleComponentRow, analyses: Map<number, AnalysisOut>) {
  return {
    z: c.z,
    massNumber: c.mass_number,
    fraction: c.fraction,
    basis: c.fraction_basis,
    enrichmentPercent: c.enrichment_pct,
    fractionUncertainty: c.fraction_unc,
    enrichmentUncertainty: c.enrichment_unc_pct,
    analysis: analyses.get(Number(c.id)) ?? null,
  }
}

/** A sample as the API answers it (and as the audit trail records it). */
export function sampleRecord(row: SampleRow, components: SampleComponentRow[], place: PlaceRef | null, analyses: Map<number, AnalysisOut> = new Map()) {
  return {
    id: row.id,
    code: row.code,
    name: row.name,
    material: row.material,
    formula: row.formula,
    form: row.form,
    status: row.status,
    arealDensity: row.areal_density_ug_cm2,
    arealDensityUncertainty: row.areal_density_unc_ug_cm2,
    thickness: row.thickness_nm,
    bulkDensity: row.bulk_density_g_cm3,
    massMg: row.mass_mg,
    backing: row.backing,
    supplier: row.supplier,
    lot: row.lot,
    receivedOn: row.received_on,
    recertifyBy: row.recertify_by,
    locationId: row.location_id,
    location: place,
    hazardStatements: row.hazard_statements,
    hazardKinds: row.hazard_kinds,
    radioactive: row.radioactive,
    nuclide: row.nuclide,
    activityBq: row.activity_bq,
    activityReferenceDate: row.activity_reference_on,
    notes: row.notes,
    components: [...components].sort((a, b) => a.position - b.position).map((c) => componentOut(c, analyses)),
    version: row.version,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    retiredAt: row.retired_at,
  }
}

/** The editable fields of a stored sample, in the shape the sample form and SampleBody use. */
export function sampleInputOf(r: SampleRecord) {
  const { id, code, location, hazardKinds: _kinds, version, createdAt, updatedAt, retiredAt, ...fields } = r
  return fields
}

/** The sample with this id and everything the record shows, or null. `lock` holds it for update. */
export async function findSample(db: Knex | Knex.Transaction, id: string, opts: { lock?: boolean; places?: Map<string, PlaceRef> } = {}): Promise<SampleRecord | null> {
  const q = db('samples').where({ id }).first()
  const row = await (opts.lock ? q.forUpdate() : q)
  if (!row) return null
  const components = await db('sample_components').where({ sample_id: id })
  const analyses = await analysesOf(db, components.map((c) => Number(c.id)))
  const places = opts.places ?? (await placesById(db))
  return sampleRecord(row, components, row.location_id ? (places.get(row.location_id) ?? null) : null, analyses)
}

/** Like findSample, but a missing sample is a 404. */
export async function requireSample(db: Knex | Knex.Transaction, id: string, opts: { lock?: boolean } = {}): Promise<SampleRecord> {
  const found = await findSample(db, id, opts)
  if (!found) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such sample' })
  return found
}

/** Replaces a sample's components with `s.components`, in order. */
export async function writeComponents(trx: Knex.Transaction, sampleId: string, s: SampleData): Promise<void> {
  await trx('sample_components').where({ sample_id: sampleId }).delete()
  await insertComponents(trx, sampleId, s)
}

/** A 400 in the shape readValid gives, for a rule checked against the database. */
export function invalidField(path: string, message: string): never {
  throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [{ path, message }] } })
}

/** Checks that a chosen storage place exists. */
export async function assertPlace(db: Knex | Knex.Transaction, locationId: string | null): Promise<void> {
  if (locationId && !(await db('locations').where({ id: locationId }).first())) invalidField('locationId', 'Choose a storage place from the list')
}

/** Inserts one validated sample with its components and its audit row; answers the record. */
export async function insertSample(
  trx: Knex.Transaction,
  event: H3Event | null,
  s: SampleData,
  actorId: string,
  opts: { action?: string; extra?: Record<string, unknown>; places?: Map<string, PlaceRef> } = {},
): Promise<SampleRecord> {
  const [row] = await trx('samples').insert({ ...sampleColumns(s), created_by: actorId, updated_by: actorId }).returning('id')
  await writeComponents(trx, row!.id, s)
  const record = (await findSample(trx, row!.id, { places: opts.places }))!
  await writeAudit(trx, event, { action: opts.action ?? 'sample.created', entityType: 'sample', entityId: record.id, after: { ...record, ...opts.extra } })
  return record
}
