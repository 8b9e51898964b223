import type { Knex } from 'knex'
import type { SpeciesRecord } from '#shared/physics'
import { samplePayload } from '#shared/certificates/sample-payload'
import { speciesPayload } from '#shared/certificates/species-payload'
import type { IssueContext, SubjectType } from '#shared/certificates/payload'
import type { SampleForm } from '#shared/samples/vocabulary'

/** A subject ready to certify: its label for lists, and its payload once the number is known. */
export interface CertifiableSubject {
  label: string
  build: (ctx: IssueContext) => Record<string, unknown> & { validity: { until: string | null } }
}

function refuse(message: string, data?: Record<string, unknown>): never {
  throw createError({ statusCode: 409, statusMessage: 'Conflict', message, data })
}

/**
 * Loads and locks the subject (so two managers cannot certify it at once), checks that it can
 * be certified, and returns what the certificate will say. A retired sample cannot be certified:
 * it has left the stock, so there is nothing whose validity could run on. A sample needs a
 * re-certify-by date in the future, which becomes the period of validity.
 */
export async function certifiableSubject(trx: Knex.Transaction, type: SubjectType, id: string): Promise<CertifiableSubject> {
  if (type === 'sample') {
    const sample = await requireSample(trx, id, { lock: true })
    if (sample.status === 'retired') refuse('A retired sample cannot be certified')
    if (!sample.recertifyBy) refuse('Give the sample a re-certify-by date first: it becomes the period of validity')
    const today = new Date().toISOString().slice(0, 10)
    if (sample.recertifyBy <= today) refuse('The re-certify-by date has passed: set the next one before issuing')
    // The current version of each datasheet: neither replaced nor withdrawn.
    const sheets = await trx('datasheets').where({ sample_id: id }).whereNull('replaced_at').whereNull('withdrawn_at').orderBy('uploaded_at').select('original_name', 'sha256')
    const datasheets = sheets.map((d) => ({ fileName: d.original_name, sha256: d.sha256 }))
    const input = { ...sample, form: sample.form as SampleForm, location: sample.location ? { path: sample.location.path, name: sample.location.name } : null }
    return { label: `${sample.code} ${sample.name}`, build: (ctx) => samplePayload(input, datasheets, ctx) }
  }
  const species = await trx('species').where({ id }).forUpdate().first()
  if (!species) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such species' })
  const result = await trx('species_results as r')
    .leftJoin('users as u', 'u.id', 'r.recorded_by')
    .where('r.species_id', id)
    .orderBy('r.recorded_at', 'desc')
    .first('r.*', 'u.name as recorded_by_name')
  if (!result) refuse('This species has no recorded result to certify')
  const input = {
    id: species.id,
    label: species.label,
    spectroscopic: species.spectroscopic,
    elementName: species.element_name,
    z: species.z,
    charge: species.charge,
    massNumber: species.mass_number,
    result: {
      id: result.id,
      engine: result.engine_version,
      methods: result.methods,
      recordedAt: new Date(result.recorded_at).toISOString(),
      recordedBy: (result as { recorded_by_name?: string | null }).recorded_by_name ?? null,
      record: result.result as SpeciesRecord,
    },
  }
  return { label: `${species.label} (${species.spectroscopic})`, build: (ctx) => speciesPayload(input, ctx) }
}
