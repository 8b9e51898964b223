/**
 * What an audit row changed, as lines a person reads: "name: Nickel foil → Nickel foil, rolled".
 * The rows keep the records before and after as JSON; this turns the pair into one line per field
 * that differs, with the field's name in words and each value in plain text. Pure: pages, the CSV
 * export and the sample history all use it.
 */
import { formatComposition } from '../samples/csv'
import { formatWhen } from '../format/datetime'

/** Field names in words; a field not listed is shown by its own name. */
export const FIELD_LABELS: Record<string, string> = {
  code: 'code', name: 'name', material: 'material', formula: 'formula', form: 'form', status: 'status',
  arealDensity: 'areal density (µg/cm²)', arealDensityUncertainty: 'areal density uncertainty (µg/cm²)', thickness: 'thickness (nm)',
  bulkDensity: 'bulk density (g/cm³)', massMg: 'mass (mg)', backing: 'backing', supplier: 'supplier', lot: 'lot',
  receivedOn: 'received on', recertifyBy: 're-certify by', locationId: 'storage place', hazardStatements: 'hazard statements',
  radioactive: 'radioactive', nuclide: 'nuclide', activityBq: 'activity (Bq)', notes: 'notes', components: 'composition',
  retiredAt: 'retired at', role: 'role', active: 'active', email: 'e-mail', reason: 'reason', number: 'number',
  supersededBy: 'replaced by', datasheet: 'datasheet', sample: 'sample', species: 'species', label: 'label',
  engine: 'engine version', methods: 'methods', rows: 'rows', codes: 'samples', layout: 'layout', copies: 'copies',
  custody: 'custody', holder: 'taken by', run: 'for', dueBack: 'due back', mg: 'used (mg)', note: 'note', to: 'to', from: 'from',
  scope: 'limit', until: 'until', lastHash: 'last row hash', kind: 'kind', parentId: 'inside',
}

// Book-keeping that changes with every edit and says nothing to a reader.
const HIDDEN = new Set(['id', 'version', 'updatedAt', 'createdAt', 'updatedBy', 'createdBy', 'location', 'hazardKinds', 'datasheets', 'invitation', 'batch', 'labelsInBatch'])

export interface ChangeLine {
  field: string
  label: string
  before: string
  after: string
}

const ISO_MOMENT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/

function isComponent(v: unknown): v is { z: number; massNumber: number | null; fraction: number } {
  return !!v && typeof v === 'object' && typeof (v as { z?: unknown }).z === 'number' && 'fraction' in (v as object)
}

/** One value in plain text: "—" for nothing, yes/no, lists joined, records by their name. */
export function showValue(v: unknown): string {
  if (v === null || v === undefined || v === '') return '—'
  if (typeof v === 'boolean') return v ? 'yes' : 'no'
  if (typeof v === 'number') return Number.isFinite(v) ? String(Number(v.toPrecision(12))) : String(v)
  if (typeof v === 'string') return ISO_MOMENT.test(v) ? formatWhen(v) : v
  if (Array.isArray(v)) {
    if (!v.length) return '—'
    if (v.every(isComponent)) {
      return formatComposition(v.map((c) => ({ z: c.z, massNumber: c.massNumber ?? null, fraction: Number(c.fraction), enrichmentPercent: (c as { enrichmentPercent?: number | null }).enrichmentPercent ?? null, fractionUncertainty: null, enrichmentUncertainty: null })))
    }
    return v.map(showValue).join(', ')
  }
  if (typeof v === 'object') {
    const o = v as Record<string, unknown>
    for (const key of ['path', 'number', 'fileName', 'label', 'code', 'name', 'email']) if (typeof o[key] === 'string') return o[key] as string
    return Object.entries(o)
      .filter(([k]) => !HIDDEN.has(k))
      .map(([k, x]) => `${FIELD_LABELS[k] ?? k} ${showValue(x)}`)
      .join(', ')
  }
  return String(v)
}

const asRecord = (v: unknown): Record<string, unknown> | null => (v && typeof v === 'object' && !Array.isArray(v) ? (v as Record<string, unknown>) : null)

// A storage place is shown by its path, which people read; the record keeps the id.
function valueOf(rec: Record<string, unknown>, field: string): unknown {
  if (field === 'locationId') return asRecord(rec.location)?.path ?? rec.locationId ?? null
  return rec[field]
}

/**
 * The fields that differ between `before` and `after`, in the order `after` lists them (then any
 * only `before` had). A record created has only `after`: every filled field reads "— → value";
 * a record removed reads "value → —". Values that are not records give one line, "value: a → b".
 */
export function describeChanges(before: unknown, after: unknown): ChangeLine[] {
  const b = asRecord(before)
  const a = asRecord(after)
  if (!b && !a) {
    if (before == null && after == null) return []
    return [{ field: 'value', label: 'value', before: showValue(before), after: showValue(after) }]
  }
  const fields = [...new Set([...Object.keys(a ?? {}), ...Object.keys(b ?? {})])].filter((f) => !HIDDEN.has(f))
  const lines: ChangeLine[] = []
  for (const field of fields) {
    const was = b ? valueOf(b, field) : undefined
    const now = a ? valueOf(a, field) : undefined
    const wasText = showValue(was)
    const nowText = showValue(now)
    if (wasText === nowText) continue
    lines.push({ field, label: FIELD_LABELS[field] ?? field, before: wasText, after: nowText })
  }
  return lines
}

/** The change lines as text, one "field: old → new" per line. */
export function changeText(before: unknown, after: unknown): string {
  return describeChanges(before, after)
    .map((l) => `${l.label}: ${l.before} → ${l.after}`)
    .join('\n')
}
