import { IdParam as Params } from '#shared/schemas/common'
import { CAN } from '#shared/auth/roles'
import { ENGINE_VERSION, type SpeciesRecord } from '#shared/physics'
import { recordChanges } from '#shared/species/changes'
import type { SampleRow, SpeciesResultRow } from '#shared/types/db'


// One recorded species: its results, newest first, each naming the engine that produced it and
// what changed from the one before; and the samples linked as able to source it.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.lookUpSpecies)
  const { id } = paramsValid(event, Params)
  const species = await loadSpeciesOr404(id)

  const db = useDb()
  const results = await db('species_results as r')
    .leftJoin('users as u', 'u.id', 'r.recorded_by')
    .where('r.species_id', id)
    .orderBy('r.recorded_at', 'desc')
    .select('r.*', 'u.name as recorded_by_name') as Array<SpeciesResultRow & { recorded_by_name: string | null }>
  const samples = await db('sample_species as l')
    .join('samples as s', 's.id', 'l.sample_id')
    .where('l.species_id', id)
    .orderBy('s.code')
    .select('s.id', 's.code', 's.name', 's.status', 's.material', 'l.linked_at') as Array<Pick<SampleRow, 'id' | 'code' | 'name' | 'status' | 'material'> & { linked_at: Date }>

  return {
    ...speciesOut(species),
    currentEngine: ENGINE_VERSION,
    results: results.map((r, i) => ({
      id: r.id,
      engine: r.engine_version,
      methods: r.methods,
      recordedAt: r.recorded_at,
      recordedBy: r.recorded_by_name ?? null,
      record: r.result as SpeciesRecord,
      changesFromPrevious: results[i + 1] ? recordChanges(results[i + 1]!.result as SpeciesRecord, r.result as SpeciesRecord) : [],
    })),
    samples: samples.map((s) => ({ id: s.id, code: s.code, name: s.name, status: s.status, material: s.material, linkedAt: s.linked_at })),
  }
})
