import { SpeciesSampleParams as Params } from '#shared/schemas/species'
import { CAN } from '#shared/auth/roles'


export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.recordSpecies)
  const { id, sampleId } = paramsValid(event, Params)
  const species = await loadSpeciesOr404(id)

  const removed = await useDb().transaction(async (trx) => {
    const link = await trx('sample_species as l').join('samples as s', 's.id', 'l.sample_id').where({ 'l.species_id': id, 'l.sample_id': sampleId }).first('s.code')
    if (!link) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'This sample is not linked to this species' })
    await trx('sample_species').where({ species_id: id, sample_id: sampleId }).delete()
    await writeAudit(trx, event, { action: 'species.sample-unlinked', entityType: 'species', entityId: id, before: { sample: link.code, species: species.label } })
    return true
  })
  return { speciesId: id, sampleId, linked: !removed }
})
