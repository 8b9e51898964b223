import type { NoticeRow } from '#shared/types/db'

type Kind = NoticeRow['kind']

/** How far ahead the re-certification notice looks. */
export const RECERTIFY_NOTICE_DAYS = 30

/**
 * Sends one mail for the notices (kind, keys) not sent before, and records them, in one
 * transaction: the first app instance to insert a key sends the mail; another instance's insert
 * waits on that row and then finds it taken. A mail that fails rolls its records back, so the
 * next run tries again. Answers the keys this call sent.
 */
export async function sendOnce(kind: Kind, keys: string[], to: string[], build: (sent: string[]) => { subject: string; text: string; html: string }): Promise<string[]> {
  if (!keys.length || !to.length) return []
  return useDb().transaction(async (trx) => {
    const probe = build(keys)
    const claimed = await trx('notices')
      .insert(keys.map((key) => ({ kind, key, recipients: to, subject: probe.subject })))
      .onConflict(['kind', 'key'])
      .ignore()
      .returning('key')
    const sent = claimed.map((r) => r.key)
    if (!sent.length) return []
    await sendMail({ to, ...build(sent) })
    return sent
  })
}

async function activeEmails(role: 'auditor' | 'manager'): Promise<string[]> {
  const rows = await useDb()('users').where({ role, active: true }).orderBy('email').select('email')
  return rows.map((r) => r.email)
}

/** The certificate-issued notice to every active auditor; a mail failure is logged, never thrown (the daily task retries). */
export async function notifyCertificateIssued(id: string): Promise<void> {
  try {
    const c = await requireCertificate(useDb(), id)
    const mail = certificateIssuedMail({ id, number: c.number, version: c.version, subjectLabel: c.subject_label, issuedBy: c.issuer_name ?? 'A lab manager', supersedes: c.supersedes_number, sha256: c.sha256 })
    await sendOnce('certificate_issued', [id], await activeEmails('auditor'), () => mail)
  } catch (e) {
    console.error('Certificate notice not sent:', e instanceof Error ? e.message : e)
  }
}

/** The certificate-revoked notice to every active auditor (logged, never thrown). */
export async function notifyCertificateRevoked(id: string): Promise<void> {
  try {
    const c = await requireCertificate(useDb(), id)
    const mail = certificateRevokedMail({ id, number: c.number, subjectLabel: c.subject_label, revokedBy: c.revoker_name ?? 'A lab manager', reason: c.revoke_reason ?? '' })
    await sendOnce('certificate_revoked', [id], await activeEmails('auditor'), () => mail)
  } catch (e) {
    console.error('Revocation notice not sent:', e instanceof Error ? e.message : e)
  }
}

/**
 * The daily notices: samples due for re-certification within 30 days (one mail to the
 * managers listing those not yet noticed for their current date), check-outs past their
 * due-back date (one mail each), and certificate notices of the last week that did not go out.
 */
export async function runDailyNotices(): Promise<{ recertification: number; overdue: number; certificates: number }> {
  const db = useDb()
  const managers = await activeEmails('manager')

  const due = await db('samples')
    .whereNot('status', 'retired')
    .whereNotNull('recertify_by')
    .whereRaw('recertify_by <= current_date + ?::int', [RECERTIFY_NOTICE_DAYS])
    .orderBy('recertify_by')
    .orderBy('code')
    .select('id', 'code', 'name', 'recertify_by')
  const byKey = new Map(due.map((s) => [`${s.id}:${s.recertify_by}`, { id: s.id, code: s.code, name: s.name, recertifyBy: s.recertify_by! }]))
  const today = String(((await db.raw('select current_date::text as d')) as { rows: { d: string }[] }).rows[0]!.d)
  const recertified = await sendOnce('recertification_due', [...byKey.keys()], managers, (keys) => recertificationMail(keys.map((k) => byKey.get(k)!), today))

  const overdueRows = await db('sample_checkouts as k')
    .join('samples as s', 's.id', 'k.sample_id')
    .leftJoin('users as u', 'u.id', 'k.checked_out_by')
    .leftJoin('users as h', 'h.id', 'k.holder_user_id')
    .whereNull('k.checked_in_at')
    .whereRaw('k.due_back < current_date')
    .select('k.id', 'k.holder', 'k.run', 'k.due_back', 's.code', 's.name', 'u.name as by_name', 'u.email as by_email', 'u.active as by_active', 'h.email as holder_email', 'h.active as holder_active')
  let overdue = 0
  for (const k of overdueRows) {
    // The holder too, when the holder is a person of the lab.
    const to = [...new Set([...(k.by_email && k.by_active ? [k.by_email as string] : []), ...(k.holder_email && k.holder_active ? [k.holder_email as string] : []), ...managers])]
    const mail = overdueMail({ code: k.code, name: k.name, holder: k.holder, run: k.run, dueBack: k.due_back, checkedOutBy: k.by_name })
    overdue += (await sendOnce('checkout_overdue', [`${k.id}:${k.due_back}`], to, () => mail)).length
  }

  const missed = await db('certificates as c')
    .whereRaw(`c.issued_at > now() - interval '7 days'`)
    .whereNotExists((q) => q.select(db.raw('1')).from('notices as n').where('n.kind', 'certificate_issued').whereRaw('n.key = c.id::text'))
    .select('c.id')
  for (const c of missed) await notifyCertificateIssued(c.id)

  return { recertification: recertified.length, overdue, certificates: missed.length }
}
