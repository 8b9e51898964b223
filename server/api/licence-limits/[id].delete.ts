import { IdParam } from '#shared/schemas/common'
import { CAN } from '#shared/auth/roles'



// Removes a licence limit; audited.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.manageLicence)
  const { id } = paramsValid(event, IdParam)
  const db = useDb()
  return db.transaction(async (trx) => {
    const [row] = await trx('licence_limits').where({ id }).delete().returning('*')
    if (!row) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such licence limit' })
    await writeAudit(trx, event, { action: 'licence.limit-removed', entityType: 'licence_limit', entityId: id, before: row, after: null })
    return { id }
  })
})
