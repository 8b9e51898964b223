import { CAN } from '#shared/auth/roles'
import { RecordSpeciesBody } from '#shared/schemas/species'

// Records a species: the engine's answer is frozen with its version and methods. Answers 201
// with the new result, or 200 with the existing one when this engine version already recorded it.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.recordSpecies)
  const body = await readValid(event, RecordSpeciesBody)
  const parsed = parseSpeciesInput(body.species, body.massNumber)

  const { species, result, created } = await recordSpecies(event, parsed)
  setResponseStatus(event, created ? 201 : 200)
  return {
    ...speciesOut(species),
    created,
    result: { id: result.id, engine: result.engine_version, methods: result.methods, recordedAt: result.recorded_at, record: result.result },
  }
})
