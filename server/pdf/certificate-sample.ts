// The sections of a sample's certificate, from its frozen payload. Each heading is kept on one
// page with what it heads (an unbreakable stack of the heading and its first block).
import { HEADINGS } from '../../shared/certificates/payload'
import type { SamplePayload, Quantity } from '../../shared/certificates/sample-payload'
import { formatMeasured, formatPlain } from '../../shared/format/measured'
import { formatDay } from '../../shared/certificates/format'
import { runs } from './fonts'
import { heading, para, sideBySide, table, MUTED } from './certificate-parts'

type Block = Record<string, unknown>

/** A heading with the block it heads, never split across pages; further blocks follow freely. */
function section(title: string, first: Block[], rest: Block[] = []): Block[] {
  return [{ stack: [heading(title), ...first], unbreakable: true }, ...rest]
}

function quantityRow(label: string, q: Quantity | null, note = ''): string[] | null {
  if (!q) return null
  return [label, formatMeasured(q.value, q.uncertainty, '', 6), q.unit, q.derived ? `derived${note ? `; ${note}` : ''}` : note || 'recorded']
}

type Component = SamplePayload['properties']['composition'][number]

function isotopics(c: Component): string {
  if (c.analysis?.length) return 'isotopic analysis, below'
  if (c.enrichmentPercent !== null) return formatMeasured(c.enrichmentPercent, c.enrichmentUncertainty, '%')
  return c.massNumber === null ? 'natural isotopic composition' : '100 % (the only natural isotope)'
}

type Radioactivity = SamplePayload['properties']['radioactivity']

// The recorded activity with its reference date, and the activity at issue corrected for decay
// (older payloads carry the recorded activity alone).
function activityRows(r: Radioactivity): string[][] {
  if (!r) return []
  const x = r as NonNullable<Radioactivity> & Partial<{ referenceDate: string | null; atIssue: { on: string; activityBq: number; daughters: { nuclide: string; activityBq: number }[]; decayCorrected: boolean } | null }>
  const nuclide = x.nuclide ?? 'nuclide not recorded'
  const rows = [['Activity', formatPlain(x.activityBq), 'Bq', x.referenceDate ? `${nuclide}, recorded for ${formatDay(x.referenceDate)}` : nuclide]]
  if (x.atIssue) {
    rows.push(['Activity at issue', formatPlain(x.atIssue.activityBq), 'Bq', x.atIssue.decayCorrected ? `${nuclide} on ${formatDay(x.atIssue.on)}, decay-corrected` : `${nuclide}: half-life not in the table, as recorded`])
    for (const d of x.atIssue.daughters) rows.push([`  daughter ${d.nuclide}`, formatPlain(d.activityBq), 'Bq', `grown in by ${formatDay(x.atIssue.on)}`])
  }
  return rows
}

function properties(p: SamplePayload): Block[] {
  const pr = p.properties
  const rows = [
    quantityRow('Areal density', pr.arealDensity),
    quantityRow('Thickness', pr.thickness),
    quantityRow('Bulk density', pr.bulkDensity),
    quantityRow('Mass at issue', pr.mass),
    quantityRow('Mean atomic mass', pr.meanAtomicMass),
    ...activityRows(pr.radioactivity),
  ].filter((r): r is string[] => r !== null)
  const first: Block[] = rows.length ? [table(['Quantity', 'Value', 'Unit', 'Basis'], rows, [90, 110, 40, '*'])] : []
  const rest: Block[] = []
  if (pr.composition.length) {
    rest.push(
      table(
        ['Component', 'Element', `Fraction (${pr.basis ?? 'atom'})`, 'Isotopic enrichment'],
        pr.composition.map((c) => [c.label, c.element, formatMeasured(c.fraction, c.fractionUncertainty, '', 6), isotopics(c)]),
        [60, 80, 90, '*'],
      ),
    )
    for (const c of pr.composition.filter((x) => x.analysis?.length)) {
      rest.push({
        stack: [
          para(`Isotopic analysis of ${c.label} as supplied (atom %):`, { style: 'small' }),
          table(['Isotope', 'Atom fraction'], c.analysis!.map((r) => [r.label, formatMeasured(r.percent, r.uncertainty, '%', 6)]), [60, '*']),
        ],
        unbreakable: true,
      })
    }
  } else rest.push(para('No composition is recorded for this sample.'))
  if (pr.isotopes.length) {
    const perArea = pr.isotopes.some((i) => i.atomsPerCm2 !== null)
    rest.push({
      stack: [
        table(
          ['Isotope', 'Atom fraction (derived)', ...(perArea ? ['Atoms per cm² (derived)'] : [])],
          pr.isotopes.map((i) => [
            i.label,
            formatMeasured(i.atomFraction * 100, i.atomFractionUncertainty == null ? null : i.atomFractionUncertainty * 100, '%', 5),
            ...(perArea ? [i.atomsPerCm2 === null ? '—' : formatMeasured(i.atomsPerCm2, i.atomsPerCm2Uncertainty, '', 4)] : []),
          ]),
          [60, 120, '*'].slice(0, perArea ? 3 : 2),
        ),
      ],
      unbreakable: true,
    })
  }
  rest.push(para(pr.uncertaintyNote, { style: 'small' }))
  const radio = pr.radioactivity as (Radioactivity & { sources?: string }) | null
  if (radio?.sources) rest.push(para(`Activity: ${radio.sources} The institution's radiation protection officer keeps the authoritative record.`, { style: 'small' }))
  if (!first.length) return section(HEADINGS.properties, rest.slice(0, 1), rest.slice(1))
  return section(HEADINGS.properties, first, rest)
}

