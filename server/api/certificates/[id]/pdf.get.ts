import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// The stored PDF, streamed through the app: the same bytes every time, whose SHA-256 the
// certificate record holds. The object store never needs to be reachable from the browser.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readCertificates)
  const { id } = paramsValid(event, IdParam)
  const row = await useDb()('certificates').where({ id }).first('object_key', 'number', 'version', 'pdf_bytes', 'pdf_sha256')
  if (!row) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such certificate' })
  let stream: NodeJS.ReadableStream
  try {
    stream = await useObjectStore().getObject(await useBucket(), row.object_key)
  } catch {
    throw createError({ statusCode: 502, statusMessage: 'Bad Gateway', message: 'The file store is not answering; try again shortly' })
  }
  setResponseHeaders(event, {
    'Content-Type': 'application/pdf',
    'Content-Length': String(row.pdf_bytes),
    'Content-Disposition': `attachment; filename="${certificateFileName(row)}"`,
    'Cache-Control': 'private, no-store',
    'X-Content-SHA256': row.pdf_sha256,
  })
  return sendStream(event, stream as unknown as ReadableStream)
})
