/**
 * A species record as readable plain text, for the command line and for plain-text exports.
 */
import type { SpeciesRecord } from './record'

const eV = (x: number) => (Math.abs(x) >= 1000 ? x.toFixed(1) : Math.abs(x) >= 10 ? x.toFixed(3) : x.toFixed(4))
const signed = (x: number, unit: string) => `${x >= 0 ? '+' : '−'}${Math.abs(x).toFixed(2)}${unit}`

function table(rows: string[][], indent: string): string[] {
  const widths = rows[0].map((_, i) => Math.max(...rows.map((r) => r[i].length)))
  return rows.map((r) => indent + r.map((cell, i) => cell.padEnd(widths[i])).join('  ').trimEnd())
}

/** Several indented lines describing one record; no trailing newline. */
export function formatRecord(r: SpeciesRecord): string {
  const lines: string[] = []
  const sequence = r.isoelectronic ? `, ${r.isoelectronic}` : ''
  lines.push(`${r.notations.spectroscopic} = ${r.notations.ionic}   ${r.name}, Z = ${r.z}, ${r.electrons} electron${r.electrons === 1 ? '' : 's'}${sequence}`)
  if (r.electrons === 0) lines.push('  bare nucleus: no electrons, no configuration or term')
  else {
    lines.push(`  configuration         ${r.configuration}`)
    if (r.core !== r.configuration) lines.push(`  with core             ${r.core}`)
    const how = r.termRule === 'table' ? `from ${r.termSource}` : "Hund's rules"
    lines.push(`  ground term           ${r.term ?? '—'}   (${how}); ${r.unpaired} unpaired`)
    if (r.configurationSource) lines.push(`  configuration from    ${r.configurationSource}`)
    if (r.referenceConfiguration) {
      const ref = r.referenceConfiguration
      lines.push(`  NIST ground shells    ${ref.configuration}${ref.level ? ` ${ref.level}` : ''}${ref.matches ? ' (same as the engine\'s)' : ' (differs from the engine\'s)'}`)
    }
    if (r.referenceGroundLevel) {
      const ref = r.referenceGroundLevel
      lines.push(`  NIST ground level     ${ref.configuration ?? '—'} ${ref.level ?? ''}${ref.tentative ? ' (tentative)' : ''}`.trimEnd())
    }
    lines.push("  screening (Slater's rules)")
    const hasRadius = r.screening.some((s) => s.zEffMeanRadius !== undefined)
    const head = ['subshell', 'n*', 'sigma', 'Z_eff', ...(hasRadius ? ['Z_eff (SCF <r>)'] : [])]
    const rows = r.screening.map((s) => [
      s.subshell,
      s.nStar.toFixed(1),
      s.sigma.toFixed(2),
      s.zEff.toFixed(2),
      ...(hasRadius ? [s.zEffMeanRadius?.toFixed(3) ?? ''] : []),
    ])
    lines.push(...table([head, ...rows], '    '))
  }
  const ie = r.ionisationEnergy
  if (r.electrons === 0) lines.push('  ionisation energy     none: no electron to remove')
  if (r.bestEstimate) {
    const b = r.bestEstimate
    lines.push(`  best estimate         ${eV(b.eV)} eV (${b.method}), typically ±${b.typicalPercent} % for ${b.classLabel}`)
  }
  if (r.electrons > 0) {
    lines.push(`  ionisation energy (next electron from ${ie.nextElectron})`)
    const rows: string[][] = []
    if (ie.reference) {
      const u = ie.reference.uncertaintyEv === undefined ? "" : ` ± ${ie.reference.uncertaintyEv}`
      const kind = ie.reference.kind ? `; ${ie.reference.kind}` : ''
      rows.push(["reference", `${eV(ie.reference.eV)} eV${u}`, '', `${ie.reference.source}${kind}`])
    }
    else rows.push(['reference', '—', '', r.electronAffinity && 'statement' in r.electronAffinity ? r.electronAffinity.statement : 'no reference value'])
    for (const e of ie.estimates) {
      if (e.eV === null) {
        rows.push([e.method, 'n/a', '', `not applicable: ${e.notApplicable ?? ''}`])
        continue
      }
      const deviation = e.deviationPercent === undefined ? '' : signed(e.deviationPercent, ' %')
      rows.push([e.method, `${eV(e.eV)} eV`, deviation, e.basis ?? ''])
    }
    lines.push(...table(rows, '    '))
    for (const e of ie.estimates) {
      for (const c of e.corrections ?? []) lines.push(`      ${e.method}: ${c.name} ${c.eV >= 0 ? '+' : '−'}${Math.abs(c.eV).toPrecision(4)} eV (${c.source})`)
    }
    for (const note of ie.notes) lines.push(`    note: ${note}`)
  }
  if (r.bindingEnergies.length > 0) {
    lines.push('  binding energies (relativistic SCF; outermost = ionisation energy)')
    lines.push(...table(r.bindingEnergies.map((b) => [b.subshell, `${eV(b.eV)} eV`, b.method]), '    '))
  }
  if (r.productionThreshold) {
    const p = r.productionThreshold
    lines.push(`  production threshold  ${eV(p.eV)} eV, the ionisation energy of ${p.from} (${p.source})`)
  } else if (r.productionThresholdNote) lines.push(`  production threshold  none: ${r.productionThresholdNote}`)
  lines.push(`  ${r.caution}`)
  lines.push(`  engine ${r.engine}`)
  return lines.join('\n')
}
