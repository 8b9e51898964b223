import { z } from 'zod'
import { CAN } from '#shared/auth/roles'

const Params = z.object({ id: z.uuid() })

// Removes a licence limit; audited.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.manageLicence)
  const { id } = paramsValid(event, Params)
  const db = useDb()
  return db.transaction(async (trx) => {
    const [row] = await trx('licence_limits').where({ id }).delete().returning('*')
    if (!row) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such licence limit' })
    await writeAudit(trx, event, { action: 'licence.limit-removed', entityType: 'licence_limit', entityId: id, before: row, after: null })
    return { id }
  })
})
