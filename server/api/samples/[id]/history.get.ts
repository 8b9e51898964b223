import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'
import { describeChanges } from '#shared/audit/changes'

// What the audit trail holds about one sample, for everyone who may read the sample: who did
// what and when, and which fields changed ("field: old → new", shared/audit/changes.ts). The full
// trail (addresses, every record type) stays with the roles that read the audit trail.
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
      changes: r.action === 'sample.created' || r.action === 'sample.imported' || r.action === 'sample.seeded' ? [] : describeChanges(r.before, r.after).filter((l) => l.field !== 'code' && l.field !== 'datasheet'),
      datasheet: r.action === 'sample.datasheet-added' ? ((r.after as { datasheet?: { fileName: string } } | null)?.datasheet?.fileName ?? null) : null,
    })),
  }
})
