// Resolves the caller on every request: an API token (`Authorization: Bearer …`) or else the
// session cookie. A request that carries a bearer token is judged by the token alone, never by a
// cookie, so 01.origin.ts can let it through without the Origin check (a browser never adds an
// Authorization header to a cross-site request on its own). A deactivated person's sessions are
// deleted at deactivation; the `active` check is the second lock on that door, and a token's owner
// is checked the same way. The health probe skips it, so it can still report which service is down.
// Validated sessions and tokens are cached briefly (utils/session-cache.ts); every change that ends
// one is announced to all instances.
// `access_token` and `api_key` are never our parameters; `token` is (an invitation's), so only a
// value shaped like an API token is refused there.
function tokenInQuery(path: string): boolean {
  const q = path.indexOf('?')
  if (q < 0) return false
  const params = new URLSearchParams(path.slice(q + 1))
  return params.has('access_token') || params.has('api_key') || params.getAll('token').some((v) => v.startsWith(TOKEN_PREFIX))
}

export default defineEventHandler(async (event) => {
  event.context.user = null
  event.context.session = null
  event.context.token = null
  if (event.path === '/api/health') return
  if (event.path.startsWith('/api/') && tokenInQuery(event.path)) {
    throw createError({ statusCode: 400, statusMessage: 'Token in query string', message: 'API tokens are accepted only in the Authorization header (Authorization: Bearer <token>), never in the URL' })
  }
  const authorization = getRequestHeader(event, 'authorization')
  if (authorization !== undefined) {
    const m = /^Bearer\s+(\S+)\s*$/i.exec(authorization)
    if (!m) throw createError({ statusCode: 401, statusMessage: 'Unauthorized', message: 'The Authorization header must be: Bearer <token>' })
    const { token, user } = await resolveToken(m[1]!)
    assertTokenRate(event, token.id)
    await recordTokenUse(event, token.id)
    event.context.token = token
    event.context.user = user
    return
  }
  const lucia = useLucia()
  const sessionId = getCookie(event, lucia.sessionCookieName)
  if (!sessionId) return
  const cached = cachedSession(sessionId)
  if (cached) {
    event.context.session = cached.session
    event.context.user = cached.user
    return
  }
  const { session, user } = await lucia.validateSession(sessionId)
  if (session && session.fresh) appendResponseHeader(event, 'Set-Cookie', lucia.createSessionCookie(session.id).serialize())
  if (!session || !user || !user.active) {
    appendResponseHeader(event, 'Set-Cookie', lucia.createBlankSessionCookie().serialize())
    return
  }
  rememberSession(session, user)
  event.context.session = session
  event.context.user = user
})
