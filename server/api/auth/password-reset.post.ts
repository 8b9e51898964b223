import { ResetRequestBody } from '#shared/schemas/auth'

const ANSWER = { message: 'If this address belongs to an active account, a link to set a new password is on its way. It works once and for one hour.' }

// Asking for a reset link answers the same whether or not the address has an account, so the
// route tells nobody which addresses exist. At most one link a minute per account.
export default defineEventHandler(async (event) => {
  const { email } = await readValid(event, ResetRequestBody)
  const db = useDb()
  const user = await db('users').whereRaw('lower(email) = ?', [email]).where({ active: true }).first('id', 'email', 'name')
  let sent = false
  if (user) {
    const recent = await db('password_resets').where({ user_id: user.id }).where('created_at', '>', db.raw(`now() - interval '1 minute'`)).first('id')
    if (!recent) {
      try {
        await db.transaction(async (trx) => {
          await sendResetLink(trx, user)
          await writeAudit(trx, event, { action: 'auth.password-reset-requested', entityType: 'user', entityId: user.id, after: { email } }, { id: user.id, email: user.email })
        })
        sent = true
      } catch {
        // the relay is down: the answer stays the same (it must not tell the address exists)
      }
    }
  }
  if (!sent && !user) await writeAudit(db, event, { action: 'auth.password-reset-requested', entityType: 'user', after: { email, known: false } }, { id: null, email })
  setResponseStatus(event, 202)
  return ANSWER
})
