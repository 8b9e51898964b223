import { z } from 'zod'
import { CAN } from '#shared/auth/roles'
import { BEAM_ENGINE_VERSION, planChanges, type BreedPlan, type StripPlan } from '#shared/beam'
import { BeamPlanBody } from '#shared/schemas/beam'

const Params = z.object({ id: z.uuid() })

// A saved plan's inputs run again on the current engine, with what changed. Nothing is written:
// saving the new answer is a new plan (POST /api/beam/plans with the same inputs).
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readBeamPlans)
  const { id } = paramsValid(event, Params)
  const row = await loadPlanOr404(id)
  const input = BeamPlanBody.parse(row.inputs)
  const current = await computePlan(input, null)
  const stored = row.result as { strip: StripPlan; breed: BreedPlan | null }
  return {
    id: row.id,
    storedEngine: row.engine_version,
    currentEngine: BEAM_ENGINE_VERSION,
    inputs: input,
    result: { strip: current.strip, breed: current.breed },
    changes: planChanges(stored, { strip: current.strip, breed: current.breed }, row.charge_state),
  }
})
