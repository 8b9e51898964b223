import { parse } from 'csv-parse/sync'
import { CAN } from '#shared/auth/roles'
import { BODY_LIMITS } from '#shared/schemas/limits'
import { badTextProblem } from '#shared/schemas/common'
import { unguardCell } from '#shared/csv/safe'
import { ImportQuery, SampleBody, type SampleData } from '#shared/schemas/samples'
import { COLUMN_OF_FIELD, CSV_COLUMNS, REQUIRED_COLUMNS, csvRecordToInput } from '#shared/samples/csv'

// At most this many samples and bytes per file: a few thousand rows of stock.
const MAX_ROWS = 5_000
const MAX_BYTES = BODY_LIMITS.csvImport

interface RowError {
  line: number
  column: string
  message: string
}

/** Every problem of the file, by line (1 = the header) and column; the rows that passed. */
async function check(raw: string): Promise<{ errors: RowError[]; rows: number; good: { data: SampleData; line: number }[] }> {
  if (!raw.trim()) return { errors: [{ line: 1, column: '', message: 'The file is empty' }], rows: 0, good: [] }
  let parsed: { record: string[]; info: { lines: number } }[]
  try {
    parsed = parse(raw, { bom: true, skip_empty_lines: true, info: true, relax_column_count: true }) as unknown as typeof parsed
  } catch (e) {
    return { errors: [{ line: (e as { lines?: number }).lines ?? 1, column: '', message: 'This line cannot be read as CSV (check the quotes)' }], rows: 0, good: [] }
  }
  const header = parsed[0]!.record.map((h) => h.trim().toLowerCase())
  const body = parsed.slice(1)
  const errors: RowError[] = []
  for (const c of header) if (!(CSV_COLUMNS as readonly string[]).includes(c)) errors.push({ line: 1, column: c, message: `Unknown column; the columns are: ${CSV_COLUMNS.join(', ')}` })
  for (const c of REQUIRED_COLUMNS) if (!header.includes(c)) errors.push({ line: 1, column: c, message: 'This column is required' })
  if (!body.length) errors.push({ line: 1, column: '', message: 'The file has a header but no rows' })
  if (body.length > MAX_ROWS) errors.push({ line: 1, column: '', message: `At most ${MAX_ROWS} rows per file` })
  if (errors.length) return { errors, rows: body.length, good: [] }

  const places = await placesById(useDb())
  const placeIdByCode = new Map([...places.values()].map((p) => [p.code.toLowerCase(), p.id]))
  const good: { data: SampleData; line: number }[] = []
  for (const { record, info } of body) {
    const line = info.lines
    if (record.length !== header.length) {
      errors.push({ line, column: '', message: `This row has ${record.length} cells; the header has ${header.length}` })
      continue
    }
    const badCell = record.findIndex((c) => badTextProblem(c))
    if (badCell >= 0) {
      errors.push({ line, column: header[badCell] ?? '', message: badTextProblem(record[badCell]!)! })
      continue
    }
    // Cells the export guarded against spreadsheet formulas read back as they were (shared/csv/safe.ts).
    const { input, problems } = csvRecordToInput(Object.fromEntries(header.map((h, i) => [h, unguardCell(record[i]!)])), placeIdByCode)
    for (const p of problems) errors.push({ line, ...p })
    const result = SampleBody.safeParse(input)
    if (result.success) {
      if (!problems.length) good.push({ data: result.data, line })
      continue
    }
    for (const issue of result.error.issues) {
      const [field, index, sub] = issue.path
      const column = field === 'components' && sub === 'basis' ? 'fraction_basis' : (COLUMN_OF_FIELD[String(field)] ?? String(field ?? ''))
      if (problems.some((p) => p.column === column)) continue
      errors.push({ line, column, message: field === 'components' && typeof index === 'number' ? `Component ${index + 1}: ${issue.message}` : issue.message })
    }
  }
  return { errors, rows: body.length, good }
}

// CSV import. A dry run answers the full report and writes nothing. A real run writes nothing
// unless every row is good, and then writes them all in one transaction: a failure halfway
// leaves the stock exactly as it was.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const { dryRun } = queryValid(event, ImportQuery)
  const raw = (await readRawBody(event, 'utf8')) ?? ''
  if (Buffer.byteLength(raw) > MAX_BYTES) throw createError({ statusCode: 413, statusMessage: 'Payload Too Large', message: 'The file is larger than 5 MB; split it into smaller files' })

  const { errors, rows, good } = await check(raw)
  if (dryRun) return { dryRun: true, rows, valid: errors.length === 0, errors, created: [] }
  if (errors.length) {
    throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Some rows have problems; nothing was imported', data: { rows, errors } })
  }

  const places = await placesById(useDb())
  const created = await useDb().transaction(async (trx) => {
    const out: { id: string; code: string; name: string }[] = []
    for (const { data, line } of good) {
      const r = await insertSample(trx, event, data, user.id, { action: 'sample.imported', extra: { importLine: line }, places })
      out.push({ id: r.id, code: r.code, name: r.name })
    }
    await writeAudit(trx, event, { action: 'sample.import-finished', entityType: 'sample_import', after: { rows: out.length, codes: out.map((o) => o.code) } })
    return out
  })
  setResponseStatus(event, 201)
  return { dryRun: false, rows, valid: true, errors: [], created }
})
