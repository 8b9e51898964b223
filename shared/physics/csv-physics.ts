/**
 * The physics columns of a recorded species in a CSV row: configuration, term, the reference
 * ionisation energy with its stated uncertainty and source, and the best estimate with its method. "Best" is the record's
 * own best estimate (best-estimate.ts: the method with the smallest measured deviation for the
 * species' class) where the record carries one; older records without it fall back to a fixed
 * order of the methods (common practice, no source), skipping those that did not apply.
 */
import type { MethodName } from './methods'

const PREFERENCE: readonly MethodName[] = ['dirac-qed-hydrogen-like', 'dirac-hydrogen-like', 'dirac-scf-delta', 'scf-delta', 'slater-total-energy', 'slater-hydrogenic', 'scf-eigenvalue']

interface StoredRecord {
  configuration?: string
  term?: string | null
  ionisationEnergy?: { reference?: { eV: number; source: string; uncertaintyEv?: number } | null; estimates?: readonly { method: string; eV: number | null }[] }
  bestEstimate?: { method: string; eV: number } | null
}

/** The CSV physics columns of one stored species record (unknown shape: older engines' too). */
export function speciesCsvPhysics(record: unknown) {
  const r = (record ?? {}) as StoredRecord
  const estimates = (r.ionisationEnergy?.estimates ?? []).filter((e) => typeof e.eV === 'number' && e.eV > 0)
  const best = r.bestEstimate ?? PREFERENCE.map((m) => estimates.find((e) => e.method === m)).find((e) => !!e) ?? null
  return {
    configuration: r.configuration ?? '',
    term: r.term ?? '',
    referenceEv: r.ionisationEnergy?.reference?.eV ?? '',
    // NIST's stated uncertainty (engine 1.3.0 on; empty for older records and where none is stated)
    referenceUncertaintyEv: r.ionisationEnergy?.reference?.uncertaintyEv ?? '',
    referenceSource: r.ionisationEnergy?.reference?.source ?? '',
    bestEv: best?.eV ?? '',
    bestMethod: best?.method ?? '',
  }
}
