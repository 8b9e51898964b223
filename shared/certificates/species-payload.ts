/**
 * The frozen payload of a certificate for a recorded species: the newest frozen result of the
 * engine, the methods that produced it with their citations, and the reference values set
 * beside the estimates. The subject is computed data, not a material.
 */
import { IONISATION_SOURCE, METHODS, type SpeciesRecord } from '../physics'
import { addDays, formatDay } from './format'
import { payloadHead, type IssueContext } from './payload'

export interface CertSpeciesInput {
  id: string
  label: string
  spectroscopic: string
  elementName: string
  z: number
  charge: number
  massNumber: number | null
  result: { id: string; engine: string; methods: string[]; recordedAt: string; recordedBy: string | null; record: SpeciesRecord }
}

/** How long a species certificate stands before it is checked again against the engine. */
export const SPECIES_VALIDITY_DAYS = 365

export function speciesPayload(s: CertSpeciesInput, ctx: IssueContext) {
  const r = s.result.record
  const until = addDays(ctx.issuedAt, SPECIES_VALIDITY_DAYS)
  // a certificate names the methods behind its numbers only
  const produced = new Set(r.ionisationEnergy.estimates.flatMap((e) => (e.eV === null ? [] : [e.method as string])))
  const methods = s.result.methods.filter((name) => produced.has(name)).map((name) => {
    const m = METHODS.find((x) => x.name === name)
    return { name, description: m?.description ?? '', citation: m?.citation ?? '' }
  })
  return {
    ...payloadHead(ctx, 'Certificate of a recorded ion species'),
    subject: { type: 'species' as const, id: s.id, label: s.label, spectroscopic: s.spectroscopic, resultId: s.result.id },
    description: `Computed atomic data for the ion ${s.label} (spectrum ${s.spectroscopic}) of ${s.elementName.toLowerCase()}, Z = ${s.z}, charge ${s.charge}, ${r.electrons} electron${r.electrons === 1 ? '' : 's'}${s.massNumber ? `, mass number ${s.massNumber}` : ''}: the result the laboratory recorded on ${formatDay(s.result.recordedAt)}${s.result.recordedBy ? ` (${s.result.recordedBy})` : ''} with engine ${s.result.engine}.`,
    intendedUse:
      'Planning ion production and charge-state selection (ion-source and electron-beam settings) at the issuing laboratory. The estimates are not measurements and are not for use where a measured value is required.',
    properties: {
      z: s.z,
      charge: s.charge,
      massNumber: s.massNumber,
      electrons: r.electrons,
      configuration: r.configuration,
      core: r.core,
      term: r.term,
      isoelectronic: r.isoelectronic,
      nextElectron: r.ionisationEnergy.nextElectron,
      ionisation: {
        unit: 'eV',
        reference: r.ionisationEnergy.reference ? { eV: r.ionisationEnergy.reference.eV, source: r.ionisationEnergy.reference.source } : null,
        // a certificate carries numbers only; a method that does not apply is left out
        estimates: r.ionisationEnergy.estimates.flatMap((e) => (e.eV === null ? [] : [{ method: e.method, eV: e.eV, deviationEv: e.deviationEv ?? null, deviationPercent: e.deviationPercent ?? null, basis: e.basis ?? null }])),
        notes: [...r.ionisationEnergy.notes],
      },
      productionThreshold: r.productionThreshold ? { eV: r.productionThreshold.eV, from: r.productionThreshold.from, source: r.productionThreshold.source } : null,
      productionThresholdNote: r.productionThresholdNote ?? null,
    },
    method: {
      engine: s.result.engine,
      resultId: s.result.id,
      methods,
      configurationRule: r.configurationRule,
      referenceSource: IONISATION_SOURCE,
    },
    traceability: `Reference ionisation energies are the evaluated values of ${IONISATION_SOURCE}, traceable as that compilation states. The estimates are computed by the Ionfolio species engine ${s.result.engine} with the published methods named above; as model outputs they carry no metrological traceability.`,
    records: [],
    validity: {
      until,
      statement: `Valid until ${formatDay(until)}, or until the laboratory records this species with a newer engine version and issues a new certificate, whichever comes first.`,
    },
    storage: null,
    hazards: null,
    estimates: `${r.caution} Each estimate is printed beside the reference value (${IONISATION_SOURCE}) where one exists, with its deviation from it.`,
  }
}

export type SpeciesPayload = ReturnType<typeof speciesPayload>
