import { bodyLimitFor } from '#shared/schemas/limits'

const WITH_BODY = new Set(['POST', 'PUT', 'PATCH', 'DELETE'])

function tooLarge(event: Parameters<typeof setResponseHeader>[0], limit: number): never {
  // Answered before the body is read; Node then discards whatever the client still sends, so
  // the client gets to read this answer instead of a broken pipe.
  throw createError({ statusCode: 413, statusMessage: 'Payload Too Large', message: `The request body is larger than ${Math.round(limit / 1024)} KB`, data: { limitBytes: limit } })
}

// Every API body has a size limit, checked before any of it is read: the declared length first;
// a body sent without one (chunked) is read here up to the limit and no further. Uploads
// (multipart) are limited by the datasheet receiver, which streams them to disk.
export default defineEventHandler(async (event) => {
  if (!WITH_BODY.has(event.method)) return
  const path = event.path.split('?')[0]!
  if (!path.startsWith('/api/')) return
  const type = getRequestHeader(event, 'content-type') ?? ''
  if (/^multipart\//i.test(type)) return
  const limit = bodyLimitFor(path)
  const declared = getRequestHeader(event, 'content-length')
  if (declared !== undefined) {
    if (Number(declared) > limit) tooLarge(event, limit)
    return
  }
  if (!getRequestHeader(event, 'transfer-encoding')) return
  const req = event.node.req
  const chunks: Buffer[] = []
  let size = 0
  const over = await new Promise<boolean>((resolve, reject) => {
    req.on('data', (c: Buffer) => {
      size += c.length
      if (size > limit) {
        req.pause()
        resolve(true)
      } else chunks.push(c)
    })
    req.on('end', () => resolve(false))
    req.on('error', reject)
  }).catch(() => true)
  if (over) tooLarge(event, limit)
  // h3's readBody/readRawBody take the body from here.
  ;(event as unknown as { _requestBody: Buffer })._requestBody = Buffer.concat(chunks)
})
