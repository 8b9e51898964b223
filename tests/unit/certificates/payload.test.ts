import { describe, it, expect } from 'vitest'
import { samplePayload, type CertSampleInput } from '../../../shared/certificates/sample-payload'
import { speciesPayload } from '../../../shared/certificates/species-payload'
import { canonicalJson } from '../../../shared/certificates/canonical'
import { certifiedSummary } from '../../../shared/certificates/summary'
import { describeSpecies, METHODS, IONISATION_SOURCE } from '../../../shared/physics'

const ctx = { number: 'C-2026-000042', version: 1, labName: 'Larchmere Ion Beam Laboratory', issuedAt: '2026-12-01T10:00:00.000Z', issuer: { name: 'Maren Okafor', role: 'Lab manager' }, replaces: null }

const sample: CertSampleInput = {
  id: '5b0c2f5e-8f0e-4d8e-9a57-6a1b2c3d4e5f',
  code: 'S-2026-000003',
  name: '58Ni self-supporting foil',
  material: 'Nickel metal, enriched in 58Ni',
  formula: 'Ni',
  form: 'foil',
  arealDensity: 500,
  arealDensityUncertainty: 15,
  thickness: null,
  bulkDensity: 8.908,
  massMg: 1.8,
  backing: null,
  supplier: 'Quillmoor Isotopes',
  lot: 'QI-58N-1102',
  receivedOn: '2025-11-01',
  recertifyBy: '2027-01-15',
  location: { path: 'B1-012 › B1-012-D1 › B1-012-D1-A', name: 'Desiccator, upper shelf' },
  hazardStatements: ['H317', 'H351', 'H372'],
  radioactive: false,
  nuclide: null,
  activityBq: null,
  components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', enrichmentPercent: 99.61, fractionUncertainty: null, enrichmentUncertainty: 0.05 }],
}

describe('the payload of a sample certificate', () => {
  const p = samplePayload(sample, [{ fileName: 'QI-58N-1102 CoA.pdf', sha256: 'a'.repeat(64) }], ctx)

  it('freezes the values as recorded, with units and uncertainties', () => {
    expect(p.properties.arealDensity).toEqual({ value: 500, uncertainty: 15, unit: 'µg/cm²', derived: false })
    expect(p.properties.mass).toEqual({ value: 1.8, uncertainty: null, unit: 'mg', derived: false })
    expect(p.properties.composition[0]).toMatchObject({ label: '⁵⁸Ni', enrichmentPercent: 99.61, enrichmentUncertainty: 0.05 })
    // t = ρ_A / (0.1 ρ) = 500 / 0.8908 nm (shared/samples/derived.ts)
    expect(p.properties.thickness!.value).toBeCloseTo(500 / 0.8908, 6)
    expect(p.properties.thickness!.derived).toBe(true)
  })

  it('takes the period of validity from the re-certify-by date', () => {
    expect(p.validity.until).toBe('2027-01-15')
    expect(p.validity.statement).toContain('2027-01-15')
  })

  it('carries the hazard statements with their texts and the cautions that defer to the officers', () => {
    expect(p.hazards.statements.map((s) => s.code)).toEqual(['H317', 'H351', 'H372'])
    expect(p.hazards.statements[0]!.text).toBe('May cause an allergic skin reaction')
    expect(p.hazards.cautions.map((c) => c.kind)).toEqual(['toxic'])
    expect(p.hazards.deferral).toMatch(/radiation-protection and safety officers/)
  })

  it('lists the supplier documents on file with their digests', () => {
    expect(p.records).toEqual([{ fileName: 'QI-58N-1102 CoA.pdf', sha256: 'a'.repeat(64) }])
  })

  it('is plain JSON: every value survives canonicalisation', () => {
    expect(() => canonicalJson(p)).not.toThrow()
    expect(JSON.parse(canonicalJson(p))).toEqual(JSON.parse(JSON.stringify(p)))
  })
})

describe('the payload of a species certificate', () => {
  const record = describeSpecies('Fe13+')
  const p = speciesPayload(
    { id: 'f0e1d2c3-b4a5-4697-8877-665544332211', label: 'Fe13+', spectroscopic: 'Fe XIV', elementName: 'Iron', z: 26, charge: 13, massNumber: null, result: { id: 'r', engine: record.engine, methods: record.ionisationEnergy.estimates.map((e) => e.method), recordedAt: '2026-11-30T09:00:00.000Z', recordedBy: 'Tobias Vellacott', record } },
    ctx,
  )

  it('names each method with its citation, the engine version and the reference source', () => {
    for (const m of p.method.methods) expect(m.citation).toBe(METHODS.find((x) => x.name === m.name)!.citation)
    expect(p.method.engine).toBe(record.engine)
    expect(p.method.referenceSource).toBe(IONISATION_SOURCE)
  })

  it('sets every estimate beside the reference value with its deviation', () => {
    const ref = record.ionisationEnergy.reference!.eV
    expect(p.properties.ionisation.reference!.eV).toBe(ref)
    for (const e of p.properties.ionisation.estimates) expect(e.deviationEv).toBeCloseTo(e.eV - ref, 3)
  })

  it('says the computed data are estimates', () => {
    expect(p.estimates).toMatch(/estimates/)
    expect(p.storage).toBeNull()
    expect(p.validity.until).toBe('2027-12-01')
  })
})

describe('the certified summary the verification page shows', () => {
  it('reads the values of a sample certificate from its frozen payload, as printed', () => {
    const p = JSON.parse(canonicalJson(samplePayload(sample, [], ctx)))
    const s = certifiedSummary(p)
    expect(s).toMatchObject({ number: 'C-2026-000042', version: 1, subject: 'S-2026-000003 · 58Ni self-supporting foil', issuedOn: '2026-12-01', validUntil: '2027-01-15', laboratory: 'Larchmere Ion Beam Laboratory' })
    const values = Object.fromEntries(s.values.map((v) => [v.label, v.value]))
    expect(values['Areal density']).toBe('500 ± 15 µg/cm²')
    expect(values['Mass']).toBe('1.8 mg')
    expect(values['⁵⁸Ni (atom fraction)']).toBe('1, enrichment 99.61 ± 0.05 %')
  })
})
