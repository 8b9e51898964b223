import { describe, it, expect } from 'vitest'
import { createHash } from 'node:crypto'
import { AuditChainWriter, GENESIS, csvRecords, rowHash, sha256Hex, verifyAuditCsv } from '../../../shared/audit/chain'

async function exportOf(rows: string[][]): Promise<string> {
  const w = new AuditChainWriter()
  let out = w.header()
  for (const r of rows) out += await w.add(r)
  return out + (await w.end())
}

const ROWS = [
  ['1', '2026-12-01T09:00:00.000Z', 'Ada Quist <ada@x.example>', 'sample.created', 'sample', 'u1', 'sample S-2026-000001 Nickel foil', 'name: — → Nickel foil\nmass (mg): — → 12.5', '198.51.100.7'],
  ['2', '2026-12-01T09:05:00.000Z', 'Bo Rand <bo@x.example>', 'sample.updated', 'sample', 'u1', 'sample S-2026-000001 "Nickel, rolled"', '=HYPERLINK("x")', ''],
  ['3', '2026-12-01T09:06:00.000Z', '', 'notices.run', 'notices', '', '', '', ''],
]

describe('the audit CSV hash chain', () => {
  it('hashes with SHA-256 over prev_hash, a line feed and the JSON of the content cells (node:crypto agrees)', async () => {
    expect(await sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad') // FIPS 180-2 appendix B.1 example
    const content = ['1', 'a', 'b']
    expect(await rowHash(GENESIS, content)).toBe(createHash('sha256').update(`${GENESIS}\n["1","a","b"]`).digest('hex'))
  })

  it('verifies an untouched export and counts its rows', async () => {
    const file = await exportOf(ROWS)
    const v = await verifyAuditCsv(file)
    expect(v).toMatchObject({ ok: true, rows: 3 })
    expect(csvRecords(file)[1]!.cells[8]).toBe('name: — → Nickel foil\nmass (mg): — → 12.5')
    // the formula cell is guarded in the file, and the hash covers what the file holds
    expect(file).toContain(`"'=HYPERLINK(""x"")"`)
  })

  it('names the first broken line when a cell is changed', async () => {
    const file = (await exportOf(ROWS)).replace('Bo Rand', 'Bo Rund')
    const v = await verifyAuditCsv(file)
    // header on line 1, row 1 spans lines 2–3 (a line break inside its changes cell), row 2 is on line 4
    expect(v).toMatchObject({ ok: false, line: 4 })
    expect((v as { problem: string }).problem).toMatch(/changed/)
  })

  it('finds a removed row, a cut-off end and a dropped first row', async () => {
    const file = await exportOf(ROWS)
    const lines = file.split('\r\n')
    // lines: header, row 1 (its cell holds a bare line feed), row 2, row 3, closing row
    const withoutRow2 = [...lines.slice(0, 2), ...lines.slice(3)].join('\r\n')
    expect(await verifyAuditCsv(withoutRow2)).toMatchObject({ ok: false, line: 4 })
    const cut = lines.slice(0, 4).join('\r\n') + '\r\n'
    expect(await verifyAuditCsv(cut)).toMatchObject({ ok: false, problem: expect.stringMatching(/cut short/) })
    const noFirst = [lines[0], ...lines.slice(2)].join('\r\n')
    expect(await verifyAuditCsv(noFirst)).toMatchObject({ ok: false, line: 2 })
    expect(await verifyAuditCsv('hello\r\n')).toMatchObject({ ok: false, line: 1 })
  })

  it('accepts an empty export (header and closing row only)', async () => {
    expect(await verifyAuditCsv(await exportOf([]))).toMatchObject({ ok: true, rows: 0 })
  })
})
