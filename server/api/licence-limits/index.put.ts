import { CAN } from '#shared/auth/roles'
import { LicenceLimitBody } from '#shared/schemas/samples'

// Sets (or changes) the limit for one nuclide in one room, or for the laboratory; audited.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageLicence)
  const body = await readValid(event, LicenceLimitBody)
  const db = useDb()
  return db.transaction(async (trx) => {
    if (body.roomId) {
      const room = await trx('locations').where({ id: body.roomId }).first()
      if (!room || room.kind !== 'room') invalidField('roomId', 'Choose a room from the list, or none for the whole laboratory')
    }
    const before = await trx('licence_limits').where({ nuclide: body.nuclide! }).where((q) => (body.roomId ? q.where('location_id', body.roomId) : q.whereNull('location_id'))).first()
    const [row] = before
      ? await trx('licence_limits').where({ id: before.id }).update({ limit_bq: body.limitBq, set_by: user.id, updated_at: trx.fn.now() }).returning('*')
      : await trx('licence_limits').insert({ nuclide: body.nuclide!, location_id: body.roomId, limit_bq: body.limitBq, set_by: user.id }).returning('*')
    await writeAudit(trx, event, { action: 'licence.limit-set', entityType: 'licence_limit', entityId: row!.id, before: before ?? null, after: row })
    return { id: row!.id, nuclide: row!.nuclide, roomId: row!.location_id, limitBq: row!.limit_bq }
  })
})
