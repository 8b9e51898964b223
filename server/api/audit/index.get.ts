import { stringify } from 'csv-stringify/sync'
import { CAN } from '#shared/auth/roles'
import { AuditQuery as Query } from '#shared/schemas/audit'


const CSV_LIMIT = 100_000

export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readAudit)
  const query = queryValid(event, Query)

  const db = useDb()
  const filtered = () => db('audit_log').where((b) => {
    if (query.action) b.where('action', query.action)
    if (query.entityType) b.where('entity_type', query.entityType)
    if (query.entityId) b.where('entity_id', query.entityId)
    if (query.actor) b.whereILike('actor_email', `%${query.actor}%`)
    if (query.from) b.where('at', '>=', query.from)
    if (query.to) b.where('at', '<', db.raw(`?::date + 1`, [query.to]))
    if (query.q) b.where((w) => w.whereILike('action', `%${query.q}%`).orWhereILike('actor_email', `%${query.q}%`).orWhereILike('entity_id', `%${query.q}%`))
  })
  const order = query.sort === 'at' ? 'asc' : 'desc'

  if (query.format === 'csv') {
    const rows = await filtered().select('*').orderBy('id', order).limit(CSV_LIMIT)
    const csv = stringify(
      rows.map((r) => [r.id, new Date(r.at).toISOString(), r.actor_email ?? '', r.action, r.entity_type, r.entity_id ?? '', r.before ? JSON.stringify(r.before) : '', r.after ? JSON.stringify(r.after) : '', r.address ?? '']),
      { header: true, columns: ['id', 'at', 'actor', 'action', 'entity_type', 'entity_id', 'before', 'after', 'address'] },
    )
    setResponseHeader(event, 'Content-Type', 'text/csv; charset=utf-8')
    setResponseHeader(event, 'Content-Disposition', 'attachment; filename="ionfolio-audit.csv"')
    await writeAudit(db, event, { action: 'audit.exported', entityType: 'audit_log', after: { rows: rows.length } })
    return csv
  }

  const total = await countRows(filtered())
  const rows = await filtered().select('*').orderBy('id', order).limit(query.pageSize).offset((query.page - 1) * query.pageSize)
  return {
    items: rows.map((r) => ({ id: Number(r.id), at: r.at, actor: r.actor_email, action: r.action, entityType: r.entity_type, entityId: r.entity_id, before: r.before, after: r.after, address: r.address })),
    total,
    page: query.page,
    pageSize: query.pageSize,
  }
})
