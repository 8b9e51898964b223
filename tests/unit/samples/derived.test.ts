import { createRequire } from 'node:module'
import { describe, expect, it } from 'vitest'
import { arealDensityFromThickness, atomsPerCm2, AVOGADRO, bulkDensityFrom, deriveSample, thicknessFromArealDensity } from '../../../shared/samples/derived'
import { expandComposition, fractionSumProblem, isotopicMakeUp } from '../../../shared/samples/composition'
import { ASE_WEIGHTS } from '../physics/fixtures'

interface PackageElement { number: number; symbol: string; isotopes: { nominal: number; mass: number; abundance?: number }[] }
// npm chemical-elements 2.3.3 (NIST isotopic compositions), read here directly, not through our copy.
const { elementsAndIsotopes } = createRequire(import.meta.url)('chemical-elements') as { elementsAndIsotopes: PackageElement[] }
const nist = (z: number) => elementsAndIsotopes.find((e) => e.number === z)!
const massOf = (z: number, a: number) => nist(z).isotopes.find((i) => i.nominal === a)!.mass

describe('areal density and thickness: ρ_A [µg/cm²] = ρ [g/cm³] · t [nm] · 0.1', () => {
  it.each([
    // [what, bulk density g/cm³ and its source, thickness nm, areal density µg/cm²]
    ['gold, 100 nm', 19.32, 'CRC Handbook of Chemistry and Physics, density of gold (from memory)', 100, 193.2],
    ['aluminium, 6 µm', 2.70, 'CRC Handbook, density of aluminium (from memory)', 6000, 1620],
    ['amorphous carbon stripper foil', 2.0, 'usual density of evaporated carbon foils (common practice, no source)', 50, 10],
    ['nickel, 1 µm', 8.908, 'CRC Handbook, density of nickel (from memory)', 1000, 890.8],
  ])('%s', (_what, density, _source, nm, ug) => {
    expect(arealDensityFromThickness(nm, density)).toBeCloseTo(ug, 9)
    expect(thicknessFromArealDensity(ug, density)).toBeCloseTo(nm, 9)
    expect(bulkDensityFrom(ug, nm)).toBeCloseTo(density, 12)
  })

  it('derives the missing one of the pair, carrying the areal density uncertainty to the thickness', () => {
    const d = deriveSample({ arealDensity: 193.2, arealDensityUncertainty: 3.864, thickness: null, bulkDensity: 19.32, components: [] })
    expect(d.thickness).toEqual({ value: expect.closeTo(100, 9), uncertainty: expect.closeTo(2, 9), derived: true })
    const back = deriveSample({ arealDensity: null, arealDensityUncertainty: null, thickness: 100, bulkDensity: 19.32, components: [] })
    expect(back.arealDensity).toEqual({ value: expect.closeTo(193.2, 9), uncertainty: null, derived: true })
    const both = deriveSample({ arealDensity: 193.2, arealDensityUncertainty: null, thickness: 100, bulkDensity: null, components: [] })
    expect(both.impliedBulkDensity).toBeCloseTo(19.32, 9)
  })
})

describe('mean atomic mass of natural elements from NIST isotopic compositions', () => {
  // The abundance-weighted mean of the isotope masses is what the IUPAC standard atomic weight
  // measures; it must fall within the weight's stated uncertainty (IUPAC 2013, Meija et al. 2016, via ASE).
  it.each([
    ['Ni', 28, 0.0004],
    ['Cu', 29, 0.003],
    ['Au', 79, 0.000005],
    ['Ta', 73, 0.00002],
    ['Sn', 50, 0.007],
    ['Ti', 22, 0.001],
  ])('%s matches the IUPAC standard atomic weight within ±%s', (_s, z, within) => {
    const e = expandComposition([{ z, massNumber: null, fraction: 1, basis: 'atom' }])
    expect(e.ok).toBe(true)
    if (e.ok) expect(Math.abs(e.meanAtomicMassU - ASE_WEIGHTS[z - 1]!.value)).toBeLessThanOrEqual(within + 1e-9)
  })
})

