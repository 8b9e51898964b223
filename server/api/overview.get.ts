// The first screen after sign-in: counts, what is due for re-certification soon, what
// changed lately and the newest certificates. Every role reads samples and species, so every signed-in person may ask.
export default defineEventHandler(async (event) => {
  requireUser(event)
  const db = useDb()
  const [byStatus, species, due, recent, certificates] = await Promise.all([
    db('samples').select('status').count({ n: '*' }).groupBy('status') as Promise<Array<{ status: string; n: string | number }>>,
    countRows(db('species')),
    db('samples')
      .whereNot('status', 'retired')
      .whereNotNull('recertify_by')
      .where('recertify_by', '<=', db.raw(`current_date + 30`))
      .orderBy('recertify_by')
      .limit(8)
      .select('id', 'code', 'name', 'recertify_by', db.raw('recertify_by < current_date as overdue')) as Promise<Array<{ id: string; code: string; name: string; recertify_by: string; overdue: boolean }>>,
    db('samples').orderBy('updated_at', 'desc').limit(6).select('id', 'code', 'name', 'status', 'updated_at'),
    db('certificates').orderBy('issued_at', 'desc').limit(5).select('id', 'number', 'version', 'status', 'subject_label', 'issued_at'),
  ])
  const counts = Object.fromEntries(byStatus.map((r) => [r.status, Number(r.n)])) as Record<string, number>
  return {
    samples: { total: Object.values(counts).reduce((a, b) => a + b, 0), byStatus: counts },
    species: { recorded: species },
    due: due.map((d) => ({ id: d.id, code: d.code, name: d.name, recertifyBy: d.recertify_by, overdue: d.overdue })),
    recent: recent.map((r) => ({ id: r.id, code: r.code, name: r.name, status: r.status, updatedAt: r.updated_at })),
    certificates: certificates.map((c) => ({ id: c.id, number: c.number, version: c.version, status: c.status, subjectLabel: c.subject_label, issuedAt: c.issued_at })),
  }
})
