import { CAN } from '#shared/auth/roles'
import { ChargeStatesQuery } from '#shared/schemas/beam'

// Equilibrium charge states after a stripper, with rigidities and the foil's energy loss.
export default defineEventHandler((event) => {
  requireRole(event, ...CAN.readBeamPlans)
  const q = queryValid(event, ChargeStatesQuery)
  return runStrip({ ion: q.ion, energy: q.energy, unit: q.unit, medium: q.medium, gas: q.gas, arealDensityUgCm2: q.arealDensity })
})
