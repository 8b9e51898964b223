import { DeleteSampleQuery as Query } from '#shared/schemas/samples'
import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'

// Retiring is an edit like any other: it names the version the person saw (DeleteSampleQuery).

// Retiring is the only way a sample leaves the stock. A sample is never deleted: once there are
// certificates and custody history they point at it, and even now its audit trail does. Until
// those tables exist, retiring is simply a status change (status retired, retired_at set).
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const { id } = paramsValid(event, IdParam)
  const { version } = queryValid(event, Query)

  const db = useDb()
  const after = await db.transaction(async (trx) => {
    const before = await requireSample(trx, id, { lock: true })
    if (before.version !== version) {
      throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'Someone changed this sample after you opened it', data: { current: await withDatasheets(trx, before) } })
    }
    if (before.status === 'retired') return before
    await trx('samples')
      .where({ id })
      .update({ status: 'retired', retired_at: trx.fn.now(), version: before.version + 1, updated_by: user.id, updated_at: trx.fn.now() })
    const after = (await findSample(trx, id))!
    await writeAudit(trx, event, { action: 'sample.retired', entityType: 'sample', entityId: id, before, after })
    return after
  })
  return withDatasheets(db, after)
})
