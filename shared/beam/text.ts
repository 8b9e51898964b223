/** Plain-text renderings of a strip or breed plan, for the command line. */
import type { BreedPlan, StripPlan } from './plan'

const pct = (f: number) => (f < 0.0005 ? '    ·' : `${(100 * f).toFixed(1).padStart(5)}`)
const sci = (x: number) => x.toExponential(2)

/** A strip plan as a table of charge states (one column per model), rigidity, loss and warnings. */
export function formatStrip(p: StripPlan): string {
  const lines: string[] = []
  const e = p.energy
  lines.push(`${p.ion} at ${e.mevPerU.toFixed(4)} MeV/u (${e.totalMeV.toFixed(3)} MeV total, ${e.mevPerNucleon.toFixed(4)} MeV/nucleon; β = ${e.beta.toFixed(5)}) through ${p.medium} (${p.mediumDetail.phase})`)
  lines.push('')
  const shown = p.rigidity.map((r) => r.charge)
  const absent = p.notApplicable ?? []
  const na = absent.map(() => 'n/a'.padStart(24)).join('')
  lines.push(`charge  ${[...p.models, ...absent].map((m) => m.model.padStart(24)).join('')}   Bρ [T·m]   Eρ [MV]`)
  for (const q of shown) {
    const r = p.rigidity.find((x) => x.charge === q)!
    lines.push(`${String(q).padStart(5)}+  ${p.models.map((m) => `${pct(m.fractions[q]?.fraction ?? 0)} %`.padStart(24)).join('')}${na}   ${r.tm.toFixed(5).padStart(8)}   ${r.mv.toFixed(3).padStart(8)}`)
  }
  lines.push(`mean    ${p.models.map((m) => m.meanCharge.toFixed(2).padStart(24)).join('')}${na}`)
  lines.push(`width   ${p.models.map((m) => m.width.toFixed(2).padStart(24)).join('')}${na}`)
  lines.push('')
  for (const m of p.models) {
    lines.push(`${m.model}: ${m.source}; range: ${m.range}`)
    for (const w of m.warnings) lines.push(`  ! ${w}`)
  }
  for (const n of absent) lines.push(`${n.model}: ${n.source}; not applicable: ${n.reason}`)
  if (p.energyLoss) {
    lines.push('')
    if (p.energyLoss.estimated) {
      const l = p.energyLoss
      lines.push(`Energy loss in ${l.arealDensityUgCm2} µg/cm²: ${l.lossMeV.toFixed(3)} MeV (${(1000 * l.lossMeVPerU).toFixed(2)} keV/u) ± ${(100 * l.uncertainty).toFixed(0)} %; exit ${l.exitMeVPerU.toFixed(4)} MeV/u`)
      lines.push(`  ${l.method}`)
      for (const w of l.warnings) lines.push(`  ! ${w}`)
    } else lines.push(p.energyLoss.reason)
  }
  lines.push('', p.rigidityNote, `Ion mass: ${p.ionDetail.massNote}.`)
  for (const w of p.warnings) lines.push(`! ${w}`)
  return lines.join('\n')
}

/** A breed plan as a table of steps and breeding factors, thresholds and warnings. */
export function formatBreed(p: BreedPlan): string {
  const lines: string[] = []
  lines.push(`${p.ion} bred by ${p.electronEnergyEv} eV electrons at ${p.currentDensityACm2} A/cm² (Lotz cross-sections ±${(100 * p.uncertainty).toFixed(0)} %)`)
  lines.push('')
  lines.push('step        σ [cm²]   binding [eV]  subshell   j·τ [A·s/cm²]   τ [s]      peak at [s]')
  for (const s of p.steps) {
    const b = p.breeding.find((x) => x.charge === s.charge + 1)!
    lines.push(`${String(s.charge).padStart(3)}→${String(s.charge + 1).padEnd(3)}  ${sci(s.crossSectionCm2).padStart(9)}   ${s.bindingEv.toFixed(1).padStart(10)}    ${s.subshell.padEnd(6)}   ${sci(b.jTauACm2).padStart(10)}   ${sci(b.timeS).padStart(9)}   ${b.peakTimeS === null ? '—' : sci(b.peakTimeS)}`)
  }
  lines.push('', 'Shells opening:')
  for (const t of p.thresholds) lines.push(`  from ${t.charge}+: ${t.subshell} at ${t.bindingEv.toFixed(1)} eV${t.reachable ? '' : ' — beyond this electron energy'}`)
  lines.push('', p.source)
  for (const w of p.warnings) lines.push(`! ${w}`)
  return lines.join('\n')
}
