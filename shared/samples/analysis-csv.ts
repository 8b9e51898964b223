/**
 * Reads a supplier's isotopic analysis from its CSV datasheet (as the demo's suppliers send them:
 * one row per isotope, a column for the isotope, one for its atom %, one for its uncertainty in
 * %). Column names are matched loosely, since every supplier spells them its own way.
 */
import { parseNuclide } from './nuclide'

export interface ParsedAnalysis {
  rows: { massNumber: number; percent: number; uncertainty: number | null }[]
  problems: string[]
}

const ISOTOPE = ['isotope', 'nuclide', 'mass_number', 'a']
const PERCENT = ['atom_percent', 'atom_pct', 'abundance_percent', 'enrichment_percent', 'percent', 'at_percent']
const UNCERTAINTY = ['uncertainty_percent', 'uncertainty', 'unc_percent', 'unc', 'u']

const key = (h: string) => h.trim().toLowerCase().replace(/%/g, ' percent').replace(/[\s.-]+/g, '_').replace(/^_+|_+$/g, '')

function splitLine(line: string): string[] {
  // Plain CSV: quoted cells may hold commas; "" is a quote.
  const out: string[] = []
  let cell = ''
  let quoted = false
  for (let i = 0; i < line.length; i++) {
    const ch = line[i]!
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') (cell += '"'), i++
      else if (ch === '"') quoted = false
      else cell += ch
    } else if (ch === '"') quoted = true
    else if (ch === ',' || ch === ';' || ch === '\t') (out.push(cell), (cell = ''))
    else cell += ch
  }
  out.push(cell)
  return out.map((c) => c.trim())
}

/** The analysis in `text` for element `z`; problems name the line and what was expected. */
export function parseAnalysisCsv(text: string, z: number): ParsedAnalysis {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/).filter((l) => l.trim())
  const problems: string[] = []
  if (lines.length < 2) return { rows: [], problems: ['The file needs a header line and one line per isotope'] }
  const header = splitLine(lines[0]!).map(key)
  const find = (names: string[]) => header.findIndex((h) => names.includes(h))
  const [ci, cp, cu] = [find(ISOTOPE), find(PERCENT), find(UNCERTAINTY)]
  if (ci < 0 || cp < 0) return { rows: [], problems: ['The header must name an isotope column (isotope) and an atom % column (atom_percent)'] }
  const rows: ParsedAnalysis['rows'] = []
  lines.slice(1).forEach((line, k) => {
    const cells = splitLine(line)
    const iso = cells[ci] ?? ''
    const massNumber = /^\d{1,3}$/.test(iso) ? Number(iso) : (() => {
      const n = parseNuclide(iso)
      return n && n.z === z ? n.massNumber : null
    })()
    const percent = Number((cells[cp] ?? '').replace(',', '.'))
    const uText = cu >= 0 ? (cells[cu] ?? '').replace(',', '.') : ''
    const uncertainty = uText === '' ? null : Number(uText)
    if (massNumber === null) problems.push(`Line ${k + 2}: "${iso.slice(0, 20)}" is not an isotope of this element`)
    else if (!Number.isFinite(percent) || (cells[cp] ?? '') === '') problems.push(`Line ${k + 2}: the atom % is not a number`)
    else if (uncertainty !== null && !Number.isFinite(uncertainty)) problems.push(`Line ${k + 2}: the uncertainty is not a number`)
    else rows.push({ massNumber, percent, uncertainty })
  })
  return { rows, problems }
}
