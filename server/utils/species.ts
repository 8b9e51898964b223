import type { H3Event } from 'h3'
import { ENGINE_VERSION, describeSpecies, formatSpecies, parseSpecies, SpeciesParseError, type ParsedSpecies, type SpeciesRecord } from '#shared/physics'
import type { ScfSpeciesEstimates } from '#shared/physics/scf/types'
import type { SpeciesRow } from '#shared/types/db'

/** A species from the notation the person typed (with an optional separate mass number), or a 400 with the parser's message. */
export function parseSpeciesInput(text: string, massNumber?: number): ParsedSpecies {
  try {
    const parsed = parseSpecies(text)
    if (massNumber === undefined || massNumber === parsed.massNumber) return parsed
    if (parsed.massNumber !== null) throw new SpeciesParseError('the notation and massNumber name different isotopes')
    // Re-parse with the isotope prefix so the engine checks it is a known nuclide of the element.
    const withIsotope = parseSpecies(`${massNumber}${formatSpecies(parsed.z, parsed.charge).ionic}`)
    return { ...withIsotope, input: parsed.input }
  } catch (e) {
    if (e instanceof SpeciesParseError) throw createError({ statusCode: 400, statusMessage: 'Unknown species', message: e.message })
    throw e
  }
}

/** The record as it should be frozen: fast methods plus SCF, solved now if not yet cached (up to `waitMs`). */
export async function recordToFreeze(parsed: ParsedSpecies, waitMs = 15_000): Promise<SpeciesRecord> {
  let scf: ScfSpeciesEstimates | null = null
  if (parsed.charge < parsed.z) {
    const found = await scfForLookup(parsed.z, parsed.charge, waitMs)
    scf = found.estimates
  }
  return describeSpecies(parsed, { scf })
}

/** The species row with this id, or a 404. */
export async function loadSpeciesOr404(id: string): Promise<SpeciesRow> {
  const row = await useDb()('species').where({ id }).first()
  if (!row) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such species' })
  return row
}

/** The API shape of a species row. */
export function speciesOut(row: SpeciesRow) {
  return {
    id: row.id,
    z: row.z,
    charge: row.charge,
    massNumber: row.mass_number,
    label: row.label,
    spectroscopic: row.spectroscopic,
    symbol: row.symbol,
    elementName: row.element_name,
    isoelectronic: row.isoelectronic,
    createdAt: row.created_at,
  }
}

/**
 * Finds or creates the species and freezes a result for the running engine version, in one
 * transaction with its audit row. Recording again under the same engine version changes nothing.
 */
export async function recordSpecies(event: H3Event, parsed: ParsedSpecies) {
  const record = await recordToFreeze(parsed)
  // the methods that produced a number (one that does not apply is in the record with its reason)
  const methods = record.ionisationEnergy.estimates.flatMap((e) => (e.eV === null ? [] : [e.method]))
  const notations = formatSpecies(parsed.z, parsed.charge, parsed.massNumber)
  const user = requireUser(event)
  return useDb().transaction(async (trx) => {
    const identity = trx('species').where({ z: parsed.z, charge: parsed.charge }).whereRaw('coalesce(mass_number, 0) = ?', [parsed.massNumber ?? 0])
    let species = await identity.clone().forUpdate().first()
    if (!species) {
      const inserted = await trx('species')
        .insert({ z: parsed.z, charge: parsed.charge, mass_number: parsed.massNumber, label: notations.ionic, spectroscopic: notations.spectroscopic, symbol: record.symbol, element_name: record.name, isoelectronic: record.isoelectronic, created_by: user.id })
        .onConflict()
        .ignore()
        .returning('*')
      species = inserted[0] ?? (await identity.clone().forUpdate().first())
    }
    const existing = await trx('species_results').where({ species_id: species!.id, engine_version: ENGINE_VERSION }).first()
    if (existing) return { species: species!, result: existing, created: false }
    const [result] = await trx('species_results')
      .insert({ species_id: species!.id, engine_version: ENGINE_VERSION, methods, result: JSON.stringify(record) as never, recorded_by: user.id })
      .returning('*')
    await writeAudit(trx, event, { action: 'species.recorded', entityType: 'species', entityId: species!.id, after: { label: species!.label, engine: ENGINE_VERSION, methods } })
    return { species: species!, result: result!, created: true }
  })
}
