// The sections of a recorded species' certificate, from its frozen payload.
import { HEADINGS } from '../../shared/certificates/payload'
import type { SpeciesPayload } from '../../shared/certificates/species-payload'
import { formatEv, formatValue } from '../../shared/certificates/format'
import { heading, para, sideBySide, table } from './certificate-parts'

function deviation(ev: number | null, percent: number | null): string {
  if (ev === null) return '—'
  const sign = ev > 0 ? '+' : ev < 0 ? '−' : ''
  return `${sign}${formatEv(Math.abs(ev))} eV${percent === null ? '' : ` (${sign}${formatValue(Math.abs(percent), 3)} %)`}`
}

function properties(p: SpeciesPayload) {
  const pr = p.properties
  const ion = pr.ionisation
  const rows: string[][] = [
    ['Atomic number Z', String(pr.z)],
    ['Charge state', String(pr.charge)],
    ['Electrons', String(pr.electrons)],
    ...(pr.massNumber ? [['Mass number', String(pr.massNumber)]] : []),
    ['Ground configuration', pr.configuration],
    ['Configuration with core', pr.core],
    ['Ground term', pr.term ?? 'not assigned by the engine'],
    ['Isoelectronic sequence', pr.isoelectronic ?? '—'],
    ['Next electron removed from', pr.nextElectron ?? 'none (bare nucleus)'],
  ]
  const energyRows: string[][] = [
    ['Reference value', ion.reference ? formatEv(ion.reference.eV) : 'no reference value', ion.reference ? '—' : '—', ion.reference?.source ?? ''],
    ...ion.estimates.map((e) => [e.method, formatEv(e.eV), deviation(e.deviationEv, e.deviationPercent), e.basis ?? 'estimate']),
  ]
  return [
    heading(HEADINGS.properties),
    table(['Property', 'Value'], rows, [130, '*']),
    para('Ionisation energy (energy to remove the next electron), eV:', { bold: true, margin: [0, 2, 0, 1] }),
    table(['Method', 'Energy (eV)', 'Deviation from reference', 'Note'], energyRows, [95, 60, 100, '*']),
    ...ion.notes.map((n) => para(n, { style: 'small' })),
    pr.productionThreshold
      ? para(`Production threshold: ${formatEv(pr.productionThreshold.eV)} eV, the ionisation energy of ${pr.productionThreshold.from} (${pr.productionThreshold.source}).`)
      : para(pr.productionThresholdNote ?? 'No production threshold.'),
  ]
}

/** Everything between the title block and the issuer, for a recorded species. */
export function speciesSections(p: SpeciesPayload): Record<string, unknown>[] {
  return [
    sideBySide([heading(HEADINGS.description), para(p.description)], [heading(HEADINGS.intendedUse), para(p.intendedUse)]),
    ...properties(p),
    heading(HEADINGS.estimates),
    para(p.estimates, { bold: true }),
    heading(HEADINGS.methodComputed),
    para(`Ionfolio species engine ${p.method.engine} (result ${p.method.resultId}); ground configuration by the ${p.method.configurationRule} rule; reference values from ${p.method.referenceSource}.`),
    table(['Method', 'What it computes', 'Citation'], p.method.methods.map((m) => [m.name, m.description, m.citation]), [80, '*', 150]),
    heading(HEADINGS.traceability),
    para(p.traceability),
    sideBySide([heading(HEADINGS.validity), para(p.validity.statement)], [heading(HEADINGS.storage), para('Not applicable: the subject is a computed data record, not a material.')]),
    heading(HEADINGS.hazards),
    para('Not applicable to computed data. For the samples that can source this species, see their own certificates and labels.'),
  ]
}
