import { IdParam as Params } from '#shared/schemas/common'
import { CAN } from '#shared/auth/roles'


// The recorded species this sample can source (the other side of the species page's links).
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const { id } = paramsValid(event, Params)
  const db = useDb()
  await requireSample(db, id)
  const rows = await db('sample_species').join('species', 'species.id', 'sample_species.species_id').where('sample_species.sample_id', id).orderBy(['species.z', 'species.charge']).select('species.*')
  return rows.map((r) => speciesOut(r))
})
