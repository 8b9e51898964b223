import { z } from 'zod'
import { CAN } from '#shared/auth/roles'

const Params = z.object({ id: z.uuid() })

// One saved plan: its inputs and frozen results.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readBeamPlans)
  const { id } = paramsValid(event, Params)
  const row = await loadPlanOr404(id)
  return { ...planOut(row), note: row.note, inputs: row.inputs, result: row.result }
})
