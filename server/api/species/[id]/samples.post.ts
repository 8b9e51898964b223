import { IdParam as Params } from '#shared/schemas/common'
import { LinkSampleBody as Body } from '#shared/schemas/species'
import { CAN } from '#shared/auth/roles'


// Links a sample that can source this species. Linking twice is harmless (no second row).
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.recordSpecies)
  const { id } = paramsValid(event, Params)
  const { sampleId } = await readValid(event, Body)
  const species = await loadSpeciesOr404(id)

  const db = useDb()
  const linked = await db.transaction(async (trx) => {
    const sample = await findSample(trx, sampleId)
    if (!sample) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such sample' })
    if (sample.status === 'retired') throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'A retired sample cannot be linked to a species' })
    const rows = await trx('sample_species').insert({ sample_id: sampleId, species_id: id, linked_by: event.context.user!.id }).onConflict(['sample_id', 'species_id']).ignore().returning('*')
    if (rows.length) await writeAudit(trx, event, { action: 'species.sample-linked', entityType: 'species', entityId: id, after: { sample: sample.code, species: species.label } })
    return rows.length > 0
  })
  setResponseStatus(event, linked ? 201 : 200)
  return { speciesId: id, sampleId, linked: true }
})