describe('isotopic make-up of an enriched isotope', () => {
  it('gives the rest to the other natural isotopes in their natural proportions (48Ca at 97.8 %)', () => {
    const m = isotopicMakeUp(20, 48, 97.8)
    expect(m.ok).toBe(true)
    if (!m.ok) return
    const natural = nist(20).isotopes.filter((i) => i.abundance && i.nominal !== 48)
    const rest = natural.reduce((s, i) => s + i.abundance!, 0)
    expect(m.shares[0]).toEqual({ massNumber: 48, massU: massOf(20, 48), share: 0.978 })
    for (const i of natural) expect(m.shares.find((s) => s.massNumber === i.nominal)!.share).toBeCloseTo((0.022 * i.abundance!) / rest, 12)
    expect(m.shares.reduce((s, i) => s + i.share, 0)).toBeCloseTo(1, 12)
  })

  it('refuses a blank enrichment where nature has other isotopes, and a remainder nothing can make up', () => {
    expect(isotopicMakeUp(28, 58, null)).toMatchObject({ ok: false, message: expect.stringContaining('Give the enrichment of ⁵⁸Ni') })
    // ¹⁹⁷Au is gold's only natural isotope: nothing else could make up a remainder, so blank is 100 %.
    expect(isotopicMakeUp(79, 197, null)).toEqual({ ok: true, shares: [{ massNumber: 197, massU: massOf(79, 197), share: 1 }] })
    expect(isotopicMakeUp(79, 197, 99)).toMatchObject({ ok: false, message: expect.stringContaining('no other natural isotope') })
    expect(isotopicMakeUp(94, null)).toMatchObject({ ok: false, message: expect.stringContaining('no natural isotopic composition') })
    expect(isotopicMakeUp(28, 99)).toMatchObject({ ok: false, message: expect.stringContaining('99Ni') })
  })
})

describe('atom fractions and atoms per cm²: Nᵢ = ρ_A · N_A · xᵢ / M̄', () => {
  it('turns the mass fractions of water into atom fractions 2 : 1 (stoichiometry, common practice)', () => {
    const e = expandComposition([{ z: 1, massNumber: null, fraction: 0.111894, basis: 'mass' }, { z: 8, massNumber: null, fraction: 0.888106, basis: 'mass' }])
    expect(e.ok).toBe(true)
    if (!e.ok) return
    expect(e.componentAtomFraction[0]).toBeCloseTo(2 / 3, 4)
    expect(e.componentAtomFraction[1]).toBeCloseTo(1 / 3, 4)
  })

  it('counts the atoms of 1 mg/cm² of gold: 1e-3 g · N_A / m(197Au)', () => {
    const expected = (1e-3 * 6.02214076e23) / massOf(79, 197) // N_A exact (SI 2019); m(197Au) NIST via chemical-elements
    expect(AVOGADRO).toBe(6.02214076e23)
    expect(atomsPerCm2(1000, massOf(79, 197), 1) / expected).toBeCloseTo(1, 12)
    expect(expected).toBeCloseTo(3.0574e18, -14) // about 3.06 × 10¹⁸ atoms/cm² (from memory)
  })

  it('splits the atoms of a compound target by isotope, with the uncertainties combined', () => {
    // ⁷LiF, 150 ± 6 µg/cm², ⁷Li at 99.9 ± 0.05 %.
    const d = deriveSample({
      arealDensity: 150,
      arealDensityUncertainty: 6,
      thickness: null,
      bulkDensity: null,
      components: [
        { z: 3, massNumber: 7, fraction: 0.5, basis: 'atom', enrichmentPercent: 99.9, enrichmentUncertainty: 0.05 },
        { z: 9, massNumber: null, fraction: 0.5, basis: 'atom' },
      ],
    })
    expect(d.composition?.ok).toBe(true)
    if (!d.composition?.ok) return
    const m7 = massOf(3, 7), m6 = massOf(3, 6), m19 = massOf(9, 19)
    const mean = 0.5 * (0.999 * m7 + 0.001 * m6) + 0.5 * m19
    expect(d.composition.meanAtomicMassU).toBeCloseTo(mean, 10)
    const li7 = d.composition.isotopes.find((i) => i.massNumber === 7)!
    expect(li7.atomFraction).toBeCloseTo(0.4995, 12)
    expect(li7.atomsPerCm2! / ((150e-6 * 6.02214076e23 * 0.4995) / mean)).toBeCloseTo(1, 12)
    // x(⁷Li) = 0.5 e exactly; N also feels e through M̄ (a little), so it matches the quadrature sum to 5 digits.
    expect(li7.atomFractionUncertainty! / li7.atomFraction).toBeCloseTo(0.05 / 99.9, 9)
    expect(li7.atomsPerCm2Uncertainty! / li7.atomsPerCm2!).toBeCloseTo(Math.hypot(6 / 150, 0.05 / 99.9), 5)
    const f19 = d.composition.isotopes.find((i) => i.z === 9)!
    expect(f19.atomsPerCm2Uncertainty! / f19.atomsPerCm2!).toBeCloseTo(6 / 150, 6)
  })
})

describe('fractions must add up to 1 within 0.001', () => {
  it.each([
    [[0.5, 0.4995], null],
    [[0.5, 0.5011], '1.0011'],
    [[0.2, 0.6], '0.8000'],
  ])('%j', (fractions, shown) => {
    const p = fractionSumProblem(fractions.map((fraction) => ({ fraction })))
    if (shown === null) expect(p).toBeNull()
    else expect(p).toContain(shown)
  })
})
