import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// Signed links live five minutes: long enough to follow, too short to be worth passing on. The
// stored object carries its own type and download name (set on upload), so the link needs no
// response overrides.
const LINK_SECONDS = 300

export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const { id } = paramsValid(event, IdParam)
  const sheet = await useDb()('datasheets').where({ id }).first()
  if (!sheet) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such datasheet' })
  let url: string
  try {
    url = await useObjectStore().presignedGetObject(await useBucket(), sheet.object_key, LINK_SECONDS)
  } catch {
    throw createError({ statusCode: 502, statusMessage: 'Bad Gateway', message: 'The file store is not answering; try again shortly' })
  }
  setResponseHeader(event, 'Cache-Control', 'no-store')
  return sendRedirect(event, url, 302)
})
