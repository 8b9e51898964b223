import { CAN } from '#shared/auth/roles'
import { SampleBody } from '#shared/schemas/samples'

export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const body = await readValid(event, SampleBody)

  const db = useDb()
  const { record, licenceWarnings: warnings } = await db.transaction(async (trx) => {
    await assertPlace(trx, body.locationId)
    // A radioactive source is registered even over a limit (it is already in the building); the answer says so.
    const warn = body.radioactive && body.nuclide && body.activityBq
      ? await licenceWarnings(trx, { add: { sampleId: 'new', code: 'new', name: body.name, nuclide: body.nuclide, referenceBq: body.activityBq, referenceDate: body.activityReferenceDate ?? body.receivedOn ?? new Date().toISOString().slice(0, 10), locationId: body.locationId } })
      : []
    return { record: await insertSample(trx, event, body, user.id), licenceWarnings: warn }
  })
  setResponseStatus(event, 201)
  return { ...record, datasheets: [], licenceWarnings: warnings }
})
