import { parseAnalysisCsv } from '../../../shared/samples/analysis-csv'
import { describe, expect, it } from 'vitest'
import { cleanFileName, contentDisposition, kindFromName, magicMatches, TextChecker } from '../../../shared/samples/filetypes'
import { csvRecordToInput, formatComposition, parseComposition } from '../../../shared/samples/csv'
import { SampleBody } from '../../../shared/schemas/samples'

// File signatures: PDF "%PDF-" (ISO 32000-1 §7.5.2), PNG (RFC 2083 / ISO 15948), JPEG SOI + marker (ITU T.81).
describe('datasheet file types', () => {
  it('reads the claimed type from the extension', () => {
    expect(kindFromName('CoA.PDF')).toBe('pdf')
    expect(kindFromName('photo.jpeg')).toBe('jpeg')
    expect(kindFromName('archive.tar.gz')).toBeNull()
    expect(kindFromName('README')).toBeNull()
  })

  it('checks the first bytes', () => {
    expect(magicMatches('pdf', Buffer.from('%PDF-1.7'))).toBe(true)
    expect(magicMatches('pdf', Buffer.from('%PD'))).toBe(false)
    expect(magicMatches('png', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))).toBe(true)
    expect(magicMatches('jpeg', Buffer.from([0xff, 0xd8, 0xfe]))).toBe(false)
  })

  it('tells text from binary, across chunk boundaries', () => {
    const ok = new TextChecker()
    const euro = Buffer.from('€', 'utf8')
    ok.push(euro.subarray(0, 1))
    ok.push(euro.subarray(1))
    expect(ok.end()).toBe(true)
    const cut = new TextChecker()
    cut.push(euro.subarray(0, 2))
    expect(cut.end()).toBe(false)
    const nul = new TextChecker()
    nul.push(Buffer.from('a\u0000b'))
    expect(nul.end()).toBe(false)
  })

  it('cleans names and writes a download header both old and new clients read', () => {
    expect(cleanFileName('C:\\Users\\m\\CoA "final".pdf')).toBe('CoA final.pdf')
    expect(contentDisposition('Zertifikat ü.pdf')).toBe(`attachment; filename="Zertifikat _.pdf"; filename*=UTF-8''Zertifikat%20%C3%BC.pdf`)
  })
})

describe('the composition cell of the sample CSV', () => {
  it('writes and reads back the same components', () => {
    const components = [
      { z: 20, massNumber: 48, fraction: 0.2, enrichmentPercent: 97.8, fractionUncertainty: 0.01, enrichmentUncertainty: 0.2, analysis: null },
      { z: 6, massNumber: null, fraction: 0.2, enrichmentPercent: null, fractionUncertainty: null, enrichmentUncertainty: null, analysis: null },
      { z: 8, massNumber: null, fraction: 0.6, enrichmentPercent: null, fractionUncertainty: null, enrichmentUncertainty: null, analysis: null },
    ]
    const cell = formatComposition(components)
    // Each value with an uncertainty is written to the uncertainty's second significant digit (JCGM 100:2008 §7.2.6).
    expect(cell).toBe('Ca-48 0.200±0.010 enr 97.80±0.20%; C 0.2; O 0.6')
    const back = parseComposition(cell, 'atom')
    expect(back.problem).toBeNull()
    const parsed = SampleBody.parse({ name: 'x', material: 'y', form: 'powder', components: back.components })
    expect(parsed.components.map(({ basis: _b, ...c }) => c)).toEqual(components)
  })

  it('writes and reads back a full isotopic analysis', () => {
    const analysis = [
      { massNumber: 58, percent: 99.61, uncertainty: 0.05 },
      { massNumber: 60, percent: 0.33, uncertainty: 0.04 },
      { massNumber: 61, percent: 0.01, uncertainty: null },
      { massNumber: 62, percent: 0.04, uncertainty: 0.01 },
      { massNumber: 64, percent: 0.01, uncertainty: 0.005 },
    ]
    const cell = formatComposition([{ z: 28, massNumber: 58, fraction: 1, enrichmentPercent: null, fractionUncertainty: null, enrichmentUncertainty: null, analysis }])
    expect(cell).toBe('Ni-58 1 iso[58=99.610±0.050 60=0.330±0.040 61=0.01 62=0.040±0.010 64=0.0100±0.0050]%')
    const back = parseComposition(cell, 'atom')
    expect(back.problem).toBeNull()
    const parsed = SampleBody.parse({ name: 'x', material: 'y', form: 'foil', components: back.components })
    expect(parsed.components[0]!.analysis).toEqual(analysis)
    expect(parseComposition('Ni-58 1 iso[58:99 60=1]%', 'atom').problem).toContain('iso[58=99.30±0.05')
  })

  it('reads a supplier CSV datasheet of an isotopic analysis, column names matched loosely', () => {
    const file = 'Lot,Isotope,Atom %,Uncertainty %,Method\nQI-1,Ni-58,99.61,0.05,TIMS\nQI-1,60Ni,0.33,0.04,TIMS\nQI-1,61,0.06,,TIMS\nQI-1,Fe-56,0.1,0.1,TIMS\n'
    const r = parseAnalysisCsv(file, 28)
    expect(r.rows).toEqual([
      { massNumber: 58, percent: 99.61, uncertainty: 0.05 },
      { massNumber: 60, percent: 0.33, uncertainty: 0.04 },
      { massNumber: 61, percent: 0.06, uncertainty: null },
    ])
    expect(r.problems).toEqual(['Line 5: "Fe-56" is not an isotope of this element'])
    expect(parseAnalysisCsv('mass,weight\n58,1\n', 28).problems[0]).toContain('header must name')
  })

  it('explains a cell it cannot read', () => {
    expect(parseComposition('Ca-48 1; nickel', 'atom').problem).toContain('Component 2')
  })

  it('maps a row to the form fields, with the problems only the import can see', () => {
    const { input, problems } = csvRecordToInput({ code: 'S-2026-000001', name: 'A', material: 'B', form: 'Sputter cathode', radioactive: 'maybe', location: 'nowhere', composition: 'Cu 1' }, new Map())
    expect(input).toMatchObject({ form: 'sputter_cathode', components: [{ z: 29, massNumber: null, fraction: '1', basis: 'atom' }] })
    expect(problems.map((p) => p.column)).toEqual(['code', 'radioactive', 'location'])
  })
})
