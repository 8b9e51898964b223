/**
 * Container labels: a single label on its own 50 × 25 mm page (small-label printers), or A4
 * sheets of 30 in a grid. Every position is fixed in millimetres and every text is fitted to its
 * box beforehand, so nothing wraps, moves or runs off a label.
 *
 * The sheet: 3 columns × 10 rows of 50 × 25 mm labels, 6 mm between columns and 2 mm between
 * rows, 24 mm side margins and 14.5 mm top and bottom margins. Printer margins are commonly
 * 3–6 mm, 12.7 mm at most on some inkjets (common practice, no source): the labels stay clear of
 * them at 100 % scale. A 50 mm bar 8.5 mm from the top lets a person check that nothing was scaled.
 */
import type { LabelContent } from '../../shared/labels/content'
import { fitLines, mm, placedText } from './layout'
import { qrPathVector } from './qr'
import { textWidth } from './fonts'
import { trefoilVectors } from './trefoil'
import { ghsDiamondVectors } from './ghs-diamonds'

/** Label geometry, mm. */
export const LABEL = { width: 50, height: 25, padding: 2, qr: 21, textX: 23.5 } as const
export const SHEET = { width: 210, height: 297, columns: 3, rows: 10, pitchX: 56, pitchY: 27, left: 24, top: 14.5 } as const
export const PER_SHEET = SHEET.columns * SHEET.rows

export type LabelLayout = 'single' | 'sheet'

const TEXT_WIDTH = mm(LABEL.width - LABEL.padding - LABEL.textX)
const RED = '#b3121b'

const NAME_LINE = 2.6
const COMPOSITION_LINE = 2.4
const PLACE_LINE = 2.2
const DIAMOND_GAP = 0.3
// Diamond sizes tried, largest first (mm): the largest that lets every pictogram show wins.
const DIAMOND_SIZES = [5.5, 4.8, 4.2, 3.6, 3.2, 2.8]

/** The diamond size (mm) and rows for `count` pictograms within `height` mm of the text column. */
function diamondGrid(count: number, height: number) {
  const width = LABEL.width - LABEL.padding - LABEL.textX
  for (const d of DIAMOND_SIZES) {
    const perRow = Math.max(1, Math.floor((width + DIAMOND_GAP) / (d + DIAMOND_GAP)))
    const rows = Math.ceil(count / perRow)
    if (rows * (d + DIAMOND_GAP) <= height || d === DIAMOND_SIZES.at(-1)) return { d, perRow, rows: count ? rows : 0 }
  }
  throw new Error('unreachable')
}

/** The top-left corner (mm) of the i-th label on its sheet. */
export function sheetSlot(i: number): { x: number; y: number } {
  const k = i % PER_SHEET
  return { x: SHEET.left + (k % SHEET.columns) * SHEET.pitchX, y: SHEET.top + Math.floor(k / SHEET.columns) * SHEET.pitchY }
}

/** The nodes and page-coordinate vectors of one label with its top-left corner at (x, y) mm. */
interface Drawn {
  nodes: Record<string, unknown>[]
  vectors: Record<string, unknown>[]
}

