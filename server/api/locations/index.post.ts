import { CAN } from '#shared/auth/roles'
import { LocationBody } from '#shared/schemas/samples'
import { PARENT_KIND } from '#shared/samples/vocabulary'

export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const body = await readValid(event, LocationBody)

  const db = useDb()
  const place = await db.transaction(async (trx) => {
    const wanted = PARENT_KIND[body.kind]
    if (wanted === null && body.parentId) invalidField('parentId', 'A room is not inside another place')
    if (wanted !== null) {
      const parent = body.parentId ? await trx('locations').where({ id: body.parentId }).first() : null
      if (!parent || parent.kind !== wanted) invalidField('parentId', `A ${body.kind} goes in a ${wanted}: choose one`)
    }
    const taken = () => createError({ statusCode: 409, statusMessage: 'Conflict', message: 'A storage place with this code already exists' })
    if (await trx('locations').whereRaw('lower(code) = lower(?)', [body.code]).first()) throw taken()
    const [row] = await trx('locations')
      .insert({ kind: body.kind, code: body.code, name: body.name, parent_id: body.parentId, created_by: user.id })
      .returning('*')
      .catch((e: { code?: string }) => {
        // two managers creating the same code at once: the unique index decides
        if (e.code === '23505') throw taken()
        throw e
      })
    await writeAudit(trx, event, { action: 'location.created', entityType: 'location', entityId: row!.id, after: { kind: row!.kind, code: row!.code, name: row!.name, parentId: row!.parent_id } })
    return row!
  })
  setResponseStatus(event, 201)
  return { ...(await placesById(db)).get(place.id)!, samples: 0 }
})
