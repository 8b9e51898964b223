import { GUARDED_CSV } from '#shared/csv/safe'
import { stringify } from 'csv-stringify/sync'
import { speciesCsvPhysics } from '#shared/physics/csv-physics'
import { CAN } from '#shared/auth/roles'
import { SpeciesListQuery } from '#shared/schemas/species'
import { getElement, parseSpecies } from '#shared/physics'

const SORTS: Record<string, string[]> = { label: ['z', 'charge'], z: ['z', 'charge'], charge: ['charge', 'z'], isoelectronic: ['isoelectronic', 'z'], recorded: ['created_at'] }

export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.lookUpSpecies)
  const query = queryValid(event, SpeciesListQuery)
  const db = useDb()
  const element = query.element ? (getElement(/^\d+$/.test(query.element) ? Number(query.element) : query.element) ?? null) : undefined
  if (element === null) throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [{ path: 'element', message: 'Give an element symbol (Fe) or number (26)' }] } })

  // a search that reads as a species in any notation ('Ca-48 10+', 'Ca48 XI') also finds that species
  let named: { z: number; charge: number; massNumber: number | null } | null = null
  try {
    if (query.q) named = parseSpecies(query.q)
  } catch {
    named = null
  }
  const filtered = () =>
    db('species').where((w) => {
      if (query.q) {
        w.where((s) => {
          s.whereILike('label', `%${query.q}%`).orWhereILike('spectroscopic', `%${query.q}%`).orWhereILike('element_name', `%${query.q}%`)
          if (named) s.orWhere((x) => x.where({ z: named!.z, charge: named!.charge }).whereRaw('coalesce(mass_number, 0) = ?', [named!.massNumber ?? 0]))
        })
      }
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
    // The physics of the newest recorded result travels with each row: configuration, term,
    // the reference energy and its source, and the engine's best estimate with its method.
    const newest = db.raw(`(select r.result from species_results r where r.species_id = species.id order by r.recorded_at desc limit 1) as record`)
    const rows = await withCounts(ordered().limit(20_000)).select(newest)
    setResponseHeader(event, 'Content-Type', 'text/csv; charset=utf-8')
    setResponseHeader(event, 'Content-Disposition', 'attachment; filename="ionfolio-species.csv"')
    return stringify(
      rows.map((r: any) => {
        const p = speciesCsvPhysics(r.record)
        return [r.label, r.spectroscopic, r.z, r.charge, r.mass_number ?? '', r.isoelectronic ?? '', p.configuration, p.term, p.referenceEv, p.referenceUncertaintyEv, p.referenceSource, p.bestEv, p.bestMethod, r.samples, r.engine ?? '', new Date(r.created_at).toISOString()]
      }),
      { ...GUARDED_CSV, header: true, columns: ['species', 'spectroscopic', 'z', 'charge', 'mass_number', 'isoelectronic', 'configuration', 'term', 'reference_eV', 'reference_uncertainty_eV', 'reference_source', 'best_estimate_eV', 'best_estimate_method', 'samples', 'engine', 'recorded_at'] },
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
