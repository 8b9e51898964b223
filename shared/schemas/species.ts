import { z } from 'zod'

/** The look-up box: any notation the engine accepts, e.g. `Fe13+`, `Fe XIV`, `56Fe13+`, `O-`. */
export const SpeciesLookupQuery = z.object({
  q: z.string().trim().min(1, 'Enter a species, e.g. Fe13+ or Fe XIV').max(40, 'A species is at most 40 characters'),
})
