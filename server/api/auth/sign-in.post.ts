import { SignInBody } from '#shared/schemas/auth'

// Public by nature. One message for an unknown e-mail, a wrong password and a deactivated
// account, so the answer never tells which accounts exist. The attempt is counted before the
// password is checked (utils/rate-limit.ts), so parallel guesses cannot pass the limit.
export default defineEventHandler(async (event) => {
  const { email, password } = await readValid(event, SignInBody)
  const ticket = await reserveSignIn(event, email)

  const db = useDb()
  const user = await db('users').whereRaw('lower(email) = ?', [email]).first()
  const ok = await checkPassword(user?.password_hash, password)
  if (!ok || !user?.active) {
    await recordSignInFailure(event, email, user?.id ?? null)
    throw createError({ statusCode: 401, statusMessage: 'Unauthorized', message: 'E-mail or password is not right' })
  }

  await releaseSignIn(ticket)
  await startSession(event, user.id)
  await writeAudit(db, event, { action: 'auth.sign-in', entityType: 'user', entityId: user.id }, { id: user.id, email: user.email })
  return { id: user.id, email: user.email, name: user.name, role: user.role }
})