function hazards(p: SamplePayload): Block[] {
  const h = p.hazards
  const first: Block[] = h.statements.length
    ? [table(['GHS code', 'Hazard statement'], h.statements.map((s) => [s.code, s.text || 'statement text not in the list']), [50, '*'])]
    : [para("No GHS hazard statement is recorded for this sample; check the supplier's safety data sheet.")]
  const rest: Block[] = h.cautions.map((c) => ({
    table: { widths: ['*'], body: [[{ stack: [{ text: runs(`Caution: ${c.title}`), bold: true }, { text: runs(c.reasons.join(' ')) }, { text: runs(c.advice) }] }]] },
    layout: { hLineWidth: () => 0.8, vLineWidth: () => 0.8, hLineColor: () => '#c98a00', vLineColor: () => '#c98a00', fillColor: () => '#fff6dc', paddingTop: () => 3, paddingBottom: () => 3, paddingLeft: () => 5, paddingRight: () => 5 },
    margin: [0, 1, 0, 4],
    unbreakable: true,
  }))
  rest.push(para(h.deferral))
  if (h.statements.length) rest.push(para(`Statement texts: ${h.statementSource}.`, { style: 'small' }))
  return section(HEADINGS.hazards, first, rest)
}

function method(p: SamplePayload): Block[] {
  // Certificates issued before the sources were itemised carry one line instead.
  const m = p.method as SamplePayload['method'] & { dataSource?: string }
  const sources = m.dataSources ?? (m.dataSource ? [m.dataSource] : [])
  return section(
    HEADINGS.method,
    [para(m.statement), { ul: m.formulas.map((f) => ({ text: runs(f) })), fontSize: 7.5, margin: [0, 0, 0, 2] }],
    [{ stack: [para('Isotope data, from the evaluations:', { style: 'small', margin: [0, 1, 0, 0] }), { ul: sources.map((s) => ({ text: runs(s) })), fontSize: 7, color: MUTED, margin: [0, 0, 0, 3] }], unbreakable: true }],
  )
}

/** Everything between the title block and the issuer, for a sample. */
export function sampleSections(p: SamplePayload): Block[] {
  return [
    sideBySide([heading(HEADINGS.description), para(p.description)], [heading(HEADINGS.intendedUse), para(p.intendedUse)]),
    ...properties(p),
    ...method(p),
    ...section(
      HEADINGS.traceability,
      [para(p.traceability)],
      p.records.length ? [table(['Document on file', 'SHA-256'], p.records.map((r) => [r.fileName, { text: runs(r.sha256, 'Mono'), fontSize: 6.4 }]), ['*', 'auto'])] : [],
    ),
    sideBySide(
      [heading(HEADINGS.validity), para(p.validity.statement)],
      [heading(HEADINGS.storage), p.storage.place ? para(`Kept at ${p.storage.place}.`) : para('No storage place is recorded.', { color: MUTED }), para(p.storage.instructions)],
    ),
    ...hazards(p),
  ]
}
