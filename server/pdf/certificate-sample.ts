// The sections of a sample's certificate, from its frozen payload.
import { HEADINGS } from '../../shared/certificates/payload'
import type { SamplePayload, Quantity } from '../../shared/certificates/sample-payload'
import { formatQuantity, formatValue } from '../../shared/certificates/format'
import { runs } from './fonts'
import { heading, para, sideBySide, table, MUTED } from './certificate-parts'

function quantityRow(label: string, q: Quantity | null, note = ''): string[] | null {
  if (!q) return null
  return [label, formatQuantity(q.value, q.uncertainty, ''), q.unit, q.derived ? `derived${note ? `; ${note}` : ''}` : note || 'recorded']
}

function properties(p: SamplePayload) {
  const pr = p.properties
  const rows = [
    quantityRow('Areal density', pr.arealDensity),
    quantityRow('Thickness', pr.thickness),
    quantityRow('Bulk density', pr.bulkDensity),
    quantityRow('Mass at issue', pr.mass),
    quantityRow('Mean atomic mass', pr.meanAtomicMass),
    pr.radioactivity ? ['Activity', formatValue(pr.radioactivity.activityBq), 'Bq', pr.radioactivity.nuclide ?? 'nuclide not recorded'] : null,
  ].filter((r): r is string[] => r !== null)
  const out: Record<string, unknown>[] = [heading(HEADINGS.properties)]
  if (rows.length) out.push(table(['Quantity', 'Value', 'Unit', 'Basis'], rows, [90, 90, 40, '*']))
  if (pr.composition.length) {
    out.push(
      table(
        [`Component`, 'Element', `Fraction (${pr.basis ?? 'atom'})`, 'Isotopic enrichment'],
        pr.composition.map((c) => [
          c.label,
          c.element,
          formatQuantity(c.fraction, c.fractionUncertainty, ''),
          c.enrichmentPercent !== null ? formatQuantity(c.enrichmentPercent, c.enrichmentUncertainty, '%') : c.massNumber === null ? 'natural isotopic composition' : '100 % (isotopically pure as recorded)',
        ]),
        [60, 80, 90, '*'],
      ),
    )
  } else out.push(para('No composition is recorded for this sample.'))
  if (pr.isotopes.length && pr.isotopes.some((i) => i.atomsPerCm2 !== null)) {
    out.push(
      table(
        ['Isotope', 'Atom fraction', 'Atoms per cm² (derived)'],
        pr.isotopes.map((i) => [i.label, formatValue(i.atomFraction, 5), i.atomsPerCm2 === null ? '—' : formatQuantity(i.atomsPerCm2, i.atomsPerCm2Uncertainty, '')]),
        [60, 90, '*'],
      ),
    )
  }
  out.push(para(pr.uncertaintyNote, { style: 'small' }))
  return out
}

function hazards(p: SamplePayload) {
  const h = p.hazards
  const out: Record<string, unknown>[] = [heading(HEADINGS.hazards)]
  if (h.statements.length) out.push(table(['GHS code', 'Hazard statement'], h.statements.map((s) => [s.code, s.text || 'statement text not in the list']), [50, '*']))
  else out.push(para("No GHS hazard statement is recorded for this sample; check the supplier's safety data sheet."))
  for (const c of h.cautions) {
    out.push({
      table: { widths: ['*'], body: [[{ stack: [{ text: runs(`Caution: ${c.title}`), bold: true }, { text: runs(c.reasons.join(' ')) }, { text: runs(c.advice) }] }]] },
      layout: { hLineWidth: () => 0.8, vLineWidth: () => 0.8, hLineColor: () => '#c98a00', vLineColor: () => '#c98a00', fillColor: () => '#fff6dc', paddingTop: () => 3, paddingBottom: () => 3, paddingLeft: () => 5, paddingRight: () => 5 },
      margin: [0, 1, 0, 4],
    })
  }
  out.push(para(h.deferral))
  if (h.statements.length) out.push(para(`Statement texts: ${h.statementSource}.`, { style: 'small' }))
  return out
}

/** Everything between the title block and the issuer, for a sample. */
export function sampleSections(p: SamplePayload): Record<string, unknown>[] {
  return [
    sideBySide([heading(HEADINGS.description), para(p.description)], [heading(HEADINGS.intendedUse), para(p.intendedUse)]),
    ...properties(p),
    heading(HEADINGS.method),
    para(p.method.statement),
    { ul: p.method.formulas.map((f) => ({ text: runs(f) })), fontSize: 7.5, margin: [0, 0, 0, 2] },
    para(p.method.dataSource, { style: 'small' }),
    heading(HEADINGS.traceability),
    para(p.traceability),
    ...(p.records.length
      ? [table(['Document on file', 'SHA-256'], p.records.map((r) => [r.fileName, { text: runs(r.sha256, 'Mono'), fontSize: 6.4 }]), ['*', 'auto'])]
      : []),
    sideBySide(
      [heading(HEADINGS.validity), para(p.validity.statement)],
      [heading(HEADINGS.storage), p.storage.place ? para(`Kept at ${p.storage.place}.`) : para('No storage place is recorded.', { color: MUTED }), para(p.storage.instructions)],
    ),
    ...hazards(p),
  ]
}
