import { randomUUID } from 'node:crypto'
import type { H3Event } from 'h3'
import type { Knex } from 'knex'
import type { User } from 'lucia'
import { DATASHEET_KINDS } from '#shared/samples/filetypes'
import type { DatasheetRow } from '#shared/types/db'

/**
 * Receives an upload and records it as a datasheet of `sample`: a first version, or the next
 * version of `replaces` (which is then marked replaced, and kept). The file is checked into a
 * temporary file, stored, then recorded with its audit row; a store failure leaves no row, a
 * database failure removes the stored object.
 */
export async function receiveDatasheet(event: H3Event, user: User, sample: { id: string; code: string; status: string }, replaces: DatasheetRow | null) {
  // Refused before a byte of the file is read: a retired sample's record is closed, for a first
  // upload and for a new version alike.
  if (sample.status === 'retired') throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'This sample is retired; bring it back into the stock before adding datasheets' })
  const file = await receiveUpload(event)
  try {
    const datasheetId = randomUUID()
    const key = `datasheets/${sample.id}/${datasheetId}`
    await storeUpload(event, file, key)
    try {
      return await useDb().transaction(async (trx) => {
        if (replaces) {
          // Only the current version can be replaced, once: a second replacement of the same
          // sheet (two tabs) is refused instead of forking the line.
          const marked = await trx('datasheets').where({ id: replaces.id }).whereNull('replaced_at').whereNull('withdrawn_at').update({ replaced_at: trx.fn.now() }).returning('id')
          if (!marked.length) throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'This datasheet was replaced or withdrawn meanwhile' })
        }
        const [row] = await trx('datasheets')
          .insert({
            id: datasheetId,
            sample_id: sample.id,
            object_key: key,
            original_name: file.originalName,
            content_type: DATASHEET_KINDS[file.kind].contentType,
            size_bytes: file.size,
            sha256: file.sha256,
            uploaded_by: user.id,
            version: replaces ? (replaces.version ?? 1) + 1 : 1,
            replaces_id: replaces?.id ?? null,
          })
          .returning('*')
        const record = datasheetRecord({ ...row!, uploader_name: user.name })
        await writeAudit(trx, event, {
          action: replaces ? 'sample.datasheet-replaced' : 'sample.datasheet-added',
          entityType: 'sample',
          entityId: sample.id,
          before: replaces ? { code: sample.code, datasheet: datasheetRecord(replaces) } : undefined,
          after: { code: sample.code, datasheet: record },
        })
        return record
      })
    } catch (e) {
      await removeStoredObject(key)
      throw e
    }
  } finally {
    await discardUpload(file)
  }
}

/** The certificates in force (issued, not superseded or revoked) whose frozen record lists `sha256`. */
export async function certificatesListing(db: Knex | Knex.Transaction, sampleId: string, sha256: string): Promise<string[]> {
  const rows = await db('certificates')
    .where({ subject_type: 'sample', subject_id: sampleId, status: 'issued' })
    .whereRaw('strpos(payload::text, ?) > 0', [sha256])
    .select('number')
  return rows.map((r) => r.number as string)
}
