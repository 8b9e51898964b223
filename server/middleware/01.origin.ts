import { verifyRequestOrigin } from 'lucia'

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS'])

// A state-changing request must come from our own pages: the Origin header has to name this
// host (or the configured public URL). This, with SameSite=Lax cookies, stops cross-site forgery.
// A request with an Authorization header is judged by its token alone (02.session.ts never looks at
// its cookie), and a browser sends that header cross-site only after a CORS preflight this server
// never grants, so such a request needs no Origin check.
export default defineEventHandler((event) => {
  if (SAFE.has(event.method)) return
  if (getRequestHeader(event, 'authorization') !== undefined) return
  const origin = getRequestHeader(event, 'origin') ?? null
  const host = getRequestHeader(event, 'x-forwarded-host') && String(useRuntimeConfig().trustProxy) === 'true'
    ? getRequestHeader(event, 'x-forwarded-host')!
    : getRequestHeader(event, 'host') ?? null
  const allowed = [host, new URL(String(useRuntimeConfig().public.baseUrl)).host].filter((h): h is string => !!h)
  if (!origin || !verifyRequestOrigin(origin, allowed)) {
    throw createError({ statusCode: 403, statusMessage: 'Forbidden', message: 'Cross-site request refused' })
  }
})
