import { CAN } from '#shared/auth/roles'
import { BreedingQuery } from '#shared/schemas/beam'

// Charge breeding in an electron-beam ion source: Lotz cross-sections, j·τ and populations.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readBeamPlans)
  const q = queryValid(event, BreedingQuery)
  return runBreed({ ion: q.ion, electronEnergyEv: q.electronEnergy, currentDensityACm2: q.currentDensity })
})
