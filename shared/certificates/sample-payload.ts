/**
 * The frozen payload of a sample's certificate: the sample as recorded at issue, the quantities
 * derived from it, and the statements around them. Pure: the server gathers the inputs.
 */
import { classifyHazards, type HazardInput } from '../samples/hazards'
import { GHS_SOURCE, hazardStatementText } from '../samples/ghs'
import { deriveSample, FORMULAS } from '../samples/derived'
import { isotopeLabel } from '../samples/nuclide'
import { ISOTOPE_DATA_SOURCES } from '../samples/composition'
import { FORM_LABELS, type SampleForm } from '../samples/vocabulary'
import { getElement } from '../physics/elements'
import { formatDay } from './format'
import { activityOn, BATEMAN_SOURCE, HALF_LIFE_SOURCE } from '../radioactivity/decay'
import { formulaText } from '../labels/content'
import { payloadHead, type IssueContext, type PayloadHead } from './payload'

export interface CertSampleInput {
  id: string
  code: string
  name: string
  material: string
  formula: string | null
  form: SampleForm
  arealDensity: number | null
  arealDensityUncertainty: number | null
  thickness: number | null
  bulkDensity: number | null
  massMg: number | null
  backing: string | null
  supplier: string | null
  lot: string | null
  receivedOn: string | null
  recertifyBy: string | null
  location: { path: string; name: string } | null
  hazardStatements: string[]
  radioactive: boolean
  nuclide: string | null
  activityBq: number | null
  /** the date the recorded activity refers to; else the date received */
  activityReferenceDate?: string | null
  components: {
    z: number
    massNumber: number | null
    fraction: number
    basis: 'atom' | 'mass'
    enrichmentPercent: number | null
    fractionUncertainty: number | null
    enrichmentUncertainty: number | null
    analysis?: { massNumber: number; percent: number; uncertainty: number | null }[] | null
  }[]
}

export interface Quantity {
  value: number
  uncertainty: number | null
  unit: string
  /** computed from other recorded values rather than recorded */
  derived: boolean
}

// How each form is kept and handled (common practice, no source); the cautions add to this.
const HANDLING: Record<SampleForm, string> = {
  foil: 'Keep flat in its closed container, dry and dust-free. Handle only by the edge or frame, with clean tweezers and gloves.',
  stripper_foil: 'Extremely fragile: keep in its holder in a closed box, away from air currents and vibration. Never touch the foil itself.',
  powder: 'Keep tightly closed in a desiccator or under the protective atmosphere it came in. Weigh out in a fume hood or glovebox; avoid making dust.',
  wire: 'Keep coiled in its closed container, dry. Handle with clean gloves; avoid kinking.',
  sputter_cathode: 'Keep in its sealed container until it is mounted. Handle with clean gloves and do not touch the sputter surface.',
  gas_cylinder: 'Store upright and secured, valve closed with its cap on, away from heat. Connect only with a regulator rated for the gas.',
  solution: 'Keep closed and upright in secondary containment, away from light and heat.',
  other: 'Keep in its closed, labelled container as the supplier instructs.',
}

// Radiation protection is named only where the sample is radioactive.
const DEFERRAL =
  "These statements do not replace the supplier's safety data sheet. Store, handle, move and dispose of this sample only as the institution's safety officers direct and as local regulations require."
const DEFERRAL_RADIOACTIVE =
  "These statements do not replace the supplier's safety data sheet. This sample is radioactive: store, handle, move and dispose of it only as the institution's radiation protection officer and safety officers direct, within the laboratory's licence and as local regulations require."

function quantity(value: number | null, uncertainty: number | null, unit: string, derived = false): Quantity | null {
  return value === null || value === undefined ? null : { value, uncertainty: uncertainty ?? null, unit, derived }
}

function describe(s: CertSampleInput): string {
  const form = FORM_LABELS[s.form].toLowerCase()
  const parts = [`${s.material}${s.formula ? ` (${formulaText(s.formula)})` : ''}, ${form}${s.backing ? ` on ${s.backing}` : ''}.`]
  const origin = [s.supplier ? `Supplier ${s.supplier}` : null, s.lot ? `lot ${s.lot}` : null].filter(Boolean).join(', ')
  if (origin) parts.push(`${origin}.`)
  if (s.receivedOn) parts.push(`Received ${formatDay(s.receivedOn)}.`)
  return parts.join(' ')
}

// The recorded activity, its reference date, and the activity on the day of issue corrected for
// decay, with the daughters grown in since (printed with their sources).
function radioactivity(s: CertSampleInput, issuedAt: string) {
  const referenceDate = s.activityReferenceDate ?? s.receivedOn ?? null
  const atIssue = s.nuclide && s.activityBq !== null && referenceDate ? activityOn(s.nuclide, s.activityBq, referenceDate, issuedAt) : null
  return {
    nuclide: s.nuclide,
    activityBq: s.activityBq,
    referenceDate,
    atIssue: atIssue ? { on: issuedAt.slice(0, 10), activityBq: atIssue.activityBq, daughters: atIssue.daughters, decayCorrected: atIssue.known } : null,
    sources: `Half-lives: ${HALF_LIFE_SOURCE}. Daughters grow in by the Bateman equations (${BATEMAN_SOURCE}), taken as absent at the reference date.`,
  }
}

