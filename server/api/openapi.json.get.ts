import { API_ROUTES } from '#shared/api/contract'
import { openApiDocument } from '#shared/api/openapi'

// The API description, built once per process from the route contract and the zod schemas.
let doc: ReturnType<typeof openApiDocument> | null = null

export default defineEventHandler(() => {
  doc ??= openApiDocument(API_ROUTES, { version: '0.1.0', serverUrl: String(useRuntimeConfig().public.baseUrl) })
  return doc
})
