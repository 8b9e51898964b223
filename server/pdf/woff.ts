import { inflateSync } from 'node:zlib'

// WOFF 1.0 (W3C Recommendation, 13 December 2012, §3–§5): a 44-byte header, a directory of
// 20-byte entries (tag, offset, compLength, origLength, origChecksum), and the sfnt tables, each
// zlib-compressed when compLength < origLength. An sfnt (TrueType/OpenType) file is a 12-byte
// offset table, 16-byte table records (tag, checksum, offset, length) sorted by tag, and the
// tables on 4-byte boundaries (OpenType spec, "Organization of an OpenType font").
const WOFF_SIGNATURE = 0x774f4646 // 'wOFF'

/**
 * Unpacks a WOFF 1.0 font into the TrueType/OpenType file it wraps, leaving out the tables
 * named in `omit`. Done once per font at start-up: fontkit can read WOFF itself, but then
 * inflates every table again for every document.
 */
export function woffToSfnt(woff: Buffer, opts: { omit?: readonly string[] } = {}): Buffer {
  if (woff.readUInt32BE(0) !== WOFF_SIGNATURE) throw new Error('not a WOFF 1.0 font')
  const flavor = woff.readUInt32BE(4)
  const tables: { tag: number; checksum: number; data: Buffer }[] = []
  for (let i = 0; i < woff.readUInt16BE(12); i++) {
    const at = 44 + i * 20
    if (opts.omit?.includes(woff.toString('latin1', at, at + 4))) continue
    const tag = woff.readUInt32BE(at)
    const offset = woff.readUInt32BE(at + 4)
    const compLength = woff.readUInt32BE(at + 8)
    const origLength = woff.readUInt32BE(at + 12)
    const checksum = woff.readUInt32BE(at + 16)
    const stored = woff.subarray(offset, offset + compLength)
    const data = compLength < origLength ? inflateSync(stored) : Buffer.from(stored)
    if (data.length !== origLength) throw new Error('WOFF table has the wrong length after inflating')
    tables.push({ tag, checksum, data })
  }
  tables.sort((a, b) => a.tag - b.tag)
  const numTables = tables.length

  const entrySelector = Math.floor(Math.log2(numTables))
  const searchRange = 2 ** entrySelector * 16
  const headerLength = 12 + numTables * 16
  const total = tables.reduce((sum, t) => sum + ((t.data.length + 3) & ~3), headerLength)
  const out = Buffer.alloc(total)
  out.writeUInt32BE(flavor, 0)
  out.writeUInt16BE(numTables, 4)
  out.writeUInt16BE(searchRange, 6)
  out.writeUInt16BE(entrySelector, 8)
  out.writeUInt16BE(numTables * 16 - searchRange, 10)
  let offset = headerLength
  tables.forEach((t, i) => {
    const record = 12 + i * 16
    out.writeUInt32BE(t.tag, record)
    out.writeUInt32BE(t.checksum, record + 4)
    out.writeUInt32BE(offset, record + 8)
    out.writeUInt32BE(t.data.length, record + 12)
    t.data.copy(out, offset)
    offset += (t.data.length + 3) & ~3
  })
  return out
}
