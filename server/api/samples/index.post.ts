import { CAN } from '#shared/auth/roles'
import { SampleBody } from '#shared/schemas/samples'

export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const body = await readValid(event, SampleBody)

  const db = useDb()
  const record = await db.transaction(async (trx) => {
    await assertPlace(trx, body.locationId)
    return insertSample(trx, event, body, user.id)
  })
  setResponseStatus(event, 201)
  return { ...record, datasheets: [] }
})
