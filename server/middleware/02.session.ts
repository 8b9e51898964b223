// Resolves the session cookie to the signed-in person on every request. A deactivated person's
// sessions are deleted at deactivation; the `active` check here is the second lock on that door.
// The health probe skips it, so it can still report which service is down. Validated sessions
// are cached briefly (utils/session-cache.ts); every change that ends one is announced to all instances.
export default defineEventHandler(async (event) => {
  event.context.user = null
  event.context.session = null
  if (event.path === '/api/health') return
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
