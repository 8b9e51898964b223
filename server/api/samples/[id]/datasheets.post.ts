import { randomUUID } from 'node:crypto'
import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'
import { DATASHEET_KINDS } from '#shared/samples/filetypes'

// A datasheet upload: the file is received and checked into a temporary file, then stored, then
// recorded. A store failure leaves no row; a database failure removes the stored object.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const { id } = paramsValid(event, IdParam)
  const db = useDb()
  const sample = await db('samples').where({ id }).first('id', 'code', 'status')
  if (!sample) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such sample' })
  // Refused before a byte of the file is read: a retired sample's record is closed.
  if (sample.status === 'retired') throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'This sample is retired; bring it back into the stock before adding datasheets' })

  const file = await receiveUpload(event)
  try {
    const datasheetId = randomUUID()
    const key = `datasheets/${id}/${datasheetId}`
    await storeUpload(event, file, key)
    try {
      const row = await db.transaction(async (trx) => {
        const [row] = await trx('datasheets')
          .insert({
            id: datasheetId,
            sample_id: id,
            object_key: key,
            original_name: file.originalName,
            content_type: DATASHEET_KINDS[file.kind].contentType,
            size_bytes: file.size,
            sha256: file.sha256,
            uploaded_by: user.id,
          })
          .returning('*')
        const record = datasheetRecord({ ...row!, uploader_name: user.name })
        await writeAudit(trx, event, { action: 'sample.datasheet-added', entityType: 'sample', entityId: id, after: { code: sample.code, datasheet: record } })
        return record
      })
      setResponseStatus(event, 201)
      return row
    } catch (e) {
      await removeStoredObject(key)
      throw e
    }
  } finally {
    await discardUpload(file)
  }
})
