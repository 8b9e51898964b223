import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'
import { SampleBody, SamplePatchBody } from '#shared/schemas/samples'

// A change is made against the version the editor read. If someone saved in between, the answer
// is 409 with the record as it now stands, so the page can show what changed and let them redo.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const { id } = paramsValid(event, IdParam)
  const { version, ...changes } = await readValid(event, SamplePatchBody)

  const db = useDb()
  const after = await db.transaction(async (trx) => {
    const before = await requireSample(trx, id, { lock: true })
    if (before.version !== version) {
      throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'Someone changed this sample after you opened it', data: { current: await withDatasheets(trx, before) } })
    }
    if (before.status === 'retired' && !changes.status) {
      throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'This sample is retired: give it a status to bring it back before changing it', data: { current: await withDatasheets(trx, before) } })
    }
    const given = Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined))
    // Nothing to change: no write, no new version, no audit row.
    if (!Object.keys(given).length) return before
    const parsed = SampleBody.safeParse({ ...sampleInputOf(before), ...given })
    if (!parsed.success) {
      throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })) } })
    }
    const data = parsed.data
    const unchanged = SampleBody.safeParse(sampleInputOf(before))
    if (unchanged.success && JSON.stringify(unchanged.data) === JSON.stringify(data) && before.status !== 'retired') return before
    await assertPlace(trx, data.locationId)
    const [row] = await trx('samples')
      .where({ id, version })
      .update({ ...sampleColumns(data), version: version + 1, updated_by: user.id, updated_at: trx.fn.now(), retired_at: null })
      .returning('id')
    if (!row) throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'Someone changed this sample after you opened it' })
    if (given.components !== undefined) await writeComponents(trx, id, data)
    const after = (await findSample(trx, id))!
    await writeAudit(trx, event, { action: before.status === 'retired' ? 'sample.restored' : 'sample.updated', entityType: 'sample', entityId: id, before, after })
    return after
  })
  return withDatasheets(db, after)
})
