import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// A datasheet upload: the file is received and checked into a temporary file, then stored, then
// recorded (server/utils/datasheet-versions.ts). A store failure leaves no row; a database
// failure removes the stored object.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const { id } = paramsValid(event, IdParam)
  const sample = await useDb()('samples').where({ id }).first('id', 'code', 'status')
  if (!sample) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such sample' })
  const record = await receiveDatasheet(event, user, sample, null)
  setResponseStatus(event, 201)
  return record
})
