import { IdParam as Params } from '#shared/schemas/common'
import { CAN } from '#shared/auth/roles'


// A lab manager sends someone a link to set a new password: for a person who forgot it, or to
// bring back a deactivated account (setting the password then reactivates it).
export default defineEventHandler(async (event) => {
  const manager = requireRole(event, ...CAN.managePeople)
  const { id } = paramsValid(event, Params)
  const db = useDb()
  const person = await db.transaction(async (trx) => {
    const user = await trx('users').where({ id }).forUpdate().first('id', 'email', 'name', 'active')
    if (!user) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such person' })
    await writeAudit(trx, event, { action: 'user.reset-sent', entityType: 'user', entityId: id, after: { email: user.email, reactivates: !user.active } })
    try {
      await sendResetLink(trx, user, { requestedBy: { id: manager.id, name: manager.name }, reactivate: !user.active })
    } catch {
      throw createError({ statusCode: 502, statusMessage: 'Bad Gateway', message: 'The mail could not be sent; nothing was saved' })
    }
    return user
  })
  return { sent: true, email: person.email, reactivates: !person.active }
})
