import { z } from 'zod'
import { ENERGY_UNITS } from '../beam/kinematics'

const ion = z.string().trim().min(1, 'Enter an ion, e.g. 208Pb27+ or Ar').max(32, 'An ion is at most 32 characters')
const positive = (what: string, max: number) =>
  z.coerce.number({ message: `${what} must be a number` }).positive(`${what} must be above 0`).max(max, `${what} is at most ${max}`)
const medium = z.string().trim().min(1, 'Enter a stripper: an element or formula such as C, N2, Ar').max(24, 'A stripper formula is at most 24 characters')
const flag = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1')

/** GET /api/beam/charge-states: the ion, its energy with a unit, and the stripper. */
export const ChargeStatesQuery = z.object({
  ion,
  energy: positive('energy', 1e5),
  unit: z.enum(ENERGY_UNITS, { message: `unit must be one of ${ENERGY_UNITS.join(', ')}` }).default('MeV/u'),
  medium,
  gas: flag.optional(),
  arealDensity: positive('arealDensity (µg/cm²)', 1e6).optional(),
})

/** GET /api/beam/breeding: the ion, the electron-beam energy (eV) and current density (A/cm²). */
export const BreedingQuery = z.object({
  ion,
  electronEnergy: positive('electronEnergy (eV)', 1e6),
  currentDensity: positive('currentDensity (A/cm²)', 1e6),
})

/** GET /api/beam/stock: the stripper foils in stock, and samples able to source element z. */
export const BeamStockQuery = z.object({
  z: z.coerce.number({ message: 'z must be an element number' }).int().min(1, 'z is at least 1').max(118, 'z is at most 118').optional(),
  massNumber: z.coerce.number().int().min(1).max(400).optional(),
})

/** POST /api/beam/plans: what to plan, with the stock it uses and the charge state chosen. */
export const BeamPlanBody = z
  .object({
    title: z.string().trim().max(120, 'A title is at most 120 characters').optional(),
    ion,
    energy: positive('energy', 1e5),
    unit: z.enum(ENERGY_UNITS).default('MeV/u'),
    medium: medium.optional(),
    gas: z.boolean().optional(),
    arealDensity: positive('arealDensity (µg/cm²)', 1e6).optional(),
    stripperSampleId: z.uuid('stripperSampleId must be a sample id').optional(),
    sourceSampleId: z.uuid('sourceSampleId must be a sample id').optional(),
    chargeState: z.number().int('chargeState must be a whole number').min(1).max(118).optional(),
    breeding: z.object({ electronEnergy: positive('electronEnergy (eV)', 1e6), currentDensity: positive('currentDensity (A/cm²)', 1e6) }).optional(),
    note: z.string().trim().max(2000, 'A note is at most 2000 characters').optional(),
  })
  .refine((v) => v.medium || v.stripperSampleId, { message: 'Give a stripper medium or a stripper foil from the stock', path: ['medium'] })

export type BeamPlanInput = z.output<typeof BeamPlanBody>

/** GET /api/beam/plans: search, filters, paging and CSV export. */
export const BeamPlanListQuery = z.object({
  q: z.string().trim().max(60).optional(),
  element: z.string().trim().max(20).optional(),
  sampleId: z.uuid('sampleId must be a sample id').optional(),
  sort: z.string().max(40).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
  format: z.enum(['json', 'csv']).default('json'),
})
