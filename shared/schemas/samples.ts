/**
 * The sample form and the sample routes share these schemas: what the page checks before sending
 * is exactly what the server checks on arrival.
 */
import { z } from 'zod'
import { ListQuery } from './common'
import { EDITABLE_STATUSES, FRACTION_BASES, LOCATION_KINDS, SAMPLE_FORMS, SAMPLE_STATUSES } from '../samples/vocabulary'
import { HAZARD_KINDS } from '../samples/hazards'
import { canonicalHCode, parseHazardStatements } from '../samples/ghs'
import { parseNuclide, formatNuclide } from '../samples/nuclide'
import { fractionSumProblem, isotopicMakeUp } from '../samples/composition'
import { formulaProblem } from '../samples/formula'
import { getElement } from '../physics/index'

const blankToNull = (v: unknown) => (v === '' || v === undefined ? null : v)

// A typed string becomes a number ("1,5" reads as 1.5); blank becomes null.
function toNumber(v: unknown) {
  const b = blankToNull(v)
  if (typeof b !== 'string') return b
  const n = Number(b.trim().replace(',', '.'))
  return Number.isNaN(n) ? b : n
}

/** An optional number, from a JSON number or a typed string; blank is null. */
function quantity(what: string, check: (n: z.ZodNumber) => z.ZodNumber = (n) => n) {
  return z.preprocess(toNumber, check(z.number({ error: `${what} must be a number` })).nullable())
}

const text = (max: number) => z.preprocess((v) => (typeof v === 'string' ? v.trim() : v), z.string().max(max, `Use at most ${max} characters`)).transform((s) => s || null).nullable()

const isoDate = z.preprocess(blankToNull, z.iso.date({ error: 'Enter a date as YYYY-MM-DD' }).nullable())

export const ComponentSchema = z.strictObject({
  z: z.coerce.number({ error: 'Choose an element' }).int().min(1, 'Choose an element').max(118, 'Choose an element'),
  massNumber: z.preprocess(blankToNull, z.coerce.number().int('A mass number is a whole number').min(1).max(300).nullable()),
  fraction: z.preprocess(toNumber, z.number({ error: 'Enter the fraction as a number' }).gt(0, 'A fraction is more than 0').lte(1, 'A fraction is at most 1')),
  basis: z.enum(FRACTION_BASES, { error: 'The basis is atom or mass' }),
  enrichmentPercent: quantity('The enrichment', (n) => n.gt(0, 'Enrichment is more than 0 %').lte(100, 'Enrichment is at most 100 %')).optional().default(null),
  fractionUncertainty: quantity('The uncertainty', (n) => n.min(0, 'An uncertainty is not negative').max(1e9, 'The uncertainty must be at most 10⁹ µg/cm²')).optional().default(null),
  enrichmentUncertainty: quantity('The uncertainty', (n) => n.min(0, 'An uncertainty is not negative').max(1e9, 'The uncertainty must be at most 10⁹ µg/cm²')).optional().default(null),
})
export type ComponentBody = z.output<typeof ComponentSchema>

// Checked in refinements (which let the other checks run on) and only then transformed, so a
// form with a bad code still hears about every other problem at once.
const hazardStatements = z
  .union([z.string(), z.array(z.string())], { error: 'Give hazard statements as H-codes, e.g. H300 H330' })
  .superRefine((v, ctx) => {
    for (const code of parseHazardStatements(v).unknown) {
      ctx.addIssue({ code: 'custom', message: `"${code.slice(0, 20)}" is not a GHS hazard statement code (use codes such as H225, H300+H330 or H350i)` })
    }
  })
  .transform((v) => parseHazardStatements(v).codes)

const nuclide = z
  .preprocess(blankToNull, z.string().max(20).nullable())
  .refine((v) => v === null || parseNuclide(v) !== null, 'Name a known nuclide, e.g. U-238 or 241Am')
  .transform((v) => (v === null ? null : formatNuclide(parseNuclide(v)!)))

