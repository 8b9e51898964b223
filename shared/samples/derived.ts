/**
 * Quantities derived from a sample's record, each with the formula the page prints beside it.
 *
 * Areal density and thickness. A layer of bulk density ρ and thickness t holds ρ · t of mass per
 * area. With t in nm (1 nm = 10⁻⁷ cm) and ρ in g/cm³: ρ · t = ρ · t · 10⁻⁷ g/cm², and
 * 1 g = 10⁶ µg, so ρ_A [µg/cm²] = ρ [g/cm³] · t [nm] · 0.1.
 *
 * Atoms per area. ρ_A / M̄ is the amount of atoms per area (mol/cm², with ρ_A in g/cm² and M̄ the
 * mean atomic mass in g/mol, numerically the mass in u); times N_A gives atoms/cm²; an isotope
 * holding the atom fraction x_i of them has N_i = ρ_A · N_A · x_i / M̄.
 */
import { expandComposition, type ComponentInput, type ExpandedIsotope } from './composition'
import { compositionModel } from './composition-model'
import { AVOGADRO_CONSTANT } from './constants'
import { propagateGum } from './propagation'

/** Avogadro constant, 1/mol: exact since the 2019 SI redefinition (BIPM SI Brochure, 9th edition). */
export const AVOGADRO = AVOGADRO_CONSTANT

/** µg/cm² per (g/cm³ · nm). */
export const AREAL_PER_DENSITY_NM = 0.1

export const FORMULAS = {
  meanAtomicMass: 'M = Σᵢ xᵢ · mᵢ   (M mean atomic mass; xᵢ atom fraction, mᵢ atomic mass of isotope i)',
  massToAtomFraction: 'x_c = (w_c / M_c) / Σⱼ (w_j / M_j)   (mass fraction w, mean atomic mass M of each component)',
  enrichment: 'isotope share = e; the other natural isotopes share 1 − e in their natural proportions',
  analysis: 'isotopic analysis: xᵢ = yᵢ / Σⱼ yⱼ   (the supplier\'s atom percentages y, normalised: Σᵢ xᵢ = 1)',
  arealDensity: 'ρ_A [µg/cm²] = ρ [g/cm³] · t [nm] · 0.1   (1 nm = 10⁻⁷ cm, 1 g = 10⁶ µg)',
  thickness: 't [nm] = ρ_A [µg/cm²] / (0.1 · ρ [g/cm³])',
  bulkDensity: 'ρ [g/cm³] = ρ_A [µg/cm²] / (0.1 · t [nm])',
  atomsPerArea: 'Nᵢ [atoms/cm²] = ρ_A [g/cm²] · N_A · xᵢ / M   (N_A = 6.02214076 × 10²³ /mol)',
  atomsUncertainty:
    'u²(y) = Σⱼ cⱼ² u²(xⱼ) over every recorded input xⱼ (fractions, enrichments, analysis lines, ρ_A), cⱼ the sensitivity coefficient of xⱼ: GUM first-order propagation, JCGM 100:2008 §5.1.2, through the closure Σᵢ xᵢ = 1 (its covariance carried); checked by Monte Carlo, JCGM 101:2008',
} as const

/** Areal density, µg/cm², of a layer `thicknessNm` thick at bulk density `densityGcm3`. */
export function arealDensityFromThickness(thicknessNm: number, densityGcm3: number): number {
  return densityGcm3 * thicknessNm * AREAL_PER_DENSITY_NM
}

/** Thickness, nm, of a layer of areal density `arealUgCm2` at bulk density `densityGcm3`. */
export function thicknessFromArealDensity(arealUgCm2: number, densityGcm3: number): number {
  return arealUgCm2 / (AREAL_PER_DENSITY_NM * densityGcm3)
}

/** Bulk density, g/cm³, that a given areal density and thickness imply. */
export function bulkDensityFrom(arealUgCm2: number, thicknessNm: number): number {
  return arealUgCm2 / (AREAL_PER_DENSITY_NM * thicknessNm)
}

/** Atoms per cm² of an isotope with atom fraction `atomFraction` in a layer of `arealUgCm2`. */
export function atomsPerCm2(arealUgCm2: number, meanAtomicMassU: number, atomFraction: number): number {
  return ((arealUgCm2 * 1e-6) * AVOGADRO * atomFraction) / meanAtomicMassU
}

export interface DerivedInput {
  arealDensity: number | null
  arealDensityUncertainty: number | null
  thickness: number | null
  bulkDensity: number | null
  components: readonly ComponentInput[]
}

export interface DerivedIsotope extends ExpandedIsotope {
  /** standard uncertainty of the atom fraction, null when no input carries one */
  atomFractionUncertainty: number | null
  atomsPerCm2: number | null
  atomsPerCm2Uncertainty: number | null
}

export interface Derived {
  composition: { ok: true; meanAtomicMassU: number; meanAtomicMassUncertainty: number | null; isotopes: DerivedIsotope[] } | { ok: false; message: string } | null
  /** the areal density to compute with: as recorded, or from thickness and bulk density */
  arealDensity: { value: number; uncertainty: number | null; derived: boolean } | null
  thickness: { value: number; uncertainty: number | null; derived: boolean } | null
  /** bulk density implied by a recorded areal density and thickness together */
  impliedBulkDensity: number | null
}

/** Everything the sample page shows beyond what was recorded. */
export function deriveSample(s: DerivedInput): Derived {
  let areal: Derived['arealDensity'] = s.arealDensity ? { value: s.arealDensity, uncertainty: s.arealDensityUncertainty, derived: false } : null
  let thickness: Derived['thickness'] = s.thickness ? { value: s.thickness, uncertainty: null, derived: false } : null
  if (!areal && s.thickness && s.bulkDensity) areal = { value: arealDensityFromThickness(s.thickness, s.bulkDensity), uncertainty: null, derived: true }
  if (!thickness && s.arealDensity && s.bulkDensity) {
    thickness = {
      value: thicknessFromArealDensity(s.arealDensity, s.bulkDensity),
      uncertainty: s.arealDensityUncertainty ? thicknessFromArealDensity(s.arealDensityUncertainty, s.bulkDensity) : null,
      derived: true,
    }
  }
  const impliedBulkDensity = s.arealDensity && s.thickness ? bulkDensityFrom(s.arealDensity, s.thickness) : null

  let composition: Derived['composition'] = null
  if (s.components.length) {
    const e = expandComposition(s.components)
    if (!e.ok) composition = e
    else {
      const model = compositionModel(s.components, areal)
      const p = model && model.inputs.length ? propagateGum(model.evaluate, model.inputs) : null
      const n = e.isotopes.length
      // Below 10⁻⁹ of the value is the noise of the numerical derivatives: no uncertainty.
      const u = (k: number) => (p && p.uncertainties[k]! > 1e-9 * Math.abs(p.values[k]!) ? p.uncertainties[k]! : null)
      composition = {
        ok: true,
        meanAtomicMassU: e.meanAtomicMassU,
        meanAtomicMassUncertainty: u(n),
        isotopes: e.isotopes.map((i, k) => {
          const atoms = areal ? atomsPerCm2(areal.value, e.meanAtomicMassU, i.atomFraction) : null
          return { ...i, atomFractionUncertainty: u(k), atomsPerCm2: atoms, atomsPerCm2Uncertainty: atoms !== null ? u(n + 1 + k) : null }
        }),
      }
    }
  }
  return { composition, arealDensity: areal, thickness, impliedBulkDensity }
}
