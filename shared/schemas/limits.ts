/**
 * Body-size limits of the API, by route. Routes anyone can call without signing in get the
 * smallest; the CSV import takes a file. Datasheet uploads have their own limit
 * (DATASHEET_MAX_BYTES in shared/samples/filetypes.ts), enforced while they stream.
 */
export const BODY_LIMITS = {
  anonymous: 16 * 1024,
  json: 1024 * 1024,
  csvImport: 5 * 1024 * 1024,
} as const

/** The body limit, in bytes, of a path under /api/. */
export function bodyLimitFor(path: string): number {
  if (path.startsWith('/api/auth/') || path.startsWith('/api/public/')) return BODY_LIMITS.anonymous
  if (path === '/api/samples/import') return BODY_LIMITS.csvImport
  return BODY_LIMITS.json
}