/** The rules of a composition as a whole: no repeats, one basis, real isotopes, a sum of 1. */
function checkComponents(components: ComponentBody[], ctx: z.RefinementCtx) {
  const issue = (path: (string | number)[], message: string) => ctx.addIssue({ code: 'custom', path, message })
  const seen = new Set<string>()
  components.forEach((c, i) => {
    const element = getElement(c.z)
    if (!element) return
    const key = `${c.z}-${c.massNumber ?? 'nat'}`
    if (seen.has(key)) issue([i, c.massNumber === null ? 'z' : 'massNumber'], `${c.massNumber ?? ''}${element.symbol}${c.massNumber === null ? ' (natural)' : ''} is listed twice`)
    seen.add(key)
    if (c.massNumber === null && c.enrichmentPercent !== null) issue([i, 'enrichmentPercent'], 'Enrichment belongs to a named isotope; leave it empty for the natural element')
    if (c.enrichmentUncertainty !== null && c.enrichmentPercent === null) issue([i, 'enrichmentUncertainty'], 'Give the enrichment this uncertainty belongs to')
    if (i > 0 && c.basis !== components[0]!.basis) issue([i, 'basis'], 'Give every fraction on the same basis (all atom or all mass fractions)')
    const makeUp = isotopicMakeUp(c.z, c.massNumber, c.enrichmentPercent)
    if (!makeUp.ok) issue([i, c.massNumber === null ? 'z' : 'massNumber'], makeUp.message)
  })
  const sum = fractionSumProblem(components)
  if (sum) issue([], sum)
}

// Every field a person fills in, without defaults, so that a partial update leaves out what it
// does not change. Cross-field rules are in `checkSample`.
const SampleFields = z.strictObject({
  name: z.string().trim().min(1, 'Enter a name').max(200, 'Use at most 200 characters'),
  material: z.string().trim().min(1, 'Enter the material').max(200, 'Use at most 200 characters'),
  formula: text(100).refine((f) => f === null || !formulaProblem(f), { error: (i) => formulaProblem(String(i.input)) ?? 'Not a formula' }),
  form: z.enum(SAMPLE_FORMS, { error: `The form is one of: ${SAMPLE_FORMS.join(', ')}` }),
  status: z.enum(EDITABLE_STATUSES, { error: `The status is one of: ${EDITABLE_STATUSES.join(', ')} (retire a sample with the retire action)` }),
  arealDensity: quantity('The areal density', (n) => n.gt(0, 'The areal density must be more than 0').max(1e9, 'The areal density must be at most 10⁹ µg/cm² (1 kg/cm²)')),
  arealDensityUncertainty: quantity('The uncertainty', (n) => n.min(0, 'An uncertainty is not negative').max(1e9, 'The uncertainty must be at most 10⁹ µg/cm²')),
  thickness: quantity('The thickness', (n) => n.gt(0, 'The thickness must be more than 0').max(1e10, 'The thickness must be at most 10¹⁰ nm (10 m)')),
  bulkDensity: quantity('The bulk density', (n) => n.gt(0, 'The bulk density must be more than 0').max(25, 'No material is denser than 25 g/cm³')),
  massMg: quantity('The mass', (n) => n.min(0, 'The mass is not negative').max(1e9, 'The mass must be at most 10⁹ mg (1 t)')),
  backing: text(200),
  supplier: text(200),
  lot: text(100),
  receivedOn: isoDate,
  recertifyBy: isoDate,
  locationId: z.preprocess(blankToNull, z.uuid({ error: 'Choose a storage place from the list' }).nullable()),
  hazardStatements,
  radioactive: z.boolean({ error: 'Radioactive is true or false' }),
  nuclide,
  activityBq: quantity('The activity', (n) => n.gt(0, 'The activity must be more than 0 Bq').max(1e18, 'The activity must be at most 10¹⁸ Bq')),
  notes: text(4000),
  components: z.array(ComponentSchema).max(40, 'At most 40 components').superRefine(checkComponents),
})

type Fields = z.output<typeof SampleFields>