/** The payload of a certificate for `s`, as of `ctx` (number, version, issuer, date). */
export function samplePayload(s: CertSampleInput, datasheets: { fileName: string; sha256: string }[], ctx: IssueContext) {
  const derived = deriveSample(s)
  const composition = derived.composition?.ok ? derived.composition : null
  const hazardInput: HazardInput = { form: s.form, formula: s.formula, radioactive: s.radioactive, nuclide: s.nuclide, hazardStatements: s.hazardStatements, components: s.components }
  const head: PayloadHead = payloadHead(ctx, 'Certificate of a target sample')
  return {
    ...head,
    subject: { type: 'sample' as const, id: s.id, code: s.code, name: s.name },
    description: describe(s),
    intendedUse:
      'Target or source material for ion-beam and atomic-physics work at the issuing laboratory. The values describe the sample at issue; use them for calibration only where the stated uncertainty suffices.',
    properties: {
      basis: s.components[0]?.basis ?? null,
      composition: s.components.map((c) => ({
        label: isotopeLabel(c.z, c.massNumber),
        element: getElement(c.z)?.name ?? `Z = ${c.z}`,
        z: c.z,
        massNumber: c.massNumber,
        fraction: c.fraction,
        fractionUncertainty: c.fractionUncertainty,
        enrichmentPercent: c.enrichmentPercent,
        enrichmentUncertainty: c.enrichmentUncertainty,
        analysis: c.analysis?.length ? c.analysis.map((r) => ({ label: isotopeLabel(c.z, r.massNumber), percent: r.percent, uncertainty: r.uncertainty })) : null,
      })),
      arealDensity: derived.arealDensity ? quantity(derived.arealDensity.value, derived.arealDensity.uncertainty, 'µg/cm²', derived.arealDensity.derived) : null,
      thickness: derived.thickness ? quantity(derived.thickness.value, derived.thickness.uncertainty, 'nm', derived.thickness.derived) : null,
      bulkDensity: quantity(s.bulkDensity, null, 'g/cm³'),
      mass: quantity(s.massMg, null, 'mg'),
      meanAtomicMass: composition ? quantity(composition.meanAtomicMassU, composition.meanAtomicMassUncertainty, 'u', true) : null,
      isotopes: composition
        ? composition.isotopes.map((i) => ({
            label: isotopeLabel(i.z, i.massNumber),
            atomFraction: i.atomFraction,
            atomFractionUncertainty: i.atomFractionUncertainty,
            atomsPerCm2: i.atomsPerCm2,
            atomsPerCm2Uncertainty: i.atomsPerCm2Uncertainty,
          }))
        : [],
      radioactivity: s.radioactive ? radioactivity(s, ctx.issuedAt) : null,
      uncertaintyNote:
        "Uncertainties are standard uncertainties (k = 1) unless the supplier's documentation states another coverage; each value is rounded to its uncertainty, given to two significant digits (JCGM 100:2008, 7.2.6). Derived uncertainties: GUM first-order propagation (JCGM 100:2008, 5.1.2) of every recorded uncertainty through the model, including the closure of the isotope fractions (they sum to 1, so an enrichment's uncertainty reaches the other isotopes fully correlated, and an analysis is normalised with its covariance); checked against a Monte Carlo propagation (JCGM 101:2008). Isotope masses and natural abundances are taken as exact.",
    },
    method: {
      statement:
        "Values recorded by the laboratory from the supplier's certificate of analysis for the lot named and from its own measurements, where made. Derived quantities are computed from the recorded values:",
      formulas: [
        FORMULAS.arealDensity,
        FORMULAS.meanAtomicMass,
        ...(s.components.some((c) => c.enrichmentPercent !== null) ? [FORMULAS.enrichment] : []),
        ...(s.components.some((c) => c.analysis?.length) ? [FORMULAS.analysis] : []),
        FORMULAS.atomsPerArea,
        FORMULAS.atomsUncertainty,
      ],
      dataSources: [ISOTOPE_DATA_SOURCES.masses, ISOTOPE_DATA_SOURCES.abundances, ISOTOPE_DATA_SOURCES.carrier],
    },
    traceability: datasheets.length
      ? 'The recorded values are traceable as stated in the supplier documents the laboratory keeps on file for this sample (listed with their SHA-256). Derived quantities add no traceability of their own.'
      : 'No supplier document is on file for this sample: the values rest on the laboratory\'s own records, and their traceability is as those records state.',
    records: datasheets.map((d) => ({ fileName: d.fileName, sha256: d.sha256 })),
    validity: {
      until: s.recertifyBy,
      statement: `Valid until ${formatDay(s.recertifyBy)}, the sample's re-certify-by date, while it is stored and handled as below. Any damage, contamination or use beyond the recorded quantities ends the validity early.`,
    },
    storage: {
      place: s.location ? `${s.location.path} (${s.location.name})` : null,
      instructions: HANDLING[s.form],
    },
    hazards: {
      statements: s.hazardStatements.map((code) => ({ code, text: hazardStatementText(code) ?? '' })),
      statementSource: GHS_SOURCE,
      cautions: classifyHazards(hazardInput).map((c) => ({ kind: c.kind, title: c.title, reasons: c.reasons, advice: c.advice })),
      deferral: s.radioactive ? DEFERRAL_RADIOACTIVE : DEFERRAL,
    },
    estimates: null,
  }
}

export type SamplePayload = ReturnType<typeof samplePayload>
