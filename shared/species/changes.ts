import type { SpeciesRecord } from '../physics'

export interface RecordChange {
  field: string
  before: string | number | null
  after: string | number | null
}

type Comparable = Pick<SpeciesRecord, 'configuration' | 'core' | 'term' | 'isoelectronic' | 'ionisationEnergy' | 'productionThreshold'>

function estimatesOf(r: Comparable): Map<string, number | null> {
  return new Map(r.ionisationEnergy.estimates.map((e) => [e.method, e.eV]))
}

/**
 * What differs between two frozen records of one species (an older engine's and a newer one's):
 * the configuration, term and sequence, the reference and threshold, and each method's estimate
 * (a method present in only one of them shows as null on the other side).
 */
export function recordChanges(before: Comparable, after: Comparable): RecordChange[] {
  const changes: RecordChange[] = []
  const text = (field: string, a: string | null, b: string | null) => {
    if (a !== b) changes.push({ field, before: a, after: b })
  }
  const number = (field: string, a: number | null | undefined, b: number | null | undefined) => {
    const x = a ?? null
    const y = b ?? null
    // Records round to 6 significant digits; anything closer is the same value.
    if (x === null || y === null ? x !== y : Math.abs(x - y) > 1e-6 * Math.max(Math.abs(x), Math.abs(y))) changes.push({ field, before: x, after: y })
  }
  text('configuration', before.configuration, after.configuration)
  text('core', before.core, after.core)
  text('term', before.term, after.term)
  text('isoelectronic', before.isoelectronic, after.isoelectronic)
  number('reference eV', before.ionisationEnergy.reference?.eV, after.ionisationEnergy.reference?.eV)
  number('production threshold eV', before.productionThreshold?.eV, after.productionThreshold?.eV)
  const a = estimatesOf(before)
  const b = estimatesOf(after)
  for (const method of [...new Set([...a.keys(), ...b.keys()])].sort()) number(`${method} eV`, a.get(method), b.get(method))
  return changes
}
