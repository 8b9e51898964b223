const SAFE = new Set(['GET', 'HEAD', 'OPTIONS'])

/** The origin (scheme, host and port) of a URL, or null when it is not one. */
function originOf(url: string): string | null {
  try {
    const u = new URL(url)
    return u.protocol === 'http:' || u.protocol === 'https:' ? u.origin : null
  } catch {
    return null
  }
}

// A state-changing request must come from our own pages: its Origin header must name the
// configured public address exactly: scheme, host and port (NUXT_PUBLIC_BASE_URL). With
// SameSite=Lax cookies this stops cross-site forgery, including from another port or plain http.
// A request with an Authorization header is judged by its token alone (02.session.ts never looks at
// its cookie), and a browser sends that header cross-site only after a CORS preflight this server
// never grants, so such a request needs no Origin check.
export default defineEventHandler((event) => {
  if (SAFE.has(event.method)) return
  if (getRequestHeader(event, 'authorization') !== undefined) return
  const origin = originOf(getRequestHeader(event, 'origin') ?? '')
  const allowed = originOf(String(useRuntimeConfig().public.baseUrl))
  if (!origin || !allowed || origin !== allowed) {
    throw createError({ statusCode: 403, statusMessage: 'Forbidden', message: 'Cross-site request refused' })
  }
})
