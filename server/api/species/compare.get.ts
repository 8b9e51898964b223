import { GUARDED_CSV } from '#shared/csv/safe'
import { stringify } from 'csv-stringify/sync'
import { CAN } from '#shared/auth/roles'
import { COMPARE_LIMIT, CompareQuery } from '#shared/schemas/species'
import { METHOD_NAMES, describeSpecies, formatSpecies, getElement, type ParsedSpecies } from '#shared/physics'

function invalid(path: string, message: string): never {
  throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [{ path, message }] } })
}

function elementOf(text: string, path: string) {
  const e = getElement(/^\d+$/.test(text) ? Number(text) : text.replace(/-like$/, ''))
  if (!e) invalid(path, 'Give an element symbol (Fe) or number (26)')
  return e
}

// Several species side by side, from the engine and the SCF cache (nothing is solved here: a
// long comparison would otherwise take minutes).
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.lookUpSpecies)
  const query = queryValid(event, CompareQuery)

  let list: ParsedSpecies[] = []
  const rejected: { input: string; message: string }[] = []
  if (query.species) {
    const texts = query.species.split(/[,;\n]/).map((s) => s.trim()).filter(Boolean)
    if (texts.length > COMPARE_LIMIT) invalid('species', `At most ${COMPARE_LIMIT} species at once`)
    // A bad entry is reported beside the others, not made to fail the whole comparison.
    for (const t of texts) {
      try {
        list.push(parseSpeciesInput(t))
      } catch (e: any) {
        if (e?.statusCode !== 400) throw e
        rejected.push({ input: t.slice(0, 40), message: String(e.message) })
      }
    }
    if (!list.length) throw createError({ statusCode: 400, statusMessage: 'Unknown species', message: 'None of the species could be read', data: { rejected, issues: [{ path: 'species', message: rejected[0]?.message ?? 'Name at least one species' }] } })
  } else if (query.element) {
    const e = elementOf(query.element, 'element')
    const from = query.from ?? 0
    const to = query.to ?? e.z
    if (from > to || to > e.z) invalid('to', `Charge states run from -1 to ${e.z} for ${e.symbol}, with from ≤ to`)
    for (let q = from; q <= to; q++) list.push({ input: formatSpecies(e.z, q).ionic, z: e.z, symbol: e.symbol, charge: q, massNumber: null })
  } else if (query.sequence) {
    const neutral = elementOf(query.sequence, 'sequence')
    const zFrom = query.zFrom ?? neutral.z
    const zTo = query.zTo ?? Math.min(118, zFrom + 20)
    if (zFrom < neutral.z || zFrom > zTo) invalid('zFrom', `The ${neutral.symbol}-like sequence starts at Z = ${neutral.z}; give zFrom ≤ zTo`)
    if (zTo - zFrom + 1 > COMPARE_LIMIT) invalid('zTo', `At most ${COMPARE_LIMIT} species at once`)
    for (let z = zFrom; z <= zTo; z++) list.push({ input: formatSpecies(z, z - neutral.z).ionic, z, symbol: getElement(z)!.symbol, charge: z - neutral.z, massNumber: null })
  }

  const db = useDb()
  const rows = []
  for (const p of list) {
    const scf = p.charge < p.z ? await readScfCache(db, p.z, p.charge) : null
    const r = describeSpecies(p, { scf })
    const estimates = Object.fromEntries(r.ionisationEnergy.estimates.map((e) => [e.method, e.eV])) as Record<string, number | null>
    // a method that does not apply gives no number; the reason goes beside it
    const notApplicable = Object.fromEntries(r.ionisationEnergy.estimates.flatMap((e) => (e.notApplicable ? [[e.method, e.notApplicable]] : []))) as Record<string, string>
    const best = r.bestEstimate ? { method: r.bestEstimate.method, eV: r.bestEstimate.eV, typicalPercent: r.bestEstimate.typicalPercent } : null
    rows.push({ label: r.notations.ionic, spectroscopic: r.notations.spectroscopic, z: r.z, charge: r.charge, core: r.core, term: r.term, isoelectronic: r.isoelectronic, reference: r.ionisationEnergy.reference?.eV ?? null, referenceUncertainty: r.ionisationEnergy.reference?.uncertaintyEv ?? null, best, estimates, notApplicable, productionThreshold: r.productionThreshold?.eV ?? null })
  }

  if (query.format === 'csv') {
    setResponseHeader(event, 'Content-Type', 'text/csv; charset=utf-8')
    setResponseHeader(event, 'Content-Disposition', 'attachment; filename="ionfolio-species-comparison.csv"')
    return stringify(
      rows.map((r) => [
        r.label, r.spectroscopic, r.z, r.charge, r.core, r.term ?? '', r.isoelectronic ?? '', r.reference ?? '', r.referenceUncertainty ?? '',
        ...METHOD_NAMES.map((m) => r.estimates[m] ?? ''),
        r.best?.eV ?? '', r.best?.method ?? '', r.best?.typicalPercent ?? '',
        Object.entries(r.notApplicable).map(([m, why]) => `${m}: ${why}`).join('; '),
        r.productionThreshold ?? '',
      ]),
      {
        ...GUARDED_CSV,
        header: true,
        columns: [
          'species', 'spectroscopic', 'z', 'charge', 'configuration', 'term', 'isoelectronic', 'reference_eV', 'reference_uncertainty_eV',
          ...METHOD_NAMES.map((m) => `${m}_eV`),
          'best_estimate_eV', 'best_estimate_method', 'best_estimate_typical_percent', 'not_applicable', 'production_threshold_eV',
        ],
      },
    )
  }
  return { methods: METHOD_NAMES, rows, rejected }
})
