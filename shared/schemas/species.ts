import { z } from 'zod'

/** The look-up box: any notation the engine accepts, e.g. `Fe13+`, `Fe XIV`, `56Fe13+`, `O-`. */
export const SpeciesLookupQuery = z.object({
  q: z.string().trim().min(1, 'Enter a species, e.g. Fe13+ or Fe XIV').max(40, 'A species is at most 40 characters'),
})

/** One element's charge states, for the ionisation-energy chart: `z` from 1 to 118. */
export const SpeciesSeriesQuery = z.object({
  z: z.coerce.number({ message: 'z must be an element number' }).int('z must be a whole number').min(1, 'z is at least 1').max(118, 'z is at most 118'),
})
