import type { H3Event } from 'h3'
import type { Knex } from 'knex'

export interface AuditEntry {
  action: string
  entityType: string
  entityId?: string | number | null
  before?: unknown
  after?: unknown
}

/**
 * Appends one row to the audit trail inside the caller's transaction, so the record and the
 * change it describes are committed (or rolled back) together.
 */
export async function writeAudit(trx: Knex | Knex.Transaction, event: H3Event | null, entry: AuditEntry, actor?: { id: string | null; email: string | null } | null): Promise<void> {
  const who = actor ?? (event?.context.user ? { id: event.context.user.id, email: event.context.user.email } : null)
  await trx('audit_log').insert({
    actor_id: who?.id ?? null,
    actor_email: who?.email ?? null,
    action: entry.action,
    entity_type: entry.entityType,
    entity_id: entry.entityId == null ? null : String(entry.entityId),
    before: entry.before === undefined ? null : JSON.stringify(entry.before),
    after: entry.after === undefined ? null : JSON.stringify(entry.after),
    address: event ? clientAddress(event) : null,
  })
}
