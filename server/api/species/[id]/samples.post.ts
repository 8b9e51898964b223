import { IdParam as Params } from '#shared/schemas/common'
import { LinkSampleBody as Body } from '#shared/schemas/species'
import { CAN } from '#shared/auth/roles'
import { sampleCanSource } from '#shared/samples/species-link'
import { symbolOf } from '#shared/physics/elements'


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
    // The server decides, whatever page sent the link: a sample can source only its own elements.
    const check = sampleCanSource(sample.components, { z: species.z, massNumber: species.mass_number })
    if (!check.ok) {
      const contains = [...new Set(sample.components.map((c) => c.z))].map(symbolOf)
      const message = check.reason === 'element' ? 'The sample does not contain the element of this species' : 'The sample does not contain the isotope this species names'
      throw createError({ statusCode: 400, statusMessage: 'Invalid input', message, data: { reason: check.reason, contains, issues: [{ path: 'sampleId', message }] } })
    }
    const rows = await trx('sample_species').insert({ sample_id: sampleId, species_id: id, linked_by: event.context.user!.id }).onConflict(['sample_id', 'species_id']).ignore().returning('*')
    if (rows.length) await writeAudit(trx, event, { action: 'species.sample-linked', entityType: 'species', entityId: id, after: { sample: sample.code, species: species.label } })
    return rows.length > 0
  })
  setResponseStatus(event, linked ? 201 : 200)
  return { speciesId: id, sampleId, linked: true }
})
