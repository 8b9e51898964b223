import { GUARDED_CSV } from '#shared/csv/safe'
import { stringify } from 'csv-stringify/sync'
import { CAN } from '#shared/auth/roles'
import { SampleListQuery } from '#shared/schemas/samples'
import { CSV_COLUMNS, formatComposition } from '#shared/samples/csv'
import type { ComponentBody } from '#shared/schemas/samples'
import type { SampleRow } from '#shared/types/db'

type ExportRow = SampleRow & { location_code: string | null; composition: ComponentBody[] }

// An export holds at most this many rows; the whole stock of a lab is far below it.
const CSV_LIMIT = 100_000

const FULL_COMPOSITION = `(select coalesce(json_agg(json_build_object('z', c.z, 'massNumber', c.mass_number, 'fraction', c.fraction, 'basis', c.fraction_basis,
  'enrichmentPercent', c.enrichment_pct, 'fractionUncertainty', c.fraction_unc, 'enrichmentUncertainty', c.enrichment_unc_pct) order by c.position), '[]')
  from sample_components c where c.sample_id = s.id) as composition`

export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const query = queryValid(event, SampleListQuery)
  const db = useDb()

  if (query.format === 'csv') {
    const rows = (await orderSamples(filteredSamples(db, query).select('s.*', 'l.code as location_code', db.raw(FULL_COMPOSITION)), query.sort).limit(CSV_LIMIT)) as ExportRow[]
    const csv = stringify(
      rows.map((r) => {
        const values: Record<(typeof CSV_COLUMNS)[number], unknown> = {
          code: r.code, name: r.name, material: r.material, formula: r.formula, form: r.form, status: r.status,
          areal_density_ug_cm2: r.areal_density_ug_cm2, areal_density_unc_ug_cm2: r.areal_density_unc_ug_cm2, thickness_nm: r.thickness_nm,
          bulk_density_g_cm3: r.bulk_density_g_cm3, mass_mg: r.mass_mg, backing: r.backing, supplier: r.supplier, lot: r.lot,
          received_on: r.received_on, recertify_by: r.recertify_by, location: r.location_code, hazard_statements: r.hazard_statements.join(' '),
          radioactive: r.radioactive ? 'yes' : 'no', nuclide: r.nuclide, activity_bq: r.activity_bq, composition: formatComposition(r.composition),
          fraction_basis: r.composition[0]?.basis ?? '', notes: r.notes,
        }
        return CSV_COLUMNS.map((c) => values[c] ?? '')
      }),
      { ...GUARDED_CSV, header: true, columns: [...CSV_COLUMNS] },
    )
    setResponseHeader(event, 'Content-Type', 'text/csv; charset=utf-8')
    setResponseHeader(event, 'Content-Disposition', 'attachment; filename="ionfolio-samples.csv"')
    return csv
  }

  const { rows, total } = await samplePage(db, query)
  return { items: rows.map(listItem), total, page: query.page, pageSize: query.pageSize }
})
