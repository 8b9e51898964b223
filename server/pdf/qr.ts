import QRCode from 'qrcode'

// QR codes drawn as filled rectangles, one per run of dark modules in a row, so a code is one
// path however many modules it has. The quiet zone of four modules around the symbol
// (ISO/IEC 18004:2015, 9.1 — from memory) is left white inside the given size. Error correction
// level M: about 15 % of the symbol may be lost and it still reads (ISO/IEC 18004 — from memory).
const QUIET_MODULES = 4

function runs(text: string): { n: number; rects: [number, number, number][] } {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' })
  const n = modules.size
  const rects: [number, number, number][] = []
  for (let y = 0; y < n; y++) {
    let x = 0
    while (x < n) {
      if (!modules.get(y, x)) {
        x++
        continue
      }
      const start = x
      while (x < n && modules.get(y, x)) x++
      rects.push([start, y, x - start])
    }
  }
  return { n, rects }
}

/**
 * A pdfmake canvas `path` vector for a code whose top-left corner is at (x, y) on the page.
 * pdfmake does not offset path vectors, so they take page coordinates: several times faster to
 * lay out than an SVG node, which matters on a sheet of labels.
 */
export function qrPathVector(text: string, x: number, y: number, size: number) {
  const { n, rects } = runs(text)
  const m = size / (n + 2 * QUIET_MODULES)
  const f = (v: number) => Math.round(v * 100) / 100
  const d = rects.map(([cx, cy, w]) => `M${f(x + (cx + QUIET_MODULES) * m)} ${f(y + (cy + QUIET_MODULES) * m)}h${f(w * m)}v${f(m)}h${f(-w * m)}z`).join('')
  return { type: 'path', d, color: '#000000' }
}
