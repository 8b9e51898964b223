import { CAN } from '#shared/auth/roles'
import { AuditQuery } from '#shared/schemas/audit'
import { auditSentence, subjectText } from '#shared/audit/actions'
import { changeText, describeChanges } from '#shared/audit/changes'
import { AuditChainWriter } from '#shared/audit/chain'

const CSV_LIMIT = 100_000

// The audit trail for auditors and managers: rows name their records by code and name, changes
// read as "field: old → new", and the CSV carries a running hash chain (shared/audit/chain.ts).
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readAudit)
  const query = queryValid(event, AuditQuery)

  const db = useDb()
  const order = query.sort === 'at' ? 'asc' : 'desc'

  if (query.format === 'csv') {
    const rows = await auditRows(db, query).select(AUDIT_COLUMNS).orderBy('a.id', order).limit(CSV_LIMIT)
    const chain = new AuditChainWriter()
    const parts = [chain.header()]
    for (const r of rows) {
      const subject = subjectOf(r)
      const actor = r.actor_name ? `${r.actor_name} <${r.actor_email ?? ''}>` : (r.actor_email ?? '')
      parts.push(await chain.add([String(r.id), new Date(r.at).toISOString(), actor, r.action, r.entity_type, r.entity_id ?? '', subject ? subjectText(subject) : '', changeText(r.before, r.after), r.address ?? '']))
    }
    parts.push(await chain.end())
    await writeAudit(db, event, { action: 'audit.exported', entityType: 'audit_log', after: { rows: rows.length, lastHash: chain.lastHash } })
    setResponseHeader(event, 'Content-Type', 'text/csv; charset=utf-8')
    setResponseHeader(event, 'Content-Disposition', 'attachment; filename="ionfolio-audit.csv"')
    setResponseHeader(event, 'X-Audit-Chain-Head', chain.lastHash)
    return parts.join('')
  }

  const total = await countRows(auditRows(db, query))
  const rows = await auditRows(db, query).select(AUDIT_COLUMNS).orderBy('a.id', order).limit(query.pageSize).offset((query.page - 1) * query.pageSize)
  return {
    items: rows.map((r) => {
      const subject = subjectOf(r)
      const actorName = (r.actor_name ?? r.actor_email ?? null) as string | null
      return {
        id: Number(r.id),
        at: r.at as Date,
        actor: r.actor_email as string | null,
        actorName,
        action: r.action as string,
        sentence: auditSentence({ actorName, action: r.action, subject }),
        subject,
        changes: describeChanges(r.before, r.after),
        entityType: r.entity_type as string,
        entityId: r.entity_id as string | null,
        before: r.before as unknown,
        after: r.after as unknown,
        address: r.address as string | null,
      }
    }),
    total,
    page: query.page,
    pageSize: query.pageSize,
  }
})
