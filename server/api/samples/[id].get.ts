import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const { id } = paramsValid(event, IdParam)
  const db = useDb()
  return withDatasheets(db, await requireSample(db, id))
})
