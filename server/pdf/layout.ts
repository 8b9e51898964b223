// Units and text fitting shared by the label and certificate layouts.
import { runs, textWidth, type Family } from './fonts'

/** Points per millimetre (pdfmake and PDF measure in points, 72 to the inch; 25.4 mm to the inch). */
export const MM = 72 / 25.4

/** Millimetres to points. */
export const mm = (v: number) => v * MM

/**
 * Breaks `text` into at most `maxLines` lines no wider than `width` points at `size` (in the
 * weight it is printed in), by words
 * (a word wider than a line is broken by characters); what does not fit ends in an ellipsis.
 */
export function fitLines(text: string, width: number, size: number, maxLines: number, family: Family = 'Inter', bold = false): string[] {
  const fits = (s: string) => textWidth(s, size, family, bold) <= width
  const lines: string[] = []
  let current = ''
  for (const word of text.trim().split(/\s+/).filter(Boolean)) {
    const candidate = current ? `${current} ${word}` : word
    if (fits(candidate)) {
      current = candidate
      continue
    }
    if (current) lines.push(current)
    // a word wider than a line is broken by characters
    let rest = [...word]
    while (rest.length > 1 && !fits(rest.join(''))) {
      let n = 1
      while (n < rest.length - 1 && fits(rest.slice(0, n + 1).join(''))) n++
      lines.push(rest.slice(0, n).join(''))
      rest = rest.slice(n)
    }
    current = rest.join('')
  }
  if (current) lines.push(current)
  if (lines.length <= maxLines) return lines
  const kept = lines.slice(0, maxLines)
  let last = kept[maxLines - 1]!
  while (last && !fits(`${last}…`)) last = [...last].slice(0, -1).join('').trimEnd()
  kept[maxLines - 1] = `${last}…`
  return kept
}

/** One line of text placed at (x, y) on the page, never wrapped. */
export function placedText(text: string, x: number, y: number, style: { size: number; bold?: boolean; family?: Family; color?: string }) {
  return {
    text: runs(text, style.family ?? 'Inter'),
    absolutePosition: { x, y },
    fontSize: style.size,
    bold: style.bold ?? false,
    color: style.color ?? '#000000',
    noWrap: true,
    lineHeight: 1,
  }
}
