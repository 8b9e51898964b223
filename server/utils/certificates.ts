import { createHash, randomUUID } from 'node:crypto'
import type { H3Event } from 'h3'
import type { User } from 'lucia'
import { ROLE_LABELS } from '#shared/auth/roles'
import { canonicalJson } from '#shared/certificates/canonical'
import { verifyPath, type SubjectType } from '#shared/certificates/payload'
import type { CertificateRow } from '#shared/types/db'
import { certificateDocument, type CertificatePayload } from '../pdf/certificate'

/** SHA-256 of the canonical JSON of a payload: the digest printed on the certificate. */
export function payloadDigest(payload: unknown): string {
  return createHash('sha256').update(canonicalJson(payload)).digest('hex')
}

/** The public verification link (what the QR code carries) and the page address printed beside it. */
export function verifyLinks(number: string, digest: string): { url: string; page: string } {
  const base = String(useRuntimeConfig().public.baseUrl).replace(/\/+$/, '')
  return { url: base + verifyPath(number, digest), page: `${base}/verify/${number}` }
}

function pdfFileName(number: string, version: number): string {
  return `${number}-v${version}.pdf`
}

/** The download name of a certificate's PDF. */
export function certificateFileName(row: Pick<CertificateRow, 'number' | 'version'>): string {
  return pdfFileName(row.number, row.version)
}

interface IssueOptions {
  /** the certificate this one corrects, and why */
  supersede?: { id: string; reason: string }
}

/**
 * Issues a certificate for a subject, or a corrected version superseding `opts.supersede.id`:
 * draws the number, freezes the payload, renders and stores the PDF, and records the row, the
 * old version's new status and the audit rows in one transaction. The PDF is stored before the
 * row is written and removed again if the transaction fails: the database never points at a
 * missing object, and no stored object is left that nothing points at.
 */
export async function issueCertificate(event: H3Event, user: User, type: SubjectType, subjectId: string, opts: IssueOptions = {}): Promise<CertificateRow> {
  await usePdfFonts()
  const db = useDb()
  const id = randomUUID()
  const key = `certificates/${id}.pdf`
  let stored = false
  try {
    const row = await db.transaction(async (trx) => {
      const subject = await certifiableSubject(trx, type, subjectId)
      const current = await trx('certificates').where({ subject_type: type, subject_id: subjectId, status: 'issued' }).forUpdate().first()
      let replaces: { number: string; version: number; reason: string } | null = null
      if (opts.supersede) {
        if (!current || current.id !== opts.supersede.id) {
          throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'Only the current certificate of a subject can be superseded' })
        }
        replaces = { number: current.number, version: current.version, reason: opts.supersede.reason }
      } else if (current) {
        throw createError({
          statusCode: 409,
          statusMessage: 'Conflict',
          message: 'This subject already has a current certificate: supersede it to issue a corrected version',
          data: { current: { id: current.id, number: current.number, version: current.version } },
        })
      }
      const last = (await trx('certificates').where({ subject_type: type, subject_id: subjectId }).max({ v: 'version' }).first()) as { v: number | null } | undefined
      const version = (last?.v ?? 0) + 1
      const { number } = (await trx.raw('select next_certificate_number() as number')).rows[0] as { number: string }
      const issuedAt = new Date()
      const payload = subject.build({
        number,
        version,
        labName: String(useRuntimeConfig().public.labName),
        issuedAt: issuedAt.toISOString(),
        issuer: { name: user.name, role: ROLE_LABELS[user.role] },
        replaces,
      })
      const digest = payloadDigest(payload)
      const links = verifyLinks(number, digest)
      const pdf = await signPdf(await renderDocument(certificateDocument(payload as unknown as CertificatePayload, digest, links.url, links.page)), number)
      await storePdf(event, key, pdf, pdfFileName(number, version))
      stored = true

      if (current) {
        await trx('certificates').where({ id: current.id }).update({ status: 'superseded', superseded_by: id, superseded_at: issuedAt })
        await writeAudit(trx, event, { action: 'certificate.superseded', entityType: 'certificate', entityId: current.id, before: { status: 'issued' }, after: { status: 'superseded', supersededBy: { id, number }, reason: replaces!.reason } })
      }
      const [row] = await trx('certificates')
        .insert({
          id,
          number,
          subject_type: type,
          subject_id: subjectId,
          subject_label: subject.label,
          version,
          status: 'issued',
          payload: JSON.stringify(payload) as never,
          sha256: digest,
          object_key: key,
          pdf_sha256: createHash('sha256').update(pdf).digest('hex'),
          pdf_bytes: pdf.length,
          issued_by: user.id,
          issued_at: issuedAt,
          valid_until: payload.validity.until,
          supersedes_id: current?.id ?? null,
          correction_reason: replaces?.reason ?? null,
        })
        .returning('*')
      await writeAudit(trx, event, {
        action: 'certificate.issued',
        entityType: 'certificate',
        entityId: id,
        after: { number, version, subjectType: type, subjectId, subject: subject.label, sha256: digest, supersedes: current ? { id: current.id, number: current.number } : null },
      })
      return row!
    })
    return row
  } catch (e) {
    if (stored) await removeStoredObject(key)
    throw e
  }
}

function storePdf(event: H3Event, key: string, pdf: Buffer, fileName: string): Promise<void> {
  return putObjectTimed(event, key, pdf, pdf.length, { 'Content-Type': 'application/pdf', 'Content-Disposition': `attachment; filename="${fileName}"` }, () =>
    createError({ statusCode: 502, statusMessage: 'Bad Gateway', message: 'The file store did not accept the certificate; nothing was issued. Try again shortly.' }))
}
