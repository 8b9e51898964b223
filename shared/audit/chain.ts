/**
 * The audit CSV's running hash chain, so a reader can tell whether an exported file is complete
 * and unaltered without asking the server:
 *
 * - Columns: AUDIT_CSV_COLUMNS. `prev_hash` of the first row is 64 zeros (GENESIS).
 * - A row's content is its cells from `seq` to `address`, exactly as written in the file.
 * - row_hash = lowercase hex SHA-256 of the UTF-8 bytes of  prev_hash + "\n" + JSON.stringify(content)
 *   (JSON.stringify of the array of cell strings: no spaces, JavaScript's string escaping).
 * - Each row's prev_hash is the row_hash of the row before it.
 * - The file ends with one closing row: seq "end", id = the number of rows above it, every other
 *   content cell empty, chained and hashed like the others. A file cut short has no closing row.
 *
 * Rows are written with RFC 4180 quoting and CRLF line ends; cells are guarded against formulas
 * (shared/csv/safe.ts) before hashing, so the hash covers what the file holds.
 */
import { guardCell } from '../csv/safe'

export const AUDIT_CSV_COLUMNS = ['seq', 'id', 'at', 'actor', 'action', 'record_type', 'record_id', 'record', 'changes', 'address', 'prev_hash', 'row_hash'] as const
export const GENESIS = '0'.repeat(64)
const CONTENT_CELLS = 10

const hex = (buf: ArrayBuffer) => [...new Uint8Array(buf)].map((b) => b.toString(16).padStart(2, '0')).join('')

/** SHA-256 of a text's UTF-8 bytes, as lowercase hex (Web Crypto: the same in Node and the browser). */
export async function sha256Hex(text: string): Promise<string> {
  return hex(await globalThis.crypto.subtle.digest('SHA-256', new TextEncoder().encode(text)))
}

/** The hash of one row from the previous row's hash and its content cells. */
export function rowHash(prevHash: string, content: readonly string[]): Promise<string> {
  return sha256Hex(`${prevHash}\n${JSON.stringify(content)}`)
}

/** One CSV line (RFC 4180 quoting, CRLF). */
export function csvLine(cells: readonly string[]): string {
  return `${cells.map((c) => (/[",\r\n]/.test(c) ? `"${c.replace(/"/g, '""')}"` : c)).join(',')}\r\n`
}

/** Builds the chained file one row at a time: `add` per row in order, then `end`. */
export class AuditChainWriter {
  private prev = GENESIS
  private seq = 0

  header(): string {
    return csvLine(AUDIT_CSV_COLUMNS)
  }

  /** The line for one row; `cells` are the content cells after `seq` (id … address), unguarded. */
  async add(cells: readonly string[]): Promise<string> {
    this.seq += 1
    const content = [String(this.seq), ...cells.map(guardCell)]
    if (content.length !== CONTENT_CELLS) throw new Error('an audit CSV row has ten content cells')
    return this.line(content)
  }

  /** The closing row. */
  async end(): Promise<string> {
    return this.line(['end', String(this.seq), '', '', '', '', '', '', '', ''])
  }

  /** The hash of the last row written (the closing row's, after `end`). */
  get lastHash(): string {
    return this.prev
  }

  private async line(content: string[]): Promise<string> {
    const hash = await rowHash(this.prev, content)
    const out = csvLine([...content, this.prev, hash])
    this.prev = hash
    return out
  }
}

/** A CSV record and the physical line of the file it starts on (1-based). */
export interface CsvRecord {
  cells: string[]
  line: number
}

/** Reads RFC 4180 CSV (quoted cells may hold commas, quotes and line breaks). */
export function csvRecords(text: string): CsvRecord[] {
  const out: CsvRecord[] = []
  let cells: string[] = []
  let cell = ''
  let quoted = false
  let line = 1
  let start = 1
  let i = 0
  let any = false
  const endRecord = () => {
    cells.push(cell)
    out.push({ cells, line: start })
    cells = []
    cell = ''
    any = false
  }
  while (i < text.length) {
    const ch = text[i]!
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') { cell += '"'; i += 2; continue }
      if (ch === '"') { quoted = false; i += 1; continue }
      if (ch === '\n') line += 1
      cell += ch
      i += 1
      continue
    }
    if (ch === '"') { quoted = true; any = true; i += 1; continue }
    if (ch === ',') { cells.push(cell); cell = ''; any = true; i += 1; continue }
    if (ch === '\r' && text[i + 1] === '\n') i += 1
    if (ch === '\n' || ch === '\r') {
      endRecord()
      line += 1
      start = line
      i += 1
      continue
    }
    cell += ch
    any = true
    i += 1
  }
  if (any || cell || cells.length) endRecord()
  return out
}

export type ChainVerdict =
  | { ok: true; rows: number; lastHash: string }
  | { ok: false; line: number; problem: string; rowsChecked: number }

/**
 * Checks an exported audit CSV: the header, every row's link to the one before and its hash, and
 * the closing row. Says which line of the file breaks first, and how.
 */
export async function verifyAuditCsv(text: string): Promise<ChainVerdict> {
  const records = csvRecords(text.replace(/^\uFEFF/, ''))
  const head = records[0]
  if (!head || head.cells.join(',') !== AUDIT_CSV_COLUMNS.join(',')) return { ok: false, line: 1, problem: 'The first line is not the audit export header', rowsChecked: 0 }
  let prev = GENESIS
  let rows = 0
  for (const r of records.slice(1)) {
    if (r.cells.length !== AUDIT_CSV_COLUMNS.length) return { ok: false, line: r.line, problem: `This row has ${r.cells.length} cells, not ${AUDIT_CSV_COLUMNS.length}`, rowsChecked: rows }
    const content = r.cells.slice(0, CONTENT_CELLS)
    const [given, hash] = r.cells.slice(CONTENT_CELLS) as [string, string]
    if (given !== prev) return { ok: false, line: r.line, problem: 'This row does not follow the row before it (a row was removed, added or moved)', rowsChecked: rows }
    if ((await rowHash(prev, content)) !== hash) return { ok: false, line: r.line, problem: 'This row was changed after export (its hash does not match its content)', rowsChecked: rows }
    prev = hash
    if (content[0] === 'end') {
      if (content[1] !== String(rows)) return { ok: false, line: r.line, problem: `The closing row counts ${content[1]} rows but the file holds ${rows}`, rowsChecked: rows }
      const after = records.slice(records.indexOf(r) + 1).filter((x) => x.cells.some((c) => c !== ''))
      if (after.length) return { ok: false, line: after[0]!.line, problem: 'There is text after the closing row', rowsChecked: rows }
      return { ok: true, rows, lastHash: hash }
    }
    rows += 1
    if (content[0] !== String(rows)) return { ok: false, line: r.line, problem: `This row is numbered ${content[0]}, expected ${rows}`, rowsChecked: rows - 1 }
  }
  return { ok: false, line: (records.at(-1)?.line ?? 1) + 1, problem: 'The file ends before its closing row: it was cut short', rowsChecked: rows }
}
