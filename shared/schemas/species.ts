import { z } from 'zod'

/** The look-up box: any notation the engine accepts, e.g. `Fe13+`, `Fe XIV`, `56Fe13+`, `O-`. */
export const SpeciesLookupQuery = z.object({
  q: z.string().trim().min(1, 'Enter a species, e.g. Fe13+ or Fe XIV').max(40, 'A species is at most 40 characters'),
})

/** One element's charge states, for the ionisation-energy chart: `z` from 1 to 118. */
export const SpeciesSeriesQuery = z.object({
  z: z.coerce.number({ message: 'z must be an element number' }).int('z must be a whole number').min(1, 'z is at least 1').max(118, 'z is at most 118'),
})

/** Recording a species: any accepted notation, optionally with a mass number. */
export const RecordSpeciesBody = z.object({
  species: z.string().trim().min(1, 'Enter a species, e.g. Ar 8+').max(40, 'A species is at most 40 characters'),
  massNumber: z.number({ message: 'massNumber must be a number' }).int('massNumber must be a whole number').min(1).max(400).optional(),
})

/** The recorded-species list: search, filters, paging and CSV export. */
export const SpeciesListQuery = z.object({
  q: z.string().trim().max(60).optional(),
  sort: z.string().max(40).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
  element: z.string().trim().max(20).optional(),
  chargeMin: z.coerce.number().int().min(-1).max(118).optional(),
  chargeMax: z.coerce.number().int().min(-1).max(118).optional(),
  isoelectronic: z.string().trim().max(20).optional(),
  hasSample: z.enum(['yes', 'no']).optional(),
  format: z.enum(['json', 'csv']).default('json'),
})

/**
 * Species to set side by side: a list (`species=Fe13+,Fe XIV`), every charge state of one element
 * from q1 to q2 (`element=Fe&from=10&to=16`), or an isoelectronic sequence over a range of Z
 * (`sequence=Al-like&zFrom=13&zTo=30`).
 */
export const CompareQuery = z
  .object({
    species: z.string().trim().max(800).optional(),
    element: z.string().trim().max(20).optional(),
    from: z.coerce.number().int().min(-1).max(118).optional(),
    to: z.coerce.number().int().min(-1).max(118).optional(),
    sequence: z.string().trim().max(20).optional(),
    zFrom: z.coerce.number().int().min(1).max(118).optional(),
    zTo: z.coerce.number().int().min(1).max(118).optional(),
    format: z.enum(['json', 'csv']).default('json'),
  })
  .refine((v) => [v.species, v.element, v.sequence].filter(Boolean).length === 1, {
    message: 'Give exactly one of: species (a list), element (with from and to), or sequence (with zFrom and zTo)',
  })

/** The most species one comparison holds. */
export const COMPARE_LIMIT = 120

/** POST /api/species/:id/samples. */
export const LinkSampleBody = z.object({ sampleId: z.uuid({ message: 'sampleId must be a sample id' }) })
/** DELETE /api/species/:id/samples/:sampleId. */
export const SpeciesSampleParams = z.object({ id: z.uuid(), sampleId: z.uuid() })
