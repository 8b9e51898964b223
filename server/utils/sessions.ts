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
  const session = event.context.session
  if (session) {
    await useDb().transaction(async (trx) => {
      await trx('sessions').where({ id: session.id }).delete()
      await trx.raw(...sessionEndedNotice(session.id))
    })
    forgetLocally('s', session.id)
  }
  appendResponseHeader(event, 'Set-Cookie', lucia.createBlankSessionCookie().serialize())
  event.context.session = null
  event.context.user = null
}
