import { stringify } from 'csv-stringify/sync'
import { GUARDED_CSV } from '#shared/csv/safe'
import { CAN } from '#shared/auth/roles'
import { getElement } from '#shared/physics'
import { BeamPlanListQuery } from '#shared/schemas/beam'

const SORTS: Record<string, string> = { created: 'p.created_at', ion: 'p.z', energy: 'p.energy_mev_u', title: 'p.title' }

// Saved plans: search (title, ion, medium, note), filter by element or by a sample they use
// (as stripper or as source), page, or export as CSV.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readBeamPlans)
  const query = queryValid(event, BeamPlanListQuery)
  const element = query.element ? (getElement(/^\d+$/.test(query.element) ? Number(query.element) : query.element) ?? null) : undefined
  if (element === null) throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [{ path: 'element', message: 'Give an element symbol (Pb) or number (82)' }] } })
  const db = useDb()
  const filtered = () =>
    db('beam_plans as p').where((w) => {
      if (query.q) w.where((s) => s.whereILike('p.title', `%${query.q}%`).orWhereILike('p.ion_label', `%${query.q}%`).orWhereILike('p.medium', `%${query.q}%`).orWhereILike('p.note', `%${query.q}%`))
      if (element) w.where('p.z', element.z)
      if (query.sampleId) w.where((s) => s.where('p.stripper_sample_id', query.sampleId!).orWhere('p.source_sample_id', query.sampleId!))
    })
  const desc = (query.sort ?? '-created').startsWith('-')
  const column = SORTS[(query.sort ?? '-created').replace(/^-/, '')] ?? SORTS.created!
  const rows = () =>
    filtered()
      .leftJoin('users as u', 'u.id', 'p.created_by')
      .leftJoin('samples as st', 'st.id', 'p.stripper_sample_id')
      .leftJoin('samples as so', 'so.id', 'p.source_sample_id')
      .orderBy(column, desc ? 'desc' : 'asc')
      .orderBy('p.id')
      .select('p.*', 'u.name as created_by_name', 'st.code as stripper_code', 'so.code as source_code')

  if (query.format === 'csv') {
    const all = (await rows().limit(20_000)).map(planOut)
    setResponseHeader(event, 'Content-Type', 'text/csv; charset=utf-8')
    setResponseHeader(event, 'Content-Disposition', 'attachment; filename="ionfolio-beam-plans.csv"')
    return stringify(
      all.map((p) => [p.title, p.ion, p.energyMeVPerU, p.medium, p.chargeState ?? '', p.chargeFraction ?? '', p.rigidityTm ?? '', p.stripperSample?.code ?? '', p.sourceSample?.code ?? '', p.engine, p.createdBy ?? '', new Date(p.createdAt).toISOString()]),
      { ...GUARDED_CSV, header: true, columns: ['title', 'ion', 'energy_mev_u', 'medium', 'charge_state', 'charge_fraction', 'rigidity_tm', 'stripper_sample', 'source_sample', 'engine', 'created_by', 'created_at'] },
    )
  }
  const total = await countRows(filtered())
  const page = await rows().limit(query.pageSize).offset((query.page - 1) * query.pageSize)
  return { items: page.map(planOut), total, page: query.page, pageSize: query.pageSize }
})
