import { describe, it, expect, beforeAll } from 'vitest'
import { readFileSync } from 'node:fs'
import { woffToSfnt } from '../../../server/pdf/woff'
import { fontMetrics } from '../../../server/pdf/font-metrics'
import { fontFileNames, OMITTED_TABLES, runs, textWidth } from '../../../server/pdf/fonts'
import { fontPath, preparePackageFonts } from '../../../server/pdf/package-fonts'
import { fitLines, mm } from '../../../server/pdf/layout'
import { LABEL, SHEET, PER_SHEET, labelsDocument, sheetSlot } from '../../../server/pdf/labels'
import { labelContent } from '../../../shared/labels/content'

beforeAll(() => preparePackageFonts())

// OpenType spec, "Calculating checksums": the table as big-endian uint32 words, summed mod 2³²,
// the last word padded with zeros. The head table's checkSumAdjustment word counts as zero.
function checksum(table: Buffer, isHead: boolean): number {
  const padded = Buffer.concat([table, Buffer.alloc((4 - (table.length % 4)) % 4)])
  let sum = 0
  for (let i = 0; i < padded.length; i += 4) if (!(isHead && i === 8)) sum = (sum + padded.readUInt32BE(i)) >>> 0
  return sum
}

describe('WOFF to TrueType', () => {
  it.each(fontFileNames())('%s unpacks to an sfnt whose every table matches its recorded checksum', (file) => {
    const ttf = woffToSfnt(readFileSync(fontPath(file)))
    expect([0x00010000, 0x4f54544f]).toContain(ttf.readUInt32BE(0))
    const tables = ttf.readUInt16BE(4)
    expect(tables).toBeGreaterThan(5)
    for (let i = 0; i < tables; i++) {
      const at = 12 + i * 16
      const tag = ttf.toString('latin1', at, at + 4)
      const offset = ttf.readUInt32BE(at + 8)
      const table = ttf.subarray(offset, offset + ttf.readUInt32BE(at + 12))
      expect(checksum(table, tag === 'head'), tag).toBe(ttf.readUInt32BE(at + 4))
    }
  })

  it('leaves out the OpenType layout tables the app does without, and keeps the file sound', () => {
    const ttf = woffToSfnt(readFileSync(fontPath('inter-latin-400-normal.woff')), { omit: OMITTED_TABLES })
    const tags = Array.from({ length: ttf.readUInt16BE(4) }, (_, i) => ttf.toString('latin1', 12 + i * 16, 16 + i * 16))
    for (const t of OMITTED_TABLES) expect(tags).not.toContain(t)
    expect(tags).toEqual(expect.arrayContaining(['cmap', 'glyf', 'head', 'hhea', 'hmtx', 'loca', 'maxp']))
    expect([...tags].sort()).toEqual(tags)
    expect(fontMetrics(ttf).advance.get('A'.codePointAt(0)!)).toBeGreaterThan(0.5)
  })

  it('refuses a file that is not WOFF', () => {
    expect(() => woffToSfnt(Buffer.from('not a font at all, not at all'))).toThrow(/WOFF/)
  })
})

describe('subsets and the characters certificates print', () => {
  const has = (file: string, ch: string) => fontMetrics(woffToSfnt(readFileSync(fontPath(file)))).advance.has(ch.codePointAt(0)!)
  it.each([
    ['inter-latin-400-normal.woff', 'µ±×°²'],
    ['inter-latin-ext-400-normal.woff', 'ŁłŻżźćęąő'],
    ['inter-greek-400-normal.woff', 'σαΩ'],
    ['roboto-mono-latin-ext-400-normal.woff', 'Łł'],
  ])('%s has %s', (file, chars) => {
    for (const ch of chars) expect(has(file, ch), ch).toBe(true)
  })

  it('hands every character of an accented name to a subset that has it', () => {
    const out = runs('Łukasz Wróbel, Żółć')
    expect(Array.isArray(out)).toBe(true)
    const text = (out as { text: string; font?: string }[]).map((r) => r.text).join('')
    expect(text).toBe('Łukasz Wróbel, Żółć')
    expect((out as { text: string; font?: string }[]).find((r) => r.text.includes('Ł'))?.font).toBe('Inter-latin-ext')
  })

  it('sets superscript mass numbers as raised digits and keeps a lone ² as it is', () => {
    expect(runs('⁵⁸Ni')).toEqual([{ text: '58', font: 'Inter', sup: true }, { text: 'Ni', font: 'Inter' }])
    expect(runs('µg/cm²')).toEqual([{ text: 'µg/cm²', font: 'Inter' }])
  })

  it('leaves plain Latin-1 text alone', () => {
    expect(runs('Areal density 500 ± 15')).toBe('Areal density 500 ± 15')
  })
})

