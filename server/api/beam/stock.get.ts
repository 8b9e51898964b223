import { CAN } from '#shared/auth/roles'
import { BeamStockQuery } from '#shared/schemas/beam'

// The stock a plan can use: stripper foils that are not retired or depleted, and (for element z)
// the samples that hold it, ranked by their enrichment in the isotope asked for.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readBeamPlans)
  const q = queryValid(event, BeamStockQuery)
  const db = useDb()
  const foils = await db('samples as s')
    .leftJoin('locations as l', 'l.id', 's.location_id')
    .where('s.form', 'stripper_foil')
    .whereNotIn('s.status', ['retired', 'depleted'])
    .orderBy([{ column: 's.formula' }, { column: 's.areal_density_ug_cm2' }, { column: 's.code' }])
    .select('s.id', 's.code', 's.name', 's.formula', 's.status', 's.areal_density_ug_cm2', 'l.code as location_code', 'l.name as location_name') as FoilRow[]
  let sources: Source[] = []
  if (q.z) {
    // Enrichment in the asked isotope: a component naming it gives its enrichment or analysed atom %
    // (or 100 % of an isotope-only component); natural material gives the natural abundance, computed by the page.
    const rows = await db('sample_components as c')
      .join('samples as s', 's.id', 'c.sample_id')
      .leftJoin('locations as l', 'l.id', 's.location_id')
      // a component described by a full isotopic analysis has no enrichment: read the named
      // isotope's analysed atom % instead
      .leftJoin('sample_component_isotopes as a', function () {
        this.on('a.component_id', 'c.id').andOn('a.mass_number', 'c.mass_number')
      })
      .where('c.z', q.z)
      .whereNotIn('s.status', ['retired', 'depleted'])
      .select('s.id', 's.code', 's.name', 's.form', 's.status', 's.hazard_kinds', 'c.mass_number', 'c.enrichment_pct', 'a.atom_pct as analysed_pct', 'c.fraction', 'l.code as location_code') as SourceRow[]
    sources = rows
      .map((r) => ({
        id: r.id,
        code: r.code,
        name: r.name,
        form: r.form,
        status: r.status,
        place: r.location_code ?? null,
        hazardKinds: r.hazard_kinds,
        massNumber: r.mass_number ?? null,
        enrichmentPct: r.mass_number === null ? null : (r.enrichment_pct ?? r.analysed_pct ?? null),
        matches: q.massNumber === undefined || r.mass_number === null || r.mass_number === q.massNumber,
      }))
      .sort((a, b) => Number(b.matches) - Number(a.matches) || enrichmentRank(b, q.massNumber) - enrichmentRank(a, q.massNumber) || a.code.localeCompare(b.code))
  }
  return {
    foils: foils.map((f) => ({ id: f.id, code: f.code, name: f.name, formula: f.formula, status: f.status, arealDensityUgCm2: f.areal_density_ug_cm2, place: f.location_code ? { code: f.location_code, name: f.location_name } : null })),
    sources,
  }
})

interface FoilRow { id: string; code: string; name: string; formula: string | null; status: string; areal_density_ug_cm2: number | null; location_code: string | null; location_name: string | null }
interface SourceRow { id: string; code: string; name: string; form: string; status: string; hazard_kinds: string[]; mass_number: number | null; enrichment_pct: number | null; analysed_pct: number | null; fraction: number; location_code: string | null }
interface Source { id: string; code: string; name: string; form: string; status: string; place: string | null; hazardKinds: string[]; massNumber: number | null; enrichmentPct: number | null; matches: boolean }

// Enriched in the asked isotope first (by its enrichment), then natural material.
function enrichmentRank(s: { massNumber: number | null; enrichmentPct: number | null }, massNumber?: number): number {
  if (s.massNumber !== null && (massNumber === undefined || s.massNumber === massNumber)) return 1000 + (s.enrichmentPct ?? 100)
  return s.massNumber === null ? 500 : 0
}
