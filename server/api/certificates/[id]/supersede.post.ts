import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'
import { SupersedeBody } from '#shared/schemas/certificates'

// Corrects a certificate: a new version for the same subject, built from the subject as it now
// stands (fix the sample first, then supersede), replacing this one in the same transaction.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.issueCertificates)
  const { id } = paramsValid(event, IdParam)
  const { reason } = await readValid(event, SupersedeBody)
  const old = await requireCertificate(useDb(), id)
  if (old.status !== 'issued') throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'Only a current certificate can be superseded' })
  const row = await issueCertificate(event, user, old.subject_type, old.subject_id, { supersede: { id, reason } })
  await notifyCertificateIssued(row.id)
  setResponseStatus(event, 201)
  return certificateOut(await requireCertificate(useDb(), row.id))
})
