import { inflateRawSync } from 'node:zlib'

/**
 * The files of a zip archive, read from its central directory (PKWARE APPNOTE 6.3, sections
 * 4.3.7, 4.3.12 and 4.3.16): enough to check what an archive holds without a zip package.
 */
export function readZip(zip: Buffer): Map<string, Buffer> {
  let end = zip.length - 22
  while (end >= 0 && zip.readUInt32LE(end) !== 0x06054b50) end--
  if (end < 0) throw new Error('not a zip archive: no end of central directory')
  const count = zip.readUInt16LE(end + 10)
  let at = zip.readUInt32LE(end + 16)
  const files = new Map<string, Buffer>()
  for (let i = 0; i < count; i++) {
    if (zip.readUInt32LE(at) !== 0x02014b50) throw new Error('broken central directory')
    const method = zip.readUInt16LE(at + 10)
    const size = zip.readUInt32LE(at + 20)
    const nameLength = zip.readUInt16LE(at + 28)
    const extraLength = zip.readUInt16LE(at + 30)
    const commentLength = zip.readUInt16LE(at + 32)
    const local = zip.readUInt32LE(at + 42)
    const name = zip.toString('utf8', at + 46, at + 46 + nameLength)
    const dataStart = local + 30 + zip.readUInt16LE(local + 26) + zip.readUInt16LE(local + 28)
    const data = zip.subarray(dataStart, dataStart + size)
    files.set(name, method === 0 ? Buffer.from(data) : inflateRawSync(data))
    at += 46 + nameLength + extraLength + commentLength
  }
  return files
}
