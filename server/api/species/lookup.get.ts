import { CAN } from '#shared/auth/roles'
import { SpeciesLookupQuery } from '#shared/schemas/species'
import { describeSpecies, parseSpecies, SpeciesParseError } from '#shared/physics'

/** The species record of DESIGN §5, with the SCF methods from the cache (or a quick solve). */
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.lookUpSpecies)
  const { q } = queryValid(event, SpeciesLookupQuery)
  let parsed
  try {
    parsed = parseSpecies(q)
  } catch (e) {
    // The parser's message names what was wrong and every accepted notation, never the raw input.
    if (e instanceof SpeciesParseError) throw createError({ statusCode: 400, statusMessage: 'Unknown species', message: e.message })
    throw e
  }
  const scf = parsed.charge < parsed.z ? await scfForLookup(parsed.z, parsed.charge) : { status: 'none' as const, estimates: null }
  return { ...describeSpecies(parsed, { scf: scf.estimates }), scfStatus: scf.status }
})
