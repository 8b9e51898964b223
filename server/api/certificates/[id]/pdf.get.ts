import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// The stored PDF, sent through the app only after its bytes were checked against the SHA-256 the
// certificate record holds (readVerified): an altered or missing object is a 502, an audit row and
// a mail to the managers, never a download. The object store never needs to be reachable from the browser.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readCertificates)
  const { id } = paramsValid(event, IdParam)
  const row = await useDb()('certificates').where({ id }).first('id', 'object_key', 'number', 'version', 'pdf_bytes', 'pdf_sha256')
  if (!row) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such certificate' })
  const pdf = await readVerified(event, { entityType: 'certificate', entityId: row.id, label: `${row.number} v${row.version}`, key: row.object_key, sha256: row.pdf_sha256, maxBytes: row.pdf_bytes })
  setResponseHeaders(event, {
    'Content-Type': 'application/pdf',
    'Content-Length': String(pdf.length),
    'Content-Disposition': `attachment; filename="${certificateFileName(row)}"`,
    'Cache-Control': 'private, no-store',
    'X-Content-SHA256': row.pdf_sha256,
  })
  return pdf
})
