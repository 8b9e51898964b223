import { API_CSP, BASE_HEADERS } from '#shared/security/headers'

// Every response carries the base security headers and a policy that runs nothing; pages get
// their own policy when they are rendered (plugins/security-headers.ts replaces this one).
export default defineEventHandler((event) => {
  setResponseHeaders(event, BASE_HEADERS)
  if (!import.meta.dev) setResponseHeader(event, 'Content-Security-Policy', API_CSP)
})
