import type { Knex } from 'knex'
import { CERTIFICATE_SORTS } from '#shared/schemas/certificates'
import type { CertificateRow } from '#shared/types/db'

export type CertificateListRow = CertificateRow & { issuer_name: string | null; revoker_name: string | null; supersedes_number: string | null; superseded_by_number: string | null }

/** Certificates with the names and numbers around them, for lists and the certificate page. */
export function certificatesQuery(db: Knex) {
  return db('certificates as c')
    .leftJoin('users as iu', 'iu.id', 'c.issued_by')
    .leftJoin('users as ru', 'ru.id', 'c.revoked_by')
    .leftJoin('certificates as prev', 'prev.id', 'c.supersedes_id')
    .leftJoin('certificates as next', 'next.id', 'c.superseded_by')
}

export const CERTIFICATE_LIST_COLUMNS = [
  'c.id', 'c.number', 'c.subject_type', 'c.subject_id', 'c.subject_label', 'c.version', 'c.status', 'c.sha256', 'c.pdf_sha256', 'c.pdf_bytes',
  'c.issued_at', 'c.valid_until', 'c.supersedes_id', 'c.correction_reason', 'c.superseded_by', 'c.superseded_at', 'c.revoked_at', 'c.revoke_reason',
  'iu.name as issuer_name', 'ru.name as revoker_name', 'prev.number as supersedes_number', 'next.number as superseded_by_number',
]

const SORT_COLUMNS: Record<(typeof CERTIFICATE_SORTS)[number], string> = {
  number: 'c.number',
  issuedAt: 'c.issued_at',
  status: 'c.status',
  subject: 'c.subject_label',
  version: 'c.version',
  validUntil: 'c.valid_until',
}

/** ORDER BY for the list: the chosen column, then newest first. */
export function orderCertificates(q: Knex.QueryBuilder, sort: string | undefined) {
  const s = sort || '-issuedAt'
  const desc = s.startsWith('-')
  const column = SORT_COLUMNS[s.replace(/^-/, '') as keyof typeof SORT_COLUMNS] ?? 'c.issued_at'
  q.orderByRaw(`${column} ${desc ? 'desc' : 'asc'} nulls last`)
  if (column !== 'c.issued_at') q.orderBy('c.issued_at', 'desc')
  return q.orderBy('c.number', 'desc')
}

/** A certificate as the API answers it (the frozen payload only where asked for). */
export function certificateOut(r: CertificateListRow, withPayload = false) {
  const { url } = verifyLinks(r.number, r.sha256)
  return {
    id: r.id,
    number: r.number,
    version: r.version,
    status: r.status,
    subjectType: r.subject_type,
    subjectId: r.subject_id,
    subjectLabel: r.subject_label,
    sha256: r.sha256,
    pdfSha256: r.pdf_sha256,
    pdfBytes: r.pdf_bytes,
    issuedAt: r.issued_at,
    issuedBy: r.issuer_name,
    validUntil: r.valid_until,
    supersedes: r.supersedes_id ? { id: r.supersedes_id, number: r.supersedes_number } : null,
    correctionReason: r.correction_reason,
    supersededBy: r.superseded_by ? { id: r.superseded_by, number: r.superseded_by_number } : null,
    supersededAt: r.superseded_at,
    revokedAt: r.revoked_at,
    revokedBy: r.revoker_name,
    revokeReason: r.revoke_reason,
    verifyUrl: url,
    ...(withPayload ? { payload: r.payload } : {}),
  }
}

/** One certificate in the API shape, with its payload, or a 404. */
export async function requireCertificate(db: Knex | Knex.Transaction, id: string) {
  const row = (await certificatesQuery(db as Knex).where('c.id', id).first('c.*', 'iu.name as issuer_name', 'ru.name as revoker_name', 'prev.number as supersedes_number', 'next.number as superseded_by_number')) as CertificateListRow | undefined
  if (!row) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such certificate' })
  return row
}