// Rules across fields. Each runs as soon as the fields it reads have parsed, so a wrong value
// elsewhere (a form, a date) does not hide it.
function rule(fields: string[], check: (s: Fields, issue: (path: string, message: string) => void) => void) {
  return [
    (s: Fields, ctx: z.RefinementCtx) => {
      if (typeof s === 'object' && s !== null) check(s, (path, message) => ctx.addIssue({ code: 'custom', path: [path], message }))
    },
    { when: (payload: { issues: readonly { path?: readonly PropertyKey[] }[] }) => !payload.issues.some((i) => fields.includes(String(i.path?.[0]))) },
  ] as const
}

const UNCERTAINTY_NEEDS_VALUE = rule(['arealDensity', 'arealDensityUncertainty'], (s, issue) => {
  if (s.arealDensityUncertainty !== null && s.arealDensity === null) issue('arealDensityUncertainty', 'Give the areal density the uncertainty belongs to')
})
const DATES_IN_ORDER = rule(['receivedOn', 'recertifyBy'], (s, issue) => {
  if (s.receivedOn && s.recertifyBy && s.recertifyBy < s.receivedOn) issue('recertifyBy', 'The re-certify-by date cannot be before the date received')
})
const RADIOACTIVE_NEEDS_NUCLIDE = rule(['radioactive', 'nuclide', 'activityBq'], (s, issue) => {
  if (s.radioactive) {
    if (!s.nuclide) issue('nuclide', 'A radioactive sample needs its nuclide, e.g. U-238')
    if (s.activityBq === null) issue('activityBq', 'A radioactive sample needs its activity in Bq')
  } else {
    if (s.nuclide) issue('nuclide', 'Tick "radioactive", or leave the nuclide empty')
    if (s.activityBq !== null) issue('activityBq', 'Tick "radioactive", or leave the activity empty')
  }
})

/** A complete sample, as the form sends it and as POST /api/samples takes it. */
export const SampleBody = SampleFields.extend({
  formula: SampleFields.shape.formula.optional().default(null),
  status: SampleFields.shape.status.optional().default('available'),
  arealDensity: SampleFields.shape.arealDensity.optional().default(null),
  arealDensityUncertainty: SampleFields.shape.arealDensityUncertainty.optional().default(null),
  thickness: SampleFields.shape.thickness.optional().default(null),
  bulkDensity: SampleFields.shape.bulkDensity.optional().default(null),
  massMg: SampleFields.shape.massMg.optional().default(null),
  backing: SampleFields.shape.backing.optional().default(null),
  supplier: SampleFields.shape.supplier.optional().default(null),
  lot: SampleFields.shape.lot.optional().default(null),
  receivedOn: SampleFields.shape.receivedOn.optional().default(null),
  recertifyBy: SampleFields.shape.recertifyBy.optional().default(null),
  locationId: SampleFields.shape.locationId.optional().default(null),
  hazardStatements: SampleFields.shape.hazardStatements.optional().default([]),
  radioactive: SampleFields.shape.radioactive.optional().default(false),
  nuclide: SampleFields.shape.nuclide.optional().default(null),
  activityBq: SampleFields.shape.activityBq.optional().default(null),
  notes: SampleFields.shape.notes.optional().default(null),
  components: SampleFields.shape.components.optional().default([]),
})
  .superRefine(...UNCERTAINTY_NEEDS_VALUE)
  .superRefine(...DATES_IN_ORDER)
  .superRefine(...RADIOACTIVE_NEEDS_NUCLIDE)
export type SampleInput = z.input<typeof SampleBody>
export type SampleData = z.output<typeof SampleBody>

/** PATCH /api/samples/:id: any fields to change, and the version they were read at. */
export const SamplePatchBody = SampleFields.partial().extend({
  version: z.number({ error: 'Send the version you edited (a whole number)' }).int().min(1),
})

/** The value that stands for "no value" in each field, for turning a PATCH into a whole sample. */
export type SamplePatch = z.output<typeof SamplePatchBody>

export const SAMPLE_SORTS = ['code', 'name', 'material', 'form', 'status', 'arealDensity', 'thickness', 'receivedOn', 'recertifyBy', 'location', 'updatedAt'] as const

