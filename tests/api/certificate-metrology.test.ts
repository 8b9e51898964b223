import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { signedIn, unique, type Client } from '../support/api'
import { closeTestDb } from '../support/db'
import { pdfText, renderPages } from '../support/pdf'
import { certifiableSample, issue, pdfOf } from '../support/certificates'
import { HEADINGS } from '../../shared/certificates/payload'

let manager: Client
beforeAll(async () => {
  manager = await signedIn('manager')
})
afterAll(closeTestDb)

const oneLine = (s: string) => s.replace(/\s+/g, ' ')
// A fictional supplier's analysis of a ⁵⁸Ni lot (demo data), atom % with standard uncertainties.
const ANALYSIS = [
  { massNumber: 58, percent: 99.3, uncertainty: 0.05 },
  { massNumber: 60, percent: 0.55, uncertainty: 0.04 },
  { massNumber: 61, percent: 0.03, uncertainty: 0.01 },
  { massNumber: 62, percent: 0.1, uncertainty: 0.02 },
  { massNumber: 64, percent: 0.02, uncertainty: 0.01 },
]

/** The headings that end a page's text (the footer aside): a heading left alone at the foot of a page. */
function orphanHeadings(text: string): string[] {
  const headings = new Set<string>(Object.values(HEADINGS))
  return text
    .split('\f')
    .slice(0, -1)
    .map((page) => page.split('\n').map((l) => l.trim()).filter((l) => l && !/^Page \d+ of \d+$/.test(l) && !/^C-\d{4}-\d+ · version/.test(l)))
    .filter((lines) => lines.length && headings.has(lines.at(-1)!))
    .map((lines) => lines.at(-1)!)
}

describe('a certificate a metrologist would sign', () => {
  let text = ''
  let pdf: Buffer
  beforeAll(async () => {
    const s = await certifiableSample(manager, {
      name: `Analysed 58Ni foil ${unique()}`,
      thickness: 6452,
      bulkDensity: null,
      arealDensity: null,
      arealDensityUncertainty: null,
      components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', analysis: ANALYSIS }],
      notes: 'Certificate layout test.',
    })
    const cert = await issue(manager, 'sample', s.id)
    pdf = await pdfOf(manager, cert.id)
    text = await pdfText(pdf)
  })

  it('cites the evaluations behind the isotope data, and names the package only as their carrier', () => {
    const t = oneLine(text)
    expect(t).toContain('AME2016')
    expect(t).toContain('Chin. Phys. C 41, 030003 (2017)')
    expect(t).toContain('NIST Standard Reference Database 144')
    expect(t).toContain('Pure Appl. Chem. 70, 217 (1998)')
    expect(t).toMatch(/Carried in Ionfolio by the npm package chemical-elements/)
    expect(t).toContain('JCGM 100:2008')
    expect(t).toContain('JCGM 101:2008')
  })

  it('prints the supplier analysis and every derived value rounded to its uncertainty', () => {
    const t = oneLine(text)
    // pdftotext reads the superscript mass number apart from the symbol: match the words around it.
    expect(t).toMatch(/Isotopic analysis of .{0,8}Ni as supplied/)
    expect(t).toContain('99.300 ± 0.050 %')
    expect(t).toContain('0.550 ± 0.040 %')
    // No derived value carries more digits than its uncertainty: "x ± u" with u of two significant digits.
    for (const m of t.matchAll(/(\d[\d.]*) ± (\d[\d.]*)/g)) {
      const digits = m[2]!.includes('.') ? m[2]!.replace('.', '').replace(/^0+/, '') : m[2]!.replace(/0+$/, '')
      expect(digits.length, m[0]).toBeLessThanOrEqual(2)
      const decimals = (s: string) => (s.split('.')[1] ?? '').length
      expect(decimals(m[1]!), m[0]).toBe(decimals(m[2]!))
    }
  })

  it('prints no character the fonts lack (pdftotext reads those as "?")', () => {
    expect(text).not.toContain('?')
  })

  it('names no radiation protection on a sample that is not radioactive', () => {
    expect(text).not.toMatch(/radiation/i)
  })

  it('keeps every heading on the page of what it heads', async () => {
    expect(orphanHeadings(text)).toEqual([])
    const pages = await renderPages(pdf, 60)
    expect(pages.length).toBeGreaterThanOrEqual(1)
  })
})

describe('a radioactive sample\'s certificate', () => {
  it('defers to the radiation protection officer', async () => {
    const s = await certifiableSample(manager, {
      name: `Depleted uranium fluoride ${unique()}`,
      material: 'Uranium tetrafluoride, depleted',
      formula: 'UF4',
      hazardStatements: 'H300+H330 H373 H411',
      radioactive: true,
      nuclide: 'U-238',
      activityBq: 8.5,
      activityReferenceDate: '2024-03-01',
      components: [{ z: 92, massNumber: 238, fraction: 0.2, basis: 'atom', enrichmentPercent: 99.8 }, { z: 9, massNumber: null, fraction: 0.8, basis: 'atom' }],
    })
    const cert = await issue(manager, 'sample', s.id)
    const t = oneLine(await pdfText(await pdfOf(manager, cert.id)))
    expect(t).toContain("institution's radiation protection officer")
    // The activity with its decay reference date, the activity at issue, and the grown-in daughters.
    expect(t).toMatch(/U-238, recorded for (1 Mar 2024|2024-03-01)/)
    expect(t).toMatch(/Activity at issue 8\.5 Bq U-238 on .* decay-corrected/)
    expect(t).toMatch(/daughter Th-234 8\.5 Bq/)
    expect(t).toContain('NUBASE2020')
    expect(orphanHeadings(await pdfText(await pdfOf(manager, cert.id)))).toEqual([])
  })
})
