import { CAN } from '#shared/auth/roles'
import { CertificateListQuery } from '#shared/schemas/certificates'

/** Escapes LIKE's wildcards so a typed % or _ matches itself. */
const like = (term: string) => `%${term.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`

// The certificate list: search by number or subject, filter by status, subject and period of
// issue (days in UTC, both ends included), sort and page.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readCertificates)
  const q = queryValid(event, CertificateListQuery)
  const db = useDb()
  const filtered = () => {
    const query = certificatesQuery(db)
    for (const term of (q.q ?? '').split(/\s+/).filter(Boolean).slice(0, 6)) {
      query.where((w) => w.whereRaw(`lower(c.number) like ? escape '\\'`, [like(term)]).orWhereRaw(`lower(c.subject_label) like ? escape '\\'`, [like(term)]))
    }
    if (q.status) query.where('c.status', q.status)
    if (q.subjectType) query.where('c.subject_type', q.subjectType)
    if (q.subjectId) query.where('c.subject_id', q.subjectId)
    if (q.from) query.whereRaw(`c.issued_at >= (?::date)::timestamp at time zone 'UTC'`, [q.from])
    if (q.to) query.whereRaw(`c.issued_at < (?::date + 1)::timestamp at time zone 'UTC'`, [q.to])
    return query
  }
  const [rows, total] = await Promise.all([
    orderCertificates(filtered().select(...CERTIFICATE_LIST_COLUMNS), q.sort).limit(q.pageSize).offset((q.page - 1) * q.pageSize),
    countRows(filtered()),
  ])
  return { items: (rows as CertificateListRow[]).map((r) => certificateOut(r)), total, page: q.page, pageSize: q.pageSize }
})
