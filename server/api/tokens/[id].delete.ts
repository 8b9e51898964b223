import { CAN, can } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// Revokes a token at once on every instance (NOTIFY in the same transaction). Your own, or any
// as a lab manager; someone else's token is a 404 to everyone else.
export default defineEventHandler(async (event) => {
  const me = requireRole(event, ...CAN.useTokens)
  const { id } = paramsValid(event, IdParam)
  const revoked = await useDb().transaction(async (trx) => {
    const before = await trx('api_tokens').where({ id }).forUpdate().first()
    if (!before || (before.user_id !== me.id && !can(me.role, 'manageAllTokens'))) {
      throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such token' })
    }
    if (before.revoked_at) return before
    const [after] = await trx('api_tokens').where({ id }).update({ revoked_at: trx.fn.now(), revoked_by: me.id }).returning('*')
    await trx.raw(...tokenRevokedNotice(id))
    await writeAudit(trx, event, { action: 'token.revoked', entityType: 'api_token', entityId: id, before: { name: before.name, scope: before.scope, owner: before.user_id }, after: { revokedAt: after!.revoked_at } })
    return after!
  })
  forgetLocally('t', id)
  forgetTokenUse(id)
  return { id: revoked.id, revokedAt: revoked.revoked_at }
})
