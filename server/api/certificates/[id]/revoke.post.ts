import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'
import { RevokeBody } from '#shared/schemas/certificates'

// Withdraws a current certificate: it stays on record, marked revoked with who, when and why,
// and the verification page says so from then on.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.issueCertificates)
  const { id } = paramsValid(event, IdParam)
  const { reason } = await readValid(event, RevokeBody)
  const db = useDb()
  await db.transaction(async (trx) => {
    const row = await trx('certificates').where({ id }).forUpdate().first()
    if (!row) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such certificate' })
    if (row.status !== 'issued') throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'Only a current certificate can be revoked' })
    await trx('certificates').where({ id }).update({ status: 'revoked', revoked_at: trx.fn.now(), revoked_by: user.id, revoke_reason: reason })
    await writeAudit(trx, event, { action: 'certificate.revoked', entityType: 'certificate', entityId: id, before: { status: 'issued' }, after: { status: 'revoked', number: row.number, reason } })
  })
  await notifyCertificateRevoked(id)
  return certificateOut(await requireCertificate(db, id))
})
