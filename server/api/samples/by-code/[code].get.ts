import { CAN } from '#shared/auth/roles'
import { CodeParam } from '#shared/schemas/samples'

// QR labels carry the code, not the id: a scan opens the sample through here.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const { code } = paramsValid(event, CodeParam)
  const db = useDb()
  const row = await db('samples').where({ code }).first('id')
  if (!row) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such sample' })
  return withDatasheets(db, await requireSample(db, row.id))
})
