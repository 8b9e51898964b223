import type { SampleInput } from '#shared/schemas/samples'

// The sample form keeps every field as the text typed; SampleBody reads the text as the server
// does, so the form and the server agree on every number.

export interface ComponentRow {
  key: number
  z: string
  massNumber: string
  fraction: string
  enrichmentPercent: string
  fractionUncertainty: string
  enrichmentUncertainty: string
  /** how the isotope's make-up is given: an enrichment, or the supplier's full isotopic analysis */
  isotopics: 'enrichment' | 'analysis'
  analysis: AnalysisLine[]
}

/** One line of an isotopic analysis as typed: mass number, atom %, ± %. */
export interface AnalysisLine {
  key: number
  massNumber: string
  percent: string
  uncertainty: string
}

export interface SampleFormState {
  name: string
  material: string
  formula: string
  form: string
  status: string
  arealDensity: string
  arealDensityUncertainty: string
  thickness: string
  bulkDensity: string
  massMg: string
  backing: string
  supplier: string
  lot: string
  receivedOn: string
  recertifyBy: string
  locationId: string
  hazardStatements: string
  radioactive: boolean
  nuclide: string
  activityBq: string
  activityReferenceDate: string
  notes: string
  basis: 'atom' | 'mass'
  components: ComponentRow[]
}

// Row keys (they also name the inputs' ids). The form's first rows are numbered from 1 inside
// formState, so the server's HTML and the browser's first render agree; rows added later, in the
// browser only, take keys from a range the first rows never reach.
let nextKey = 1_000_000
const text = (v: unknown) => (v === null || v === undefined ? '' : String(v))

/** An empty composition row. */
export function blankComponent(key = nextKey++): ComponentRow {
  return { key, z: '', massNumber: '', fraction: '', enrichmentPercent: '', fractionUncertainty: '', enrichmentUncertainty: '', isotopics: 'enrichment', analysis: [] }
}

/** An analysis line, blank or filled. */
export function analysisLine(massNumber = '', percent = '', uncertainty = '', key = nextKey++): AnalysisLine {
  return { key, massNumber, percent, uncertainty }
}

interface StoredSample {
  [k: string]: unknown
  components: {
    z: number
    massNumber: number | null
    fraction: number
    basis: string
    enrichmentPercent: number | null
    fractionUncertainty: number | null
    enrichmentUncertainty: number | null
    analysis?: { massNumber: number; percent: number; uncertainty: number | null }[] | null
  }[]
  hazardStatements: string[]
  radioactive: boolean
}

/** The form's text for a stored sample, or for a new one. */
export function formState(s?: StoredSample | null): SampleFormState {
  const f = (k: string) => text(s?.[k])
  let key = 1
  return {
    name: f('name'), material: f('material'), formula: f('formula'), form: f('form') || 'foil', status: s && s.status !== 'retired' ? f('status') : 'available',
    arealDensity: f('arealDensity'), arealDensityUncertainty: f('arealDensityUncertainty'), thickness: f('thickness'), bulkDensity: f('bulkDensity'), massMg: f('massMg'),
    backing: f('backing'), supplier: f('supplier'), lot: f('lot'), receivedOn: f('receivedOn'), recertifyBy: f('recertifyBy'), locationId: f('locationId'),
    hazardStatements: (s?.hazardStatements ?? []).join(' '), radioactive: s?.radioactive ?? false, nuclide: f('nuclide'), activityBq: f('activityBq'), activityReferenceDate: f('activityReferenceDate'), notes: f('notes'),
    basis: s?.components[0]?.basis === 'mass' ? 'mass' : 'atom',
    components: s?.components.length
      ? s.components.map((c) => ({
          key: key++,
          z: text(c.z),
          massNumber: text(c.massNumber),
          fraction: text(c.fraction),
          enrichmentPercent: text(c.enrichmentPercent),
          fractionUncertainty: text(c.fractionUncertainty),
          enrichmentUncertainty: text(c.enrichmentUncertainty),
          isotopics: c.analysis?.length ? ('analysis' as const) : ('enrichment' as const),
          analysis: (c.analysis ?? []).map((r) => analysisLine(text(r.massNumber), text(r.percent), text(r.uncertainty), key++)),
        }))
      : [blankComponent(key++)],
  }
}

/** What the form sends: SampleBody's input. A row left wholly empty is not a component. */
export function formInput(s: SampleFormState): SampleInput {
  const { basis, components, ...fields } = s
  const rows = components.filter((c) => c.z || c.fraction || c.massNumber)
  // form and status are checked by the schema, which names the values it accepts
  return {
    ...fields,
    components: rows.map(({ key: _key, isotopics, analysis, ...c }) =>
      isotopics === 'analysis' && c.massNumber
        ? {
            ...c,
            enrichmentPercent: '',
            enrichmentUncertainty: '',
            massNumber: c.massNumber,
            basis,
            analysis: analysis.filter((l) => l.massNumber || l.percent || l.uncertainty).map(({ key: _k, ...l }) => l),
          }
        : { ...c, massNumber: c.massNumber || null, basis, analysis: null },
    ),
  } as SampleInput
}

/** Field errors by path ("components.0.fraction"), first message each. */
export function issuesByPath(issues: readonly { path: string | readonly PropertyKey[]; message: string }[]): Record<string, string> {
  const out: Record<string, string> = {}
  for (const i of issues) {
    const key = typeof i.path === 'string' ? i.path : i.path.map(String).join('.')
    out[key] ??= i.message
  }
  return out
}
