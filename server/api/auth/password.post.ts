import { ChangePasswordBody } from '#shared/schemas/auth'

// A signed-in person changes their password. The current one is checked under the same limits
// as a sign-in (a stolen session cannot guess it), and every other session of theirs ends.
export default defineEventHandler(async (event) => {
  const me = requireUser(event)
  const body = await readValid(event, ChangePasswordBody)
  const ticket = await reserveSignIn(event, me.email)
  const db = useDb()
  const row = await db('users').where({ id: me.id }).first('password_hash')
  if (!(await checkPassword(row?.password_hash, body.currentPassword))) {
    await recordSignInFailure(event, me.email, me.id)
    throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [{ path: 'currentPassword', message: 'The current password is not right' }] } })
  }
  await releaseSignIn(ticket)
  const hash = await hashPassword(body.newPassword)
  const ended = await db.transaction(async (trx) => {
    await trx('users').where({ id: me.id }).update({ password_hash: hash, updated_at: trx.fn.now() })
    const others = await trx('sessions').where({ user_id: me.id }).whereNot({ id: event.context.session!.id }).delete().returning('id')
    for (const s of others) await trx.raw(...sessionEndedNotice(s.id))
    await writeAudit(trx, event, { action: 'auth.password-changed', entityType: 'user', entityId: me.id, after: { otherSessionsEnded: others.length } })
    return others.map((s) => s.id as string)
  })
  for (const id of ended) forgetLocally('s', id)
  return { changed: true, otherSessionsEnded: ended.length }
})
