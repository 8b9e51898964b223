import { CAN } from '#shared/auth/roles'
import { SpeciesLookupQuery } from '#shared/schemas/species'
import { describeSpecies, parseSpecies, SpeciesParseError } from '#shared/physics'

type LookupAnswer = ReturnType<typeof describeSpecies> & { scfStatus: ScfLookup['status'] }

/**
 * The species record of DESIGN §5, with the SCF methods from the cache (or a quick solve). The
 * answer is sent as ready JSON text (kept for repeat look-ups, see server/utils/lookup-cache.ts);
 * the cast only tells typed callers what that text holds.
 */
export default defineEventHandler(async (event): Promise<LookupAnswer> => {
  requireRole(event, ...CAN.lookUpSpecies)
  const { q } = queryValid(event, SpeciesLookupQuery)
  setResponseHeader(event, 'content-type', 'application/json; charset=utf-8')
  const kept = keptLookup(q)
  if (kept !== undefined) return kept as unknown as LookupAnswer
  let parsed
  try {
    parsed = parseSpecies(q)
  } catch (e) {
    // The parser's message names what was wrong and every accepted notation, never the raw input.
    if (e instanceof SpeciesParseError) throw createError({ statusCode: 400, statusMessage: 'Unknown species', message: e.message })
    throw e
  }
  const scf = parsed.charge < parsed.z ? await scfForLookup(parsed.z, parsed.charge) : { status: 'none' as const, estimates: null }
  const json = JSON.stringify({ ...describeSpecies(parsed, { scf: scf.estimates }), scfStatus: scf.status })
  if (scf.status === 'cached' || scf.status === 'none') keepLookup(q, json)
  return json as unknown as LookupAnswer
})
