import { CAN } from '#shared/auth/roles'
import { BeamPlanBody } from '#shared/schemas/beam'

// Saves a plan: inputs, every result and the engine version, with an audit row.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.planBeams)
  const body = await readValid(event, BeamPlanBody)
  const row = await savePlan(event, body)
  setResponseStatus(event, 201)
  return planOut(await loadPlanOr404(row.id))
})
