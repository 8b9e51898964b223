// Reads the two things the layout code needs from a TrueType/OpenType file: which characters it
// has (the 'cmap' table, formats 4 and 12) and how wide each is (the 'head', 'hhea' and 'hmtx'
// tables). Table layouts as in the OpenType specification (Microsoft Typography, version 1.9).

export interface FontMetrics {
  /** advance width of each covered code point, in em */
  advance: Map<number, number>
}

function tableOffsets(font: Buffer): Map<string, { offset: number; length: number }> {
  const tables = new Map<string, { offset: number; length: number }>()
  const count = font.readUInt16BE(4)
  for (let i = 0; i < count; i++) {
    const at = 12 + i * 16
    tables.set(font.toString('latin1', at, at + 4), { offset: font.readUInt32BE(at + 8), length: font.readUInt32BE(at + 12) })
  }
  return tables
}

function readCmap(font: Buffer, start: number): Map<number, number> {
  const glyphOf = new Map<number, number>()
  const count = font.readUInt16BE(start + 2)
  let best: { offset: number; format: number } | null = null
  for (let i = 0; i < count; i++) {
    const at = start + 4 + i * 8
    const platform = font.readUInt16BE(at)
    const encoding = font.readUInt16BE(at + 2)
    const offset = start + font.readUInt32BE(at + 4)
    const format = font.readUInt16BE(offset)
    // Unicode subtables only: platform 0, or Windows (3) with encoding 1 (BMP) or 10 (full).
    const unicode = platform === 0 || (platform === 3 && (encoding === 1 || encoding === 10))
    if (unicode && (format === 12 || (format === 4 && best?.format !== 12))) best = { offset, format }
  }
  if (!best) return glyphOf
  const o = best.offset
  if (best.format === 4) {
    const segments = font.readUInt16BE(o + 6) / 2
    const ends = o + 14
    const starts = ends + segments * 2 + 2
    const deltas = starts + segments * 2
    const rangeOffsets = deltas + segments * 2
    for (let s = 0; s < segments; s++) {
      const end = font.readUInt16BE(ends + s * 2)
      const first = font.readUInt16BE(starts + s * 2)
      const delta = font.readInt16BE(deltas + s * 2)
      const rangeOffset = font.readUInt16BE(rangeOffsets + s * 2)
      for (let c = first; c <= end && c !== 0xffff; c++) {
        let glyph: number
        if (rangeOffset === 0) glyph = (c + delta) & 0xffff
        else {
          const g = font.readUInt16BE(rangeOffsets + s * 2 + rangeOffset + (c - first) * 2)
          glyph = g === 0 ? 0 : (g + delta) & 0xffff
        }
        if (glyph) glyphOf.set(c, glyph)
      }
    }
  } else {
    const groups = font.readUInt32BE(o + 12)
    for (let g = 0; g < groups; g++) {
      const at = o + 16 + g * 12
      const first = font.readUInt32BE(at)
      const last = font.readUInt32BE(at + 4)
      const glyph = font.readUInt32BE(at + 8)
      for (let c = first; c <= last; c++) if (glyph + c - first) glyphOf.set(c, glyph + c - first)
    }
  }
  return glyphOf
}

/** The covered characters and their widths, from an sfnt font file. */
export function fontMetrics(font: Buffer): FontMetrics {
  const tables = tableOffsets(font)
  const head = tables.get('head')
  const hhea = tables.get('hhea')
  const hmtx = tables.get('hmtx')
  const cmap = tables.get('cmap')
  if (!head || !hhea || !hmtx || !cmap) throw new Error('font lacks a head, hhea, hmtx or cmap table')
  const unitsPerEm = font.readUInt16BE(head.offset + 18)
  const metrics = font.readUInt16BE(hhea.offset + 34)
  const widthOf = (glyph: number) => font.readUInt16BE(hmtx.offset + Math.min(glyph, metrics - 1) * 4) / unitsPerEm
  const advance = new Map<number, number>()
  for (const [c, glyph] of readCmap(font, cmap.offset)) advance.set(c, widthOf(glyph))
  return { advance }
}
