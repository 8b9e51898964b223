import { IdParam as Params } from '#shared/schemas/common'
import { UpdateUserBody } from '#shared/schemas/auth'
import { CAN } from '#shared/auth/roles'


export default defineEventHandler(async (event) => {
  const me = requireRole(event, ...CAN.managePeople)
  const { id } = paramsValid(event, Params)
  const body = await readValid(event, UpdateUserBody)
  if (id === me.id) {
    throw createError({ statusCode: 400, statusMessage: 'Bad Request', message: 'You cannot change your own role or deactivate yourself; ask another lab manager' })
  }

  const db = useDb()
  const updated = await db.transaction(async (trx) => {
    const before = await trx('users').where({ id }).forUpdate().first()
    if (!before) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such person' })
    const changes: Record<string, unknown> = { updated_at: trx.fn.now() }
    if (body.role !== undefined) changes.role = body.role
    if (body.active !== undefined) {
      changes.active = body.active
      changes.deactivated_at = body.active ? null : trx.fn.now()
    }
    const [after] = await trx('users').where({ id }).update(changes).returning(['id', 'email', 'name', 'role', 'active', 'created_at', 'deactivated_at'])
    if (body.active === false) await trx('sessions').where({ user_id: id }).delete()
    // Every instance forgets its cached copy of this person's sessions when this commits.
    await trx.raw(...userChangedNotice(id))
    const pick = (u: { role: string; active: boolean }) => ({ role: u.role, active: u.active })
    const action = body.active === false && before.active ? 'user.deactivated' : body.active === true && !before.active ? 'user.reactivated' : 'user.role-changed'
    await writeAudit(trx, event, { action, entityType: 'user', entityId: id, before: pick(before), after: pick(after) })
    return after
  })

  forgetLocally('u', id)
  return { id: updated.id, email: updated.email, name: updated.name, role: updated.role, active: updated.active, createdAt: updated.created_at, deactivatedAt: updated.deactivated_at }
})
