import type { H3Event } from 'h3'

/** Starts a session for `userId` and sets its cookie. */
export async function startSession(event: H3Event, userId: string): Promise<void> {
  const lucia = useLucia()
  const session = await lucia.createSession(userId, {})
  appendResponseHeader(event, 'Set-Cookie', lucia.createSessionCookie(session.id).serialize())
}

/** Ends the caller's session and clears the cookie. */
export async function endSession(event: H3Event): Promise<void> {
  const lucia = useLucia()
  if (event.context.session) await lucia.invalidateSession(event.context.session.id)
  appendResponseHeader(event, 'Set-Cookie', lucia.createBlankSessionCookie().serialize())
  event.context.session = null
  event.context.user = null
}
