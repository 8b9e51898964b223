import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// A sample's custody history and open check-out, for everyone who may read the sample.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const { id } = paramsValid(event, IdParam)
  const db = useDb()
  if (!(await db('samples').where({ id }).first('id'))) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such sample' })
  return custodyState(db, id)
})
