// The building blocks of a certificate's pages: headings, paragraphs and compact tables.
import { runs } from './fonts'

export const INK = '#2d4e54'
export const MUTED = '#5b6669'

/** A section heading. */
export function heading(text: string) {
  return { text, style: 'heading', headlineLevel: 1 }
}

/** A paragraph of body text. */
export function para(text: string, extra: Record<string, unknown> = {}) {
  return { text: runs(text), margin: [0, 0, 0, 3], ...extra }
}

/** A compact table: header row shaded, thin rules, every cell through runs(). */
export function table(header: string[], rows: (string | Record<string, unknown>)[][], widths: (number | string)[]) {
  const cell = (c: string | Record<string, unknown>) => (typeof c === 'string' ? { text: runs(c) } : c)
  return {
    table: { headerRows: 1, widths, dontBreakRows: true, body: [header.map((h) => ({ text: runs(h), style: 'th' })), ...rows.map((r) => r.map(cell))] },
    layout: {
      hLineWidth: (i: number) => (i === 1 ? 0.6 : 0.3),
      vLineWidth: () => 0,
      hLineColor: () => '#b9c4c6',
      fillColor: (row: number) => (row === 0 ? '#eef3f3' : null),
      paddingTop: () => 1.3,
      paddingBottom: () => 1.3,
      paddingLeft: () => 3,
      paddingRight: () => 3,
    },
    fontSize: 8,
    margin: [0, 1, 0, 5],
  }
}

/** Two sections side by side, each a heading with what follows it; kept together on a page. */
export function sideBySide(left: Record<string, unknown>[], right: Record<string, unknown>[]) {
  return { columns: [{ width: '*', stack: left }, { width: '*', stack: right }], columnGap: 17, unbreakable: true }
}
