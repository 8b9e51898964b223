import { ResetCompleteBody } from '#shared/schemas/auth'

// Completes a reset: the link works once and for one hour. Every session of the person ends
// (announced to every instance), their sign-in lock-out lifts, and a link a manager sent to a
// deactivated person brings the account back.
export default defineEventHandler(async (event) => {
  const { token, password } = await readValid(event, ResetCompleteBody)
  const hash = await hashPassword(password)
  const db = useDb()
  const user = await db.transaction(async (trx) => {
    const reset = await trx('password_resets').where({ token_hash: hashToken(token) }).whereNull('used_at').forUpdate().first()
    if (!reset) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'This link is not valid or was already used; ask for a new one' })
    if (new Date(reset.expires_at).getTime() < Date.now()) throw createError({ statusCode: 410, statusMessage: 'Gone', message: 'This link has expired; ask for a new one' })
    const before = await trx('users').where({ id: reset.user_id }).forUpdate().first()
    if (!before || (!before.active && !reset.reactivate)) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'This link is not valid or was already used; ask for a new one' })
    const changes: Record<string, unknown> = { password_hash: hash, updated_at: trx.fn.now() }
    if (reset.reactivate && !before.active) Object.assign(changes, { active: true, deactivated_at: null })
    await trx('users').where({ id: before.id }).update(changes)
    await trx('password_resets').where({ id: reset.id }).update({ used_at: trx.fn.now() })
    await trx('sessions').where({ user_id: before.id }).delete()
    await trx.raw(...userChangedNotice(before.id))
    await writeAudit(trx, event, { action: 'auth.password-reset', entityType: 'user', entityId: before.id, before: { active: before.active }, after: { active: before.active || !!reset.reactivate, byManager: !!reset.requested_by } }, { id: before.id, email: before.email })
    return before
  })
  forgetLocally('u', user.id)
  await clearAccountLock(String(user.email).toLowerCase())
  return { email: user.email }
})
