// How a validated sample maps onto its rows. Relative imports and no Nitro auto-imports, so the
// seeds and the bench write rows exactly as the routes do.
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
