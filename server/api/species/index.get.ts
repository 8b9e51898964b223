import { GUARDED_CSV } from '#shared/csv/safe'
import { stringify } from 'csv-stringify/sync'
import { CAN } from '#shared/auth/roles'
import { SpeciesListQuery } from '#shared/schemas/species'
import { getElement } from '#shared/physics'

const SORTS: Record<string, string[]> = { label: ['z', 'charge'], z: ['z', 'charge'], charge: ['charge', 'z'], isoelectronic: ['isoelectronic', 'z'], recorded: ['created_at'] }

export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.lookUpSpecies)
  const query = queryValid(event, SpeciesListQuery)
  const db = useDb()
  const element = query.element ? (getElement(/^\d+$/.test(query.element) ? Number(query.element) : query.element) ?? null) : undefined
  if (element === null) throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [{ path: 'element', message: 'Give an element symbol (Fe) or number (26)' }] } })

  const filtered = () =>
    db('species').where((w) => {
      if (query.q) w.where((s) => s.whereILike('label', `%${query.q}%`).orWhereILike('spectroscopic', `%${query.q}%`).orWhereILike('element_name', `%${query.q}%`))
      if (element) w.where('z', element.z)
      if (query.chargeMin !== undefined) w.where('charge', '>=', query.chargeMin)
      if (query.chargeMax !== undefined) w.where('charge', '<=', query.chargeMax)
      if (query.isoelectronic) w.whereILike('isoelectronic', query.isoelectronic.endsWith('-like') ? query.isoelectronic : `${query.isoelectronic}-like`)
      if (query.hasSample) {
        const linked = db('sample_species').whereRaw('sample_species.species_id = species.id')
        if (query.hasSample === 'yes') w.whereExists(linked)
        else w.whereNotExists(linked)
      }
    })

  const desc = query.sort?.startsWith('-')
  const columns = SORTS[(query.sort ?? 'label').replace(/^-/, '')] ?? SORTS.label!
  const ordered = () => {
    const q = filtered()
    for (const c of columns) q.orderBy(c, desc ? 'desc' : 'asc')
    return q.orderBy('mass_number', 'asc', 'first').orderBy('id')
  }
  const withCounts = (q: ReturnType<typeof ordered>) =>
    q.select('species.*', db.raw('(select count(*)::int from sample_species where sample_species.species_id = species.id) as samples'), db.raw('(select max(engine_version) from species_results r where r.species_id = species.id) as engine'))

  if (query.format === 'csv') {
    const rows = await withCounts(ordered().limit(20_000))
    setResponseHeader(event, 'Content-Type', 'text/csv; charset=utf-8')
    setResponseHeader(event, 'Content-Disposition', 'attachment; filename="ionfolio-species.csv"')
    return stringify(
      rows.map((r: any) => [r.label, r.spectroscopic, r.z, r.charge, r.mass_number ?? '', r.isoelectronic ?? '', r.samples, r.engine ?? '', new Date(r.created_at).toISOString()]),
      { ...GUARDED_CSV, header: true, columns: ['species', 'spectroscopic', 'z', 'charge', 'mass_number', 'isoelectronic', 'samples', 'engine', 'recorded_at'] },
    )
  }

  const total = await countRows(filtered())
  const rows = await withCounts(ordered().limit(query.pageSize).offset((query.page - 1) * query.pageSize))
  return {
    items: rows.map((r: any) => ({ ...speciesOut(r), samples: Number(r.samples), engine: r.engine as string | null })),
    total,
    page: query.page,
    pageSize: query.pageSize,
  }
})
