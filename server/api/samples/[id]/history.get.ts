import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// What the audit trail holds about one sample, for everyone who may read the sample: who did
// what and when, and which fields changed. The full trail (addresses, every record type) stays
// with the roles that read the audit trail.
const HIDDEN = new Set(['version', 'updatedAt', 'createdAt', 'location', 'hazardKinds', 'custody'])

// A place is shown by its path, which people read; the record keeps the id.
const placeOf = (r: Record<string, unknown>) => (r.location as { path?: string } | null)?.path ?? (r.locationId ? String(r.locationId) : null)

function changedFields(before: Record<string, unknown> | null, after: Record<string, unknown> | null) {
  if (!before || !after) return []
  return Object.keys(after)
    .filter((k) => !HIDDEN.has(k) && JSON.stringify(before[k]) !== JSON.stringify(after[k]))
    .map((field) => (field === 'locationId' ? { field, before: placeOf(before), after: placeOf(after) } : { field, before: before[field] ?? null, after: after[field] ?? null }))
}

export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const { id } = paramsValid(event, IdParam)
  const db = useDb()
  if (!(await db('samples').where({ id }).first('id'))) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such sample' })
  const rows = await db('audit_log as a')
    .leftJoin('users as u', 'u.id', 'a.actor_id')
    .where({ 'a.entity_type': 'sample', 'a.entity_id': id })
    .orderBy('a.id', 'desc')
    .limit(200)
    .select('a.id', 'a.at', 'a.action', 'a.before', 'a.after', 'u.name as actor_name', 'a.actor_email')
  return {
    items: rows.map((r) => ({
      id: Number(r.id),
      at: r.at as Date,
      action: r.action as string,
      actor: (r.actor_name ?? r.actor_email ?? null) as string | null,
      changes: changedFields(r.before as Record<string, unknown> | null, r.after as Record<string, unknown> | null),
      datasheet: r.action === 'sample.datasheet-added' ? ((r.after as { datasheet?: { fileName: string } } | null)?.datasheet?.fileName ?? null) : null,
    })),
  }
})
