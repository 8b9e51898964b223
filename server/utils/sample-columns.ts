// How a validated sample maps onto its rows. Relative imports and no Nitro auto-imports, so the
// seeds and the bench write rows exactly as the routes do.
import type { Knex } from 'knex'
import type { SampleData } from '../../shared/schemas/samples'
import { hazardKinds } from '../../shared/samples/hazards'
import type { SampleForm } from '../../shared/samples/vocabulary'

/** The columns a validated sample writes; the hazard kinds are worked out here, on every write. */
export function sampleColumns(s: SampleData) {
  return {
    name: s.name,
    material: s.material,
    formula: s.formula,
    form: s.form,
    status: s.status,
    areal_density_ug_cm2: s.arealDensity,
    areal_density_unc_ug_cm2: s.arealDensityUncertainty,
    thickness_nm: s.thickness,
    bulk_density_g_cm3: s.bulkDensity,
    mass_mg: s.massMg,
    backing: s.backing,
    supplier: s.supplier,
    lot: s.lot,
    received_on: s.receivedOn,
    recertify_by: s.recertifyBy,
    location_id: s.locationId,
    hazard_statements: s.hazardStatements,
    hazard_kinds: hazardKinds({ ...s, form: s.form as SampleForm }),
    radioactive: s.radioactive,
    nuclide: s.nuclide,
    activity_bq: s.activityBq,
    activity_reference_on: s.activityReferenceDate,
    notes: s.notes,
  }
}

/** The sample_components rows of a validated sample, in order. */
export function componentRows(sampleId: string, s: SampleData) {
  return s.components.map((c, position) => ({
    sample_id: sampleId,
    position,
    z: c.z,
    mass_number: c.massNumber,
    fraction: c.fraction,
    fraction_basis: c.basis,
    enrichment_pct: c.enrichmentPercent,
    fraction_unc: c.fractionUncertainty,
    enrichment_unc_pct: c.enrichmentUncertainty,
  }))
}

/** The sample_component_isotopes rows of one component's analysis, for the component row `componentId`. */
export function analysisRows(componentId: number, analysis: SampleData['components'][number]['analysis']) {
  return (analysis ?? []).map((r, position) => ({ component_id: componentId, position, mass_number: r.massNumber, atom_pct: r.percent, atom_unc_pct: r.uncertainty }))
}

/** Writes a validated sample's components and their analyses (the old ones already deleted). */
export async function insertComponents(trx: Knex.Transaction, sampleId: string, s: SampleData): Promise<void> {
  if (!s.components.length) return
  const ids = await trx('sample_components').insert(componentRows(sampleId, s)).returning('id')
  const isotopes = s.components.flatMap((c, i) => analysisRows(Number(ids[i]!.id), c.analysis))
  if (isotopes.length) await trx('sample_component_isotopes').insert(isotopes)
}

/** The analysis lines of each component id, in order, as the API answers them. */
export async function analysesOf(db: Knex | Knex.Transaction, componentIds: number[]): Promise<Map<number, { massNumber: number; percent: number; uncertainty: number | null }[]>> {
  const out = new Map<number, { massNumber: number; percent: number; uncertainty: number | null }[]>()
  if (!componentIds.length) return out
  const rows = await db('sample_component_isotopes').whereIn('component_id', componentIds).orderBy(['component_id', 'position'])
  for (const r of rows) {
    const id = Number(r.component_id)
    if (!out.has(id)) out.set(id, [])
    out.get(id)!.push({ massNumber: r.mass_number, percent: r.atom_pct, uncertainty: r.atom_unc_pct })
  }
  return out
}