describe('fitting text into a label', () => {
  it('breaks into lines that fit and ends an overlong text with an ellipsis', () => {
    const width = mm(24.5)
    const lines = fitLines('Enriched nickel-58 self-supporting foil rolled to one micrometre, batch two', width, 6.5, 2)
    expect(lines).toHaveLength(2)
    for (const l of lines) expect(textWidth(l, 6.5)).toBeLessThanOrEqual(width)
    expect(lines[1]!.endsWith('…')).toBe(true)
    for (const l of fitLines('Enriched nickel-58 self-supporting foil rolled thin', width, 6.5, 2, 'Inter', true)) expect(textWidth(l, 6.5, 'Inter', true)).toBeLessThanOrEqual(width)
    expect(textWidth('Nickel', 6.5, 'Inter', true)).toBeGreaterThan(textWidth('Nickel', 6.5))
  })

  it('breaks a word wider than the line by characters', () => {
    const lines = fitLines('Supercalifragilisticexpialidocious-isotope-mixture', mm(15), 6.5, 3)
    expect(lines.length).toBeGreaterThan(1)
    for (const l of lines) expect(textWidth(l, 6.5)).toBeLessThanOrEqual(mm(15))
  })
})

describe('the sheet geometry', () => {
  it('keeps every label on the A4 page, ≥ 12.7 mm from each edge (the widest common printer margin; common practice, no source)', () => {
    for (let i = 0; i < PER_SHEET; i++) {
      const { x, y } = sheetSlot(i)
      expect(x).toBeGreaterThanOrEqual(12.7)
      expect(y).toBeGreaterThanOrEqual(12.7)
      expect(SHEET.width - (x + LABEL.width)).toBeGreaterThanOrEqual(12.7)
      expect(SHEET.height - (y + LABEL.height)).toBeGreaterThanOrEqual(12.7)
    }
  })

  it('never lets two labels touch', () => {
    expect(SHEET.pitchX - LABEL.width).toBeGreaterThan(0)
    expect(SHEET.pitchY - LABEL.height).toBeGreaterThan(0)
  })
})

describe('every text on a label stays inside it', () => {
  const long = 'Uranium tetrafluoride on thin carbon backing, batch with a very long name indeed'
  const samples = [
    { code: 'S-2026-000001', name: long, formula: 'UF4', form: 'foil' as const, radioactive: true, nuclide: 'U-238', hazardStatements: ['H300', 'H330', 'H373', 'H411', 'H225', 'H272', 'H280', 'H314'], components: [{ z: 92, massNumber: 238, fraction: 0.2, basis: 'atom' as const, enrichmentPercent: 99.8 }, { z: 9, massNumber: null, fraction: 0.8, basis: 'atom' as const, enrichmentPercent: null }] },
    { code: 'S-2026-1234567', name: 'Łódź Żółć gęślą jaźń — natural lithium metal', formula: 'Li', form: 'foil' as const, radioactive: false, nuclide: null, hazardStatements: [], components: [{ z: 3, massNumber: null, fraction: 1, basis: 'atom' as const, enrichmentPercent: null }] },
  ]
  it.each(['sheet', 'single'] as const)('in the %s layout', (layout) => {
    const labels = samples.map((s) => labelContent(s, 'https://ionfolio.larchmere-lab.example'))
    const doc = labelsDocument(labels, layout, 'Larchmere Ion Beam Laboratory') as { content: Record<string, any>[] }
    const texts = doc.content.filter((n) => n.absolutePosition && typeof n.fontSize === 'number')
    const slots = layout === 'sheet' ? labels.map((_, i) => sheetSlot(i)) : [{ x: 0, y: 0 }]
    let checked = 0
    for (const n of texts) {
      const x = n.absolutePosition.x / mm(1)
      const y = n.absolutePosition.y / mm(1)
      const slot = slots.find((s) => x >= s.x && x < s.x + LABEL.width && y >= s.y && y < s.y + LABEL.height)
      if (!slot) continue // the sheet caption above the labels
      const text = typeof n.text === 'string' ? n.text : (n.text as { text: string }[]).map((r) => r.text).join('')
      const right = x + textWidth(text, n.fontSize, n.text[0]?.font?.startsWith('Mono') ? 'Mono' : 'Inter', n.bold) / mm(1)
      expect(right, text).toBeLessThanOrEqual(slot.x + LABEL.width - 1.5)
      expect(y + (n.fontSize * 1.2) / mm(1), text).toBeLessThanOrEqual(slot.y + LABEL.height - 1.5)
      checked++
    }
    expect(checked).toBeGreaterThan(10 * (layout === 'sheet' ? 1 : 0.5))
  })
})
