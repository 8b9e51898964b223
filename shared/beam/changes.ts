/**
 * What changed between a saved plan's results and the same inputs run again on the current
 * engine: one line per number that moved by more than a rounding step.
 */
import type { BreedPlan, StripPlan } from './plan'

export interface PlanChange {
  what: string
  before: string
  after: string
}

const fmt = (x: number | null | undefined, digits = 4) => (x === null || x === undefined || !Number.isFinite(x) ? '—' : Number(x.toPrecision(digits)).toString())

function compare(out: PlanChange[], what: string, a: number | null | undefined, b: number | null | undefined, digits = 4) {
  const before = fmt(a, digits)
  const after = fmt(b, digits)
  if (before !== after) out.push({ what, before, after })
}

/** Differences between two results of one plan (stored first, current second). */
export function planChanges(
  before: { strip: StripPlan; breed: BreedPlan | null },
  after: { strip: StripPlan; breed: BreedPlan | null },
  chargeState: number | null,
): PlanChange[] {
  const out: PlanChange[] = []
  if (before.strip.engine !== after.strip.engine) out.push({ what: 'engine version', before: before.strip.engine, after: after.strip.engine })
  const named = (s: StripPlan) => [...s.models.map((m) => m.model), ...(s.notApplicable ?? []).map((m) => m.model)]
  const state = (s: StripPlan, name: string) => (s.models.some((m) => m.model === name) ? 'present' : s.notApplicable?.some((m) => m.model === name) ? 'not applicable' : 'absent')
  const models = new Set([...named(before.strip), ...named(after.strip)])
  for (const name of models) {
    const a = before.strip.models.find((m) => m.model === name)
    const b = after.strip.models.find((m) => m.model === name)
    if (!a || !b) {
      const was = state(before.strip, name)
      const now = state(after.strip, name)
      if (was !== now) out.push({ what: `model ${name}`, before: was, after: now })
      continue
    }
    compare(out, `${name}: mean charge`, a.meanCharge, b.meanCharge)
    compare(out, `${name}: width`, a.width, b.width)
    compare(out, `${name}: most probable charge`, a.mostProbable, b.mostProbable)
    if (chargeState !== null) compare(out, `${name}: fraction in ${chargeState}+`, a.fractions[chargeState]?.fraction, b.fractions[chargeState]?.fraction, 3)
    const warned = (m: typeof a) => m.warnings.join(' | ')
    if (warned(a) !== warned(b)) out.push({ what: `${name}: warnings`, before: warned(a) || 'none', after: warned(b) || 'none' })
  }
  if (chargeState !== null) {
    const ra = before.strip.rigidity.find((r) => r.charge === chargeState)
    const rb = after.strip.rigidity.find((r) => r.charge === chargeState)
    compare(out, `Bρ of ${chargeState}+ (T·m)`, ra?.tm, rb?.tm, 6)
    compare(out, `Eρ of ${chargeState}+ (MV)`, ra?.mv, rb?.mv, 6)
  }
  const la = before.strip.energyLoss
  const lb = after.strip.energyLoss
  compare(out, 'energy loss (MeV)', la?.estimated ? la.lossMeV : null, lb?.estimated ? lb.lossMeV : null, 3)
  if (before.breed || after.breed) {
    const steps = new Set([...(before.breed?.steps ?? []), ...(after.breed?.steps ?? [])].map((s) => s.charge))
    for (const q of steps) {
      compare(out, `σ(${q}+ → ${q + 1}+) (cm²)`, before.breed?.steps.find((s) => s.charge === q)?.crossSectionCm2, after.breed?.steps.find((s) => s.charge === q)?.crossSectionCm2, 3)
    }
  }
  return out
}