function drawLabel(label: LabelContent, xMm: number, yMm: number, guide: boolean): Drawn {
  const x = mm(xMm)
  const y = mm(yMm)
  const tx = x + mm(LABEL.textX)
  const nodes: Record<string, unknown>[] = []
  const vectors: Record<string, unknown>[] = []
  if (guide) vectors.push({ type: 'rect', x, y, w: mm(LABEL.width), h: mm(LABEL.height), r: mm(1.5), lineWidth: 0.3, lineColor: '#9aa5a8', dash: { length: 2, space: 2 } })
  vectors.push(qrPathVector(label.url, x + mm(LABEL.padding), y + mm(LABEL.padding), mm(LABEL.qr)))

  const code = fitLines(label.code, TEXT_WIDTH, 7.5, 1, 'Mono', true)[0]!
  nodes.push(placedText(code, tx, y + mm(2.4), { size: 7.5, bold: true, family: 'Mono' }))

  // Every pictogram, every component and the place must show: the pictograms get the space
  // they need first (smaller diamonds when they need more), then the composition (one line, or
  // two in smaller type), the place; the name gets what is left, one line at least.
  const bottomLimit = label.radiation || label.otherCautions.length ? LABEL.height - LABEL.padding - 4.9 : LABEL.height - LABEL.padding
  let compSize = 5.8
  let composition = label.composition ? fitLines(label.composition, TEXT_WIDTH, compSize, 1) : []
  if (label.composition && textWidth(label.composition, compSize) > TEXT_WIDTH) {
    compSize = 5.2
    composition = fitLines(label.composition, TEXT_WIDTH, compSize, 2)
  }
  const place = label.place ? fitLines(label.place, TEXT_WIDTH, 5.2, 1) : []
  const fixed = composition.length * COMPOSITION_LINE + place.length * PLACE_LINE
  const minName = NAME_LINE
  const grid = diamondGrid(label.pictograms.length, bottomLimit - 5.9 - fixed - minName)
  const diamondsHeight = grid.rows * (grid.d + DIAMOND_GAP)
  const nameLines = Math.max(1, Math.min(2, Math.floor((bottomLimit - 5.9 - fixed - diamondsHeight) / NAME_LINE)))
  let lineY = 5.9
  for (const line of fitLines(label.name, TEXT_WIDTH, 6.5, nameLines, 'Inter', true)) {
    nodes.push(placedText(line, tx, y + mm(lineY), { size: 6.5, bold: true }))
    lineY += NAME_LINE
  }
  for (const line of composition) {
    nodes.push(placedText(line, tx, y + mm(lineY + 0.1), { size: compSize }))
    lineY += COMPOSITION_LINE
  }
  for (const line of place) {
    nodes.push(placedText(line, tx, y + mm(lineY + 0.1), { size: 5.2, color: '#333333' }))
    lineY += PLACE_LINE
  }
  label.pictograms.forEach((code, i) => {
    const col = i % grid.perRow
    const row = Math.floor(i / grid.perRow)
    vectors.push(...ghsDiamondVectors(code, tx + mm(col * (grid.d + DIAMOND_GAP)), y + mm(lineY + 0.2 + row * (grid.d + DIAMOND_GAP)), mm(grid.d)))
  })

  const bottom = y + mm(LABEL.height - LABEL.padding)
  // The bottom 4.8 mm: the trefoil with RADIOACTIVE and the nuclide, or a caution in words.
  if (label.radiation) {
    const icon = mm(4.4)
    vectors.push(...trefoilVectors(tx, bottom - mm(4.6), icon))
    nodes.push(placedText('RADIOACTIVE', tx + icon + mm(1), bottom - mm(4.8), { size: 6, bold: true }))
    if (label.radiation.nuclide) nodes.push(placedText(label.radiation.nuclide, tx + icon + mm(1), bottom - mm(2.5), { size: 6 }))
  } else if (label.otherCautions.length) {
    const lines = fitLines(`Caution: ${label.otherCautions.join(', ').toLowerCase()}`, TEXT_WIDTH, 5.6, 2, 'Inter', true)
    lines.forEach((line, i) => nodes.push(placedText(line, tx, bottom - mm(2.4 * (lines.length - i)), { size: 5.6, bold: true, color: RED })))
  }
  return { nodes, vectors }
}

function sheetCaption(page: number, pages: number, labName: string): Drawn {
  const x = mm(SHEET.left)
  const y = mm(8.5)
  return {
    nodes: [placedText(`${labName} · Ionfolio labels · sheet ${page} of ${pages} · print at 100 % (actual size): the bar is 50 mm long`, x + mm(53), y - mm(0.4), { size: 6, color: '#444444' })],
    vectors: [
      { type: 'line', x1: x, y1: y + mm(1), x2: x + mm(50), y2: y + mm(1), lineWidth: 0.8, lineColor: '#000000' },
      { type: 'line', x1: x, y1: y, x2: x, y2: y + mm(2), lineWidth: 0.5, lineColor: '#000000' },
      { type: 'line', x1: x + mm(50), y1: y, x2: x + mm(50), y2: y + mm(2), lineWidth: 0.5, lineColor: '#000000' },
    ],
  }
}

/** The pdfmake document for `labels` in the chosen layout. */
export function labelsDocument(labels: LabelContent[], layout: LabelLayout, labName: string): Record<string, unknown> {
  const perPage = layout === 'single' ? 1 : PER_SHEET
  const pages = Math.max(1, Math.ceil(labels.length / perPage))
  const content: Record<string, unknown>[] = []
  for (let p = 0; p < pages; p++) {
    const parts: Drawn[] = layout === 'sheet' ? [sheetCaption(p + 1, pages, labName)] : []
    labels.slice(p * perPage, (p + 1) * perPage).forEach((label, i) => {
      const at = layout === 'single' ? { x: 0, y: 0 } : sheetSlot(i)
      parts.push(drawLabel(label, at.x, at.y, layout === 'sheet'))
    })
    // One flowing node per page carries the page break; everything else is placed absolutely,
    // the vectors in one canvas at the page origin (page coordinates throughout).
    content.push({ text: '', ...(p > 0 ? { pageBreak: 'before' } : {}) })
    content.push({ canvas: parts.flatMap((x) => x.vectors), absolutePosition: { x: 0, y: 0 } })
    content.push(...parts.flatMap((x) => x.nodes))
  }
  return {
    pageSize: layout === 'single' ? { width: mm(LABEL.width), height: mm(LABEL.height) } : 'A4',
    pageMargins: 0,
    info: { title: `Ionfolio labels (${labels.length})`, creator: 'Ionfolio', producer: 'Ionfolio' },
    defaultStyle: { font: 'Inter', fontSize: 7 },
    content,
  }
}