const elementParam = z
  .string()
  .trim()
  .max(20)
  .transform((v, ctx) => {
    const e = /^\d+$/.test(v) ? getElement(Number(v)) : getElement(v)
    if (!e) {
      ctx.addIssue({ code: 'custom', message: 'Name an element by symbol or Z, e.g. Ni or 28' })
      return z.NEVER
    }
    return e.z
  })

const isotopeParam = z
  .string()
  .trim()
  .max(20)
  .transform((v, ctx) => {
    const n = parseNuclide(v)
    if (!n) {
      ctx.addIssue({ code: 'custom', message: 'Name an isotope, e.g. Ca-48 or 58Ni' })
      return z.NEVER
    }
    return { z: n.z, massNumber: n.massNumber }
  })

const emptyAsUndefined = (v: unknown) => (v === '' ? undefined : v)

/** GET /api/samples: search, filters, sort, paging, and the CSV export of the same list. */
export const SampleListQuery = ListQuery.extend({
  sort: z.preprocess(emptyAsUndefined, z.string().regex(new RegExp(`^-?(${SAMPLE_SORTS.join('|')})$`), `Sort by one of: ${SAMPLE_SORTS.join(', ')} (prefix - for descending)`).optional()),
  element: z.preprocess(emptyAsUndefined, elementParam.optional()),
  isotope: z.preprocess(emptyAsUndefined, isotopeParam.optional()),
  form: z.preprocess(emptyAsUndefined, z.enum(SAMPLE_FORMS, { error: `The form is one of: ${SAMPLE_FORMS.join(', ')}` }).optional()),
  status: z.preprocess(emptyAsUndefined, z.enum([...SAMPLE_STATUSES, 'any'], { error: `The status is one of: ${SAMPLE_STATUSES.join(', ')}, any` }).optional()),
  location: z.preprocess(emptyAsUndefined, z.uuid({ error: 'Not a storage place id' }).optional()),
  due: z.preprocess(emptyAsUndefined, z.enum(['overdue', '30', '90'], { error: 'Due is overdue, 30 or 90 (days)' }).optional()),
  hazard: z.preprocess(
    emptyAsUndefined,
    z
      .string()
      .max(20)
      .transform((v, ctx) => {
        const kind = HAZARD_KINDS.find((k) => k === v.trim().toLowerCase())
        const code = kind ? null : canonicalHCode(v)
        if (!kind && !code) {
          ctx.addIssue({ code: 'custom', message: `The hazard is one of: ${HAZARD_KINDS.join(', ')}, or a GHS H-code` })
          return z.NEVER
        }
        return (kind ?? code)!
      })
      .optional(),
  ),
  format: z.enum(['json', 'csv']).default('json'),
})
export type SampleListParams = z.output<typeof SampleListQuery>

export const CodeParam = z.object({ code: z.string().trim().toUpperCase().regex(/^S-\d{4}-\d{6,}$/) })

/** POST /api/locations. */
export const LocationBody = z.strictObject({
  kind: z.enum(LOCATION_KINDS, { error: `The kind is one of: ${LOCATION_KINDS.join(', ')}` }),
  code: z.string().trim().min(1, 'Enter a code').max(40, 'Use at most 40 characters').regex(/^[A-Za-z0-9][A-Za-z0-9._/-]*$/, 'Use letters, digits and . _ / - only, e.g. B2-114'),
  name: z.string().trim().min(1, 'Enter a name').max(120, 'Use at most 120 characters'),
  parentId: z.preprocess(blankToNull, z.uuid({ error: 'Choose the place it is in' }).nullable()).optional().default(null),
})

/** POST /api/samples/import?dryRun=true. */
export const ImportQuery = z.object({
  dryRun: z.enum(['true', 'false', '1', '0']).optional().transform((v) => v === 'true' || v === '1'),
})

/** DELETE /api/samples/:id?version=N: retiring names the version the person saw. */
export const DeleteSampleQuery = z.object({ version: z.coerce.number({ error: 'Give the version you retire (version=N)' }).int().min(1) })
