import { describe, it, expect } from 'vitest'
import { formulaText, labelContent, scanUrl } from '../../../shared/labels/content'
import { sampleCodeFrom } from '../../../shared/labels/scan-code'

const base = {
  formula: null as string | null,
  form: 'foil' as const,
  radioactive: false,
  nuclide: null as string | null,
  hazardStatements: [] as string[],
}

describe('what a label says', () => {
  it('names an enriched isotope with its enrichment as the main species', () => {
    const l = labelContent({ ...base, code: 'S-2026-000003', name: '58Ni foil', formula: 'Ni', hazardStatements: ['H317', 'H351', 'H372'], components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', enrichmentPercent: 99.61 }] }, 'https://lab.example/')
    expect(l.composition).toBe('⁵⁸Ni 99.61 %')
    expect(l.place).toBeNull()
    expect(l.url).toBe('https://lab.example/scan/S-2026-000003')
    expect(l.pictograms).toEqual(['GHS07', 'GHS08'])
    expect(l.radiation).toBeNull()
  })

  it('lists a compound\'s components in recorded order, with the formula beside them', () => {
    const l = labelContent({ ...base, code: 'S-2026-000026', name: 'Titanium hydride cathode', formula: 'TiH2', form: 'sputter_cathode', components: [{ z: 22, massNumber: null, fraction: 0.3333, basis: 'atom', enrichmentPercent: null }, { z: 1, massNumber: null, fraction: 0.6667, basis: 'atom', enrichmentPercent: null }] }, 'http://x')
    expect(l.composition).toBe('Ti + H · TiH₂')
  })

  it('carries a radiation caution with the nuclide for a radioactive sample', () => {
    const l = labelContent({ ...base, code: 'S-2026-000034', name: 'UF4 target', formula: 'UF4', radioactive: true, nuclide: 'U-238', hazardStatements: ['H300', 'H330', 'H373', 'H411'], components: [{ z: 92, massNumber: 238, fraction: 0.2, basis: 'atom', enrichmentPercent: 99.8 }, { z: 9, massNumber: null, fraction: 0.8, basis: 'atom', enrichmentPercent: null }] }, 'http://x')
    expect(l.radiation).toEqual({ nuclide: 'U-238' })
    expect(l.composition).toBe('²³⁸U 99.8 % + F · UF₄')
    expect(l.pictograms).toEqual(['GHS06', 'GHS08', 'GHS09'])
  })

  it('lists every component, not only the first, and the storage place', () => {
    const l = labelContent(
      { ...base, code: 'S-2026-000008', name: '7LiF on carbon backing', formula: 'LiF', place: { path: 'B1 › R104 › C3', name: 'Target cabinet' }, components: [{ z: 3, massNumber: 7, fraction: 0.5, basis: 'atom', enrichmentPercent: 99.9 }, { z: 9, massNumber: null, fraction: 0.5, basis: 'atom', enrichmentPercent: null }] },
      'http://x',
    )
    expect(l.composition).toBe('⁷Li 99.9 % + F · LiF')
    expect(l.place).toBe('C3 (Target cabinet)')
  })

  it('flags an element with no stable isotope as radioactive even when the record forgot to', () => {
    const l = labelContent({ ...base, code: 'S-2026-000099', name: 'Thorium foil', formula: 'Th', components: [{ z: 90, massNumber: 232, fraction: 1, basis: 'atom', enrichmentPercent: null }] }, 'http://x')
    expect(l.radiation).toEqual({ nuclide: 'Th-232' })
  })

  it('puts a caution in words where no pictogram shows it (lithium metal, no H-codes recorded)', () => {
    const l = labelContent({ ...base, code: 'S-2026-000098', name: 'Lithium metal', formula: 'Li', components: [{ z: 3, massNumber: null, fraction: 1, basis: 'atom', enrichmentPercent: null }] }, 'http://x')
    expect(l.pictograms).toEqual([])
    expect(l.otherCautions).toEqual(['Reacts with air or water'])
  })

  it('writes formula counts as subscripts', () => {
    expect(formulaText('CaCO3')).toBe('CaCO₃')
    expect(formulaText('Sm2O3')).toBe('Sm₂O₃')
    expect(formulaText('Ca(OH)2')).toBe('Ca(OH)₂')
  })

  it('builds the scan URL under the public base URL', () => {
    expect(scanUrl('https://ionfolio.lab.example//', 'S-2026-000001')).toBe('https://ionfolio.lab.example/scan/S-2026-000001')
  })
})

describe('sample codes from what was scanned or typed', () => {
  it.each([
    ['https://ionfolio.lab.example/scan/S-2026-000042', 'S-2026-000042'],
    ['http://127.0.0.1:3300/scan/s-2026-000042?from=label', 'S-2026-000042'],
    ['S-2026-000042', 'S-2026-000042'],
    ['s 2026 42', 'S-2026-000042'],
    ['S-2026-42', 'S-2026-000042'],
    ['S-2026-1234567', 'S-2026-1234567'],
    ['https://example.com/other', null],
    ['C-2026-000001', null],
    ['', null],
  ])('%s → %s', (text, code) => {
    expect(sampleCodeFrom(text)).toBe(code)
  })
})
