import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'
import { contentDisposition } from '#shared/samples/filetypes'

// Sent through the app, not by a redirect to a signed store link: a link lets the browser fetch
// whatever the store holds at that moment, so no check made here could vouch for the bytes it
// gets. Here the bytes are read whole, checked against the SHA-256 recorded at upload, and only
// then sent (at most 25 MB, so holding one in memory is acceptable); a mismatch is a 502, an audit
// row and a mail to the managers. The store then never needs to be reachable from browsers.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const { id } = paramsValid(event, IdParam)
  const sheet = await useDb()('datasheets').where({ id }).first()
  if (!sheet) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such datasheet' })
  const bytes = await readVerified(event, { entityType: 'datasheet', entityId: sheet.id, label: sheet.original_name, key: sheet.object_key, sha256: sheet.sha256, maxBytes: Number(sheet.size_bytes) })
  setResponseHeaders(event, {
    'Content-Type': sheet.content_type,
    'Content-Length': String(bytes.length),
    'Content-Disposition': contentDisposition(sheet.original_name),
    'Cache-Control': 'private, no-store',
    'X-Content-Type-Options': 'nosniff',
    'X-Content-SHA256': sheet.sha256,
  })
  return bytes
})
