import type { Knex } from 'knex'
import type { AuditQueryInput } from '#shared/schemas/audit'
import { ACTION_KINDS, SIGN_IN_PREFIX, type AuditSubject } from '#shared/audit/actions'

const like = (s: string) => `%${s.replace(/[\\%_]/g, (c) => `\\${c}`)}%`

/**
 * The audit rows a query asks for, each joined to the record it names (sample code and name,
 * certificate number, species label, person) so rows can be read and searched by those names.
 * Sign-ins are left out unless asked for (signIns, the sign-ins kind, or an auth.* action).
 */
export function auditRows(db: Knex, q: AuditQueryInput) {
  const base = db('audit_log as a')
    .leftJoin('users as u', 'u.id', 'a.actor_id')
    .leftJoin('samples as s', (j) => j.on('a.entity_type', db.raw('?', ['sample'])).andOn(db.raw('s.id::text = a.entity_id')))
    .leftJoin('certificates as c', (j) => j.on('a.entity_type', db.raw('?', ['certificate'])).andOn(db.raw('c.id::text = a.entity_id')))
    .leftJoin('species as sp', (j) => j.on('a.entity_type', db.raw('?', ['species'])).andOn(db.raw('sp.id::text = a.entity_id')))
    .leftJoin('users as tu', (j) => j.on('a.entity_type', db.raw('?', ['user'])).andOn('tu.id', 'a.entity_id'))
    .leftJoin('invitations as inv', (j) => j.on('a.entity_type', db.raw('?', ['invitation'])).andOn(db.raw('inv.id::text = a.entity_id')))
    .leftJoin('locations as l', (j) => j.on('a.entity_type', db.raw('?', ['location'])).andOn(db.raw('l.id::text = a.entity_id')))

  return base.where((b) => {
    if (q.action) b.where('a.action', q.action)
    if (q.kind) b.where((w) => ACTION_KINDS[q.kind as keyof typeof ACTION_KINDS].prefixes.forEach((p) => w.orWhereLike('a.action', `${p}%`)))
    const asked = q.signIns || q.kind === 'sign-ins' || (q.action ?? '').startsWith(SIGN_IN_PREFIX)
    if (!asked) b.whereNot('a.action', 'like', `${SIGN_IN_PREFIX}%`)
    if (q.entityType) b.where('a.entity_type', q.entityType)
    if (q.entityId) b.where('a.entity_id', q.entityId)
    if (q.record) whereRecord(db, b, q.record)
    if (q.actor) b.where((w) => w.whereILike('u.name', like(q.actor!)).orWhereILike('a.actor_email', like(q.actor!)))
    if (q.from) b.where('a.at', '>=', q.from)
    if (q.to) b.where('a.at', '<', db.raw(`?::date + 1`, [q.to]))
    if (q.q) {
      const t = like(q.q)
      b.where((w) =>
        w.whereILike('a.action', t).orWhereILike('a.actor_email', t).orWhereILike('u.name', t).orWhereILike('a.entity_id', t)
          .orWhereILike('s.code', t).orWhereILike('s.name', t).orWhereILike('c.number', t).orWhereILike('c.subject_label', t)
          .orWhereILike('sp.label', t).orWhereILike('tu.name', t).orWhereILike('tu.email', t).orWhereILike('inv.email', t).orWhereILike('inv.name', t)
          .orWhereILike('l.code', t).orWhereILike('l.name', t)
          .orWhereRaw(`a.after->>'sample' ilike ?`, [t]).orWhereRaw(`a.before->>'sample' ilike ?`, [t]).orWhereRaw(`a.after->>'code' ilike ?`, [t]),
      )
    }
  })
}

// A sample's whole story: its own rows, its certificates' rows, the species linked to it and the
// import that brought it in. Other records: their own rows.
function whereRecord(db: Knex, b: Knex.QueryBuilder, record: string) {
  const [type, id] = record.split(':') as [string, string]
  if (type !== 'sample') {
    b.where({ 'a.entity_type': type, 'a.entity_id': id })
    return
  }
  const code = db('samples').whereRaw('id::text = ?', [id]).select('code')
  b.where((w) =>
    w.where({ 'a.entity_type': 'sample', 'a.entity_id': id })
      .orWhere((c) => c.where('a.entity_type', 'certificate').whereIn('a.entity_id', db('certificates').where('subject_type', 'sample').whereRaw('subject_id::text = ?', [id]).select(db.raw('id::text'))))
      .orWhere((c) => c.where('a.entity_type', 'species').where((x) => x.whereRaw(`a.after->>'sample' = (?)`, [code]).orWhereRaw(`a.before->>'sample' = (?)`, [code])))
      .orWhere((c) => c.where('a.action', 'sample.import-finished').whereRaw(`a.after->'codes' @> to_jsonb((?)::text)`, [code])),
  )
}

/** The columns auditRows' rows carry. */
export const AUDIT_COLUMNS = [
  'a.id', 'a.at', 'a.actor_id', 'a.actor_email', 'a.action', 'a.entity_type', 'a.entity_id', 'a.before', 'a.after', 'a.address',
  'u.name as actor_name', 's.code as s_code', 's.name as s_name', 'c.number as c_number', 'c.subject_label as c_label',
  'sp.label as sp_label', 'tu.name as tu_name', 'tu.email as tu_email', 'inv.name as inv_name', 'inv.email as inv_email', 'l.code as l_code', 'l.name as l_name',
]

type Joined = Record<string, unknown> & { entity_type: string; entity_id: string | null; after: any; before: any }

/** The record a row names, by code and name, with the page that shows it. */
export function subjectOf(r: Joined): AuditSubject | null {
  const id = r.entity_id
  const s = (code: unknown, name: unknown, href: string | null): AuditSubject => ({ type: r.entity_type, id, code: (code as string) ?? null, name: (name as string) ?? null, href })
  switch (r.entity_type) {
    case 'sample': return s(r.s_code ?? r.after?.code ?? r.before?.code, r.s_name ?? r.after?.name ?? r.before?.name, id ? `/samples/${id}` : null)
    case 'certificate': return s(r.c_number ?? r.after?.number, r.c_label, id ? `/certificates/${id}` : null)
    case 'species': return s(r.sp_label ?? r.after?.label ?? r.after?.species ?? r.before?.species, null, id ? `/species/${id}` : null)
    case 'user': return s(r.tu_name ?? r.after?.name ?? r.after?.email, r.tu_email ?? r.after?.email ?? null, r.tu_email ? `/people?q=${encodeURIComponent(String(r.tu_email))}` : null)
    case 'invitation': return s(r.inv_name ?? r.after?.name, r.inv_email ?? r.after?.email, '/people')
    case 'location': return s(r.l_code ?? r.after?.code, r.l_name ?? r.after?.name, '/samples/places')
    case 'beam_plan': return s(r.after?.ion, r.after?.title, id ? `/beam/plans/${id}` : null)
    default: return id ? s(null, null, null) : null
  }
}
