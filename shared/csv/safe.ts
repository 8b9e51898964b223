/**
 * Cells a spreadsheet would run as a formula (CSV injection): a cell that starts with "=", "+",
 * "-", "@", a tab or a carriage return is written with a leading apostrophe, which spreadsheets
 * read as "this is text" and do not show. Plain numbers ("-3.5", "+1", "1e-3") and a lone "-" are
 * left alone, since a spreadsheet reads them as values, not formulas. A cell that already starts
 * with apostrophes before such a character gets one more, so reading back (`unguardCell`)
 * removes exactly the one that writing added: every cell survives export → import unchanged.
 */

const TRIGGERS = new Set(['=', '+', '-', '@', '\t', '\r'])
const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/

function runsAsFormula(cell: string): boolean {
  if (!cell.length || !TRIGGERS.has(cell[0]!)) return false
  return !(PLAIN_NUMBER.test(cell) || cell === '-' || cell === '+')
}

// True when the cell, without its leading apostrophes, would run as a formula.
function needsGuard(cell: string): boolean {
  return runsAsFormula(cell.replace(/^'+/, ''))
}

/** The cell as written to a CSV file: with one leading apostrophe when it would run as a formula. */
export function guardCell(cell: string): string {
  return needsGuard(cell) ? `'${cell}` : cell
}

/** The cell as read from a CSV file: the apostrophe `guardCell` added, removed. */
export function unguardCell(cell: string): string {
  return cell.startsWith("'") && needsGuard(cell.slice(1)) ? cell.slice(1) : cell
}

/** Any value as a guarded CSV cell (null and undefined as empty). */
export function safeCell(v: unknown): string {
  if (v === null || v === undefined) return ''
  return guardCell(typeof v === 'string' ? v : String(v))
}

/** csv-stringify options that guard every text cell (numbers are written as they are). */
export const GUARDED_CSV = { cast: { string: (v: string) => guardCell(v) } } as const
