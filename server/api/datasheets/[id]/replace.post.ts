import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// A new version of a datasheet: the upload becomes the current version, the old one is kept,
// marked replaced, and still listed. A withdrawn or already replaced sheet cannot be replaced.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const { id } = paramsValid(event, IdParam)
  const db = useDb()
  const sheet = await db('datasheets').where({ id }).first()
  if (!sheet) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such datasheet' })
  if (sheet.withdrawn_at) throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'This datasheet is withdrawn: upload a new one instead' })
  if (sheet.replaced_at) throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'This datasheet was already replaced: replace its newest version' })
  const sample = (await db('samples').where({ id: sheet.sample_id }).first('id', 'code', 'status'))!
  const record = await receiveDatasheet(event, user, sample, sheet)
  setResponseStatus(event, 201)
  return record
})
