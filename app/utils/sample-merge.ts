import type { SampleFormState } from './sample-form'

/** The form's fields as a person reads them in a clash, in form order. */
export const MERGE_FIELDS: Record<string, string> = {
  name: 'Name', material: 'Material', formula: 'Chemical formula', form: 'Form', status: 'Status', composition: 'Composition',
  arealDensity: 'Areal density', arealDensityUncertainty: 'Areal density uncertainty', thickness: 'Thickness', bulkDensity: 'Bulk density', massMg: 'Mass',
  backing: 'Backing', supplier: 'Supplier', lot: 'Lot', receivedOn: 'Received on', recertifyBy: 'Re-certify by', locationId: 'Storage place',
  hazardStatements: 'Hazard statements', radioactive: 'Radioactive', nuclide: 'Nuclide', activityBq: 'Activity', notes: 'Notes',
}

// The composition is one field for merging: its rows and their basis go together, or the
// fractions of one version would be read on the basis of the other.
function value(s: SampleFormState, field: string): string {
  if (field === 'composition') {
    // the row keys (outer, and those of an isotopic analysis's lines) only tell Vue the rows
    // apart: two copies of the same composition differ in them and nowhere else
    const rows = s.components
      .filter((c) => c.z || c.fraction || c.massNumber)
      .map(({ key: _k, ...c }) => ({ ...c, analysis: (c.analysis ?? []).map(({ key: _l, ...l }) => l) }))
    return JSON.stringify([s.basis, rows])
  }
  return String((s as unknown as Record<string, unknown>)[field] ?? '')
}

export interface FieldClash {
  field: string
  label: string
  yours: string
  theirs: string
  /** true when the field was changed in this form (the default is then to keep yours) */
  changedHere: boolean
}

/** The fields where what is being saved differs from the version now stored. */
export function clashes(base: SampleFormState, mine: SampleFormState, theirs: SampleFormState): FieldClash[] {
  return Object.keys(MERGE_FIELDS)
    .filter((f) => value(mine, f) !== value(theirs, f))
    .map((f) => ({ field: f, label: MERGE_FIELDS[f]!, yours: value(mine, f), theirs: value(theirs, f), changedHere: value(base, f) !== value(mine, f) }))
}

/** Their version with the fields in `keepMine` taken from mine. */
// Copies go through JSON: the states may be reactive proxies, which structuredClone refuses.
const copy = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T

export function merged(mine: SampleFormState, theirs: SampleFormState, keepMine: ReadonlySet<string>): SampleFormState {
  const out = copy(theirs) as unknown as Record<string, unknown>
  for (const f of keepMine) {
    if (f === 'composition') {
      out.components = copy(mine.components)
      out.basis = mine.basis
    } else out[f] = (mine as unknown as Record<string, unknown>)[f]
  }
  return out as unknown as SampleFormState
}
