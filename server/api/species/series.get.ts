import { CAN } from '#shared/auth/roles'
import { SpeciesSeriesQuery } from '#shared/schemas/species'
import { IONISATION_SOURCE, describeSpecies, getElement } from '#shared/physics'

/**
 * Every charge state of one element with its reference and estimated ionisation energies, for
 * the chart of ionisation energy against charge state. SCF values come from the cache only:
 * solving a whole element on request would take seconds.
 */
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.lookUpSpecies)
  const { z } = queryValid(event, SpeciesSeriesQuery)
  const element = getElement(z)!
  const scf = await readScfCacheForElement(useDb(), z)

  const points = []
  for (let charge = 0; charge < z; charge++) {
    const record = describeSpecies({ input: '', z, symbol: element.symbol, charge, massNumber: null }, { scf: scf.get(charge) ?? null })
    points.push({
      charge,
      label: record.notations.ionic,
      reference: record.ionisationEnergy.reference?.eV ?? null,
      // numbers only: a method that does not apply to a charge state has no point there
      estimates: Object.fromEntries(record.ionisationEnergy.estimates.flatMap((e) => (e.eV === null ? [] : [[e.method, e.eV]]))) as Record<string, number>,
    })
  }
  return { z, symbol: element.symbol, name: element.name, referenceSource: IONISATION_SOURCE, scfCached: scf.size, points }
})
