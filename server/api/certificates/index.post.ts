import { CAN } from '#shared/auth/roles'
import { IssueCertificateBody } from '#shared/schemas/certificates'

// Issues the first certificate of a sample or a recorded species (a subject with a current
// certificate gets a corrected version through /supersede instead). Answers 201 with it; the
// auditors get a notice once the certificate is committed.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.issueCertificates)
  const body = await readValid(event, IssueCertificateBody)
  const row = await issueCertificate(event, user, body.subjectType, body.subjectId)
  await notifyCertificateIssued(row.id)
  setResponseStatus(event, 201)
  return certificateOut(await requireCertificate(useDb(), row.id))
})
