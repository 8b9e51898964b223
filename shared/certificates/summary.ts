import { formatDay, formatEv, formatQuantity, formatValue } from './format'

// What the public verification page shows once number and digest match: the certified values
// as printed, taken from the frozen payload alone, so a reader can hold them against the paper.

export interface CertifiedLine {
  label: string
  value: string
}

export interface CertifiedSummary {
  title: string
  number: string
  version: number
  subject: string
  issuedOn: string
  issuedBy: string
  laboratory: string
  validUntil: string
  values: CertifiedLine[]
}

type Q = { value: number; uncertainty: number | null; unit: string } | null | undefined
const q = (x: Q) => (x ? formatQuantity(x.value, x.uncertainty, x.unit) : null)
const pct = (v: number | null | undefined, u: number | null | undefined) => (v == null ? null : `${formatQuantity(v, u, '')} %`)

/** The summary of a frozen certificate payload (sample or species). Unknown fields are left out, never guessed. */
export function certifiedSummary(payload: any): CertifiedSummary {
  const values: CertifiedLine[] = []
  const add = (label: string, value: string | null | undefined) => {
    if (value) values.push({ label, value })
  }
  const p = payload.properties ?? {}
  let subject = ''
  if (payload.subject?.type === 'sample') {
    subject = `${payload.subject.code} · ${payload.subject.name}`
    for (const c of p.composition ?? []) {
      const fraction = formatQuantity(c.fraction, c.fractionUncertainty, '')
      const enrichment = pct(c.enrichmentPercent, c.enrichmentUncertainty)
      add(`${c.label} (${p.basis ?? 'atom'} fraction)`, enrichment ? `${fraction}, enrichment ${enrichment}` : fraction)
    }
    add('Areal density', q(p.arealDensity))
    add('Thickness', q(p.thickness))
    add('Bulk density', q(p.bulkDensity))
    add('Mass', q(p.mass))
    add('Mean atomic mass', q(p.meanAtomicMass))
    for (const i of p.isotopes ?? []) add(`${i.label} atoms per cm²`, formatQuantity(i.atomsPerCm2, i.atomsPerCm2Uncertainty, ''))
    if (p.radioactivity) add('Radioactivity', `${p.radioactivity.nuclide ?? ''} ${p.radioactivity.activityBq != null ? `${formatValue(p.radioactivity.activityBq)} Bq` : ''}`.trim())
  } else if (payload.subject?.type === 'species') {
    subject = `${payload.subject.label} (${payload.subject.spectroscopic})`
    add('Z, charge, electrons', `${p.z}, ${p.charge}, ${p.electrons}`)
    add('Ground configuration', p.configuration)
    add('Ground term', p.term)
    if (p.ionisation?.reference) add('Ionisation energy, reference', `${formatEv(p.ionisation.reference.eV)} eV`)
    for (const e of p.ionisation?.estimates ?? []) add(`Ionisation energy, ${e.method} (estimate)`, `${formatEv(e.eV)} eV`)
    if (p.productionThreshold) add('Production threshold', `${formatEv(p.productionThreshold.eV)} eV`)
  }
  return {
    title: String(payload.title ?? ''),
    number: String(payload.number ?? ''),
    version: Number(payload.version ?? 0),
    subject,
    issuedOn: formatDay(payload.issued?.at),
    issuedBy: payload.issued?.by ? `${payload.issued.by.name} (${payload.issued.by.role})` : '',
    laboratory: String(payload.issuer?.laboratory ?? ''),
    validUntil: payload.validity?.until ? formatDay(payload.validity.until) : '—',
    values,
  }
}
