import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// One certificate with its frozen payload, so anyone who may read it can recompute the digest.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readCertificates)
  const { id } = paramsValid(event, IdParam)
  return certificateOut(await requireCertificate(useDb(), id), true)
})
