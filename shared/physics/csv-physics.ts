/**
 * The physics columns of a recorded species in a CSV row: configuration, term, the reference
 * ionisation energy with its source, and the best estimate with its method. "Best" is a fixed
 * order of the methods (ours, common practice, no source): the exact one-electron Dirac value
 * where it applies, then ΔSCF, then the Slater total-energy difference, then the rest — chosen
 * without looking at the reference, so the column says what the engine would offer alone.
 */
import type { MethodName } from './methods'

const PREFERENCE: readonly MethodName[] = ['dirac-hydrogen-like', 'scf-delta', 'slater-total-energy', 'slater-hydrogenic', 'scf-eigenvalue']

interface StoredRecord {
  configuration?: string
  term?: string | null
  ionisationEnergy?: { reference?: { eV: number; source: string } | null; estimates?: readonly { method: string; eV: number }[] }
}

export function speciesCsvPhysics(record: unknown) {
  const r = (record ?? {}) as StoredRecord
  const estimates = r.ionisationEnergy?.estimates ?? []
  const best = PREFERENCE.map((m) => estimates.find((e) => e.method === m)).find((e) => !!e) ?? null
  return {
    configuration: r.configuration ?? '',
    term: r.term ?? '',
    referenceEv: r.ionisationEnergy?.reference?.eV ?? '',
    referenceSource: r.ionisationEnergy?.reference?.source ?? '',
    bestEv: best?.eV ?? '',
    bestMethod: best?.method ?? '',
  }
}
