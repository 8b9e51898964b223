/**
 * The nine GHS hazard pictograms as pdfmake canvas vectors: a square set on a point with a red
 * border on a white ground and a black symbol, as UN GHS Rev. 10 (2023), Annex 3, Section 4
 * (label elements, pictograms) prescribes — the frame from that rule, the symbols our own
 * simplified drawings of the published ones (flame, flame over circle, exploding bomb, gas
 * cylinder, corrosion, skull and crossbones, exclamation mark, health hazard, environment), made
 * to be recognised at a few millimetres, not traced. The colours: red #e30613 on white, common
 * practice (GHS asks for "red", no source for a value).
 *
 * Everything is drawn in a unit square (0,0 top-left to 1,1) and scaled onto the page; canvas
 * vectors take page coordinates (see labels.ts).
 */
import type { Pictogram } from '../../shared/labels/pictograms'

export const GHS_RED = '#e30613'
const BLACK = '#000000'
const WHITE = '#ffffff'

type P = [number, number]
type Shape =
  | { poly: P[]; fill?: string }
  | { circle: P; r: number; fill?: string; ry?: number }
  | { line: [P, P]; width: number; color?: string }
  | { ring: P; r: number; width: number }

// A flame: a tongue with two side licks, on its own or above something.
function flame(dx = 0, dy = 0, s = 1): P[] {
  const pts: P[] = [
    [0.5, 0.26], [0.56, 0.36], [0.6, 0.33], [0.64, 0.46], [0.63, 0.56], [0.58, 0.62], [0.42, 0.62], [0.37, 0.56], [0.36, 0.47], [0.41, 0.39], [0.44, 0.45], [0.47, 0.34],
  ]
  return pts.map(([x, y]) => [0.5 + (x - 0.5) * s + dx, 0.44 + (y - 0.44) * s + dy])
}

function star(cx: number, cy: number, outer: number, inner: number, points: number): P[] {
  const out: P[] = []
  for (let i = 0; i < points * 2; i++) {
    const a = (Math.PI * i) / points - Math.PI / 2
    const r = i % 2 ? inner : outer
    out.push([cx + r * Math.cos(a), cy + r * Math.sin(a)])
  }
  return out
}

const SYMBOLS: Record<Pictogram, Shape[]> = {
  GHS01: [
    { circle: [0.46, 0.6], r: 0.1 },
    { line: [[0.53, 0.52], [0.6, 0.44]], width: 0.03 },
    ...([[0.62, 0.3], [0.7, 0.4], [0.52, 0.28], [0.72, 0.52]] as P[]).map((p) => ({ line: [[0.6 + (p[0] - 0.6) * 0.35, 0.43 + (p[1] - 0.43) * 0.35], p] as [P, P], width: 0.025 })),
    { poly: [[0.3, 0.42], [0.34, 0.4], [0.33, 0.45]] },
    { poly: [[0.38, 0.33], [0.42, 0.32], [0.4, 0.37]] },
  ],
  GHS02: [{ poly: flame() }, { poly: [[0.33, 0.66], [0.67, 0.66], [0.67, 0.71], [0.33, 0.71]] }],
  GHS03: [{ poly: flame(0, -0.07, 0.75) }, { ring: [0.5, 0.6], r: 0.085, width: 0.035 }, { poly: [[0.33, 0.71], [0.67, 0.71], [0.67, 0.74], [0.33, 0.74]] }],
  GHS04: [
    { poly: [[0.3, 0.52], [0.62, 0.44], [0.65, 0.56], [0.33, 0.64]] },
    { circle: [0.315, 0.58], r: 0.062 },
    { poly: [[0.62, 0.46], [0.7, 0.44], [0.72, 0.52], [0.64, 0.54]] },
  ],
  GHS05: [
    { poly: [[0.3, 0.3], [0.36, 0.27], [0.44, 0.4], [0.39, 0.43]] },
    { poly: [[0.7, 0.3], [0.64, 0.27], [0.56, 0.4], [0.61, 0.43]] },
    { circle: [0.41, 0.49], r: 0.02 },
    { circle: [0.59, 0.49], r: 0.02 },
    // a bar eaten into from above, and a hand with a bite out of it
    { poly: [[0.52, 0.62], [0.56, 0.57], [0.6, 0.6], [0.64, 0.56], [0.7, 0.58], [0.7, 0.64], [0.52, 0.64]] },
    { poly: [[0.3, 0.6], [0.36, 0.56], [0.4, 0.59], [0.46, 0.58], [0.48, 0.62], [0.46, 0.66], [0.3, 0.66]] },
    { poly: [[0.33, 0.69], [0.67, 0.69], [0.67, 0.72], [0.33, 0.72]] },
  ],
  GHS06: [
    { line: [[0.36, 0.56], [0.64, 0.7]], width: 0.045 },
    { line: [[0.36, 0.7], [0.64, 0.56]], width: 0.045 },
    { circle: [0.5, 0.41], r: 0.11, ry: 0.1 },
    { poly: [[0.43, 0.47], [0.57, 0.47], [0.56, 0.56], [0.44, 0.56]] },
    { circle: [0.46, 0.41], r: 0.03, fill: WHITE },
    { circle: [0.54, 0.41], r: 0.03, fill: WHITE },
    { poly: [[0.5, 0.45], [0.52, 0.49], [0.48, 0.49]], fill: WHITE },
  ],
  GHS07: [{ poly: [[0.455, 0.28], [0.545, 0.28], [0.525, 0.6], [0.475, 0.6]] }, { circle: [0.5, 0.67], r: 0.04 }],
  GHS08: [
    { circle: [0.5, 0.32], r: 0.065 },
    { poly: [[0.34, 0.74], [0.35, 0.5], [0.42, 0.42], [0.58, 0.42], [0.65, 0.5], [0.66, 0.74]] },
    { poly: star(0.5, 0.58, 0.1, 0.04, 8), fill: WHITE },
  ],
  GHS09: [
    // a bare tree on the left, a fish on its back on the right, on the ground line
    { line: [[0.38, 0.68], [0.38, 0.36]], width: 0.035 },
    { line: [[0.38, 0.5], [0.29, 0.42]], width: 0.025 },
    { line: [[0.38, 0.44], [0.47, 0.36]], width: 0.025 },
    { line: [[0.38, 0.56], [0.46, 0.5]], width: 0.02 },
    { circle: [0.57, 0.64], r: 0.08, ry: 0.04 },
    { poly: [[0.64, 0.64], [0.71, 0.6], [0.71, 0.68]] },
    { circle: [0.53, 0.63], r: 0.012, fill: WHITE },
    { line: [[0.31, 0.69], [0.69, 0.69]], width: 0.02 },
  ],
}

/**
 * Canvas vectors (page coordinates) of pictogram `code` as a diamond `size` points tall and
 * wide, its bounding box's top-left corner at (x, y).
 */
export function ghsDiamondVectors(code: Pictogram, x: number, y: number, size: number): Record<string, unknown>[] {
  const at = ([u, v]: P) => ({ x: x + u * size, y: y + v * size })
  // The red frame is about a twelfth of the diamond's width, and the inner white keeps clear of it.
  const border = size / 12
  const inset = border / 2 / Math.SQRT2 / size
  const diamond: P[] = [[0.5, inset], [1 - inset, 0.5], [0.5, 1 - inset], [inset, 0.5]]
  const out: Record<string, unknown>[] = [{ type: 'polyline', points: diamond.map(at), closePath: true, color: WHITE, lineColor: GHS_RED, lineWidth: border, lineJoin: 'miter' }]
  // Filled shapes are joined into one path per run of one colour, so a sheet of labels carries a
  // few vectors per pictogram rather than dozens (pdfmake's cost grows with each vector).
  const r = (v: number) => Math.round(v * 100) / 100
  let run: { fill: string; d: string } | null = null
  const flush = () => {
    if (run) out.push({ type: 'path', d: run.d, color: run.fill })
    run = null
  }
  const fillPath = (fill: string, d: string) => {
    if (run && run.fill !== fill) flush()
    run ??= { fill, d: '' }
    run.d += d
  }
  for (const s of SYMBOLS[code]) {
    if ('poly' in s) {
      const pts = s.poly.map(at)
      fillPath(s.fill ?? BLACK, `M${pts.map((p) => `${r(p.x)} ${r(p.y)}`).join('L')}Z`)
    } else if ('ring' in s) {
      flush()
      const c = at(s.ring)
      out.push({ type: 'ellipse', x: c.x, y: c.y, r1: s.r * size, r2: s.r * size, color: WHITE, lineColor: BLACK, lineWidth: s.width * size })
    } else if ('circle' in s) {
      const c = at(s.circle)
      const [rx, ry] = [r(s.r * size), r((s.ry ?? s.r) * size)]
      fillPath(s.fill ?? BLACK, `M${r(c.x - rx)} ${r(c.y)}A${rx} ${ry} 0 1 0 ${r(c.x + rx)} ${r(c.y)}A${rx} ${ry} 0 1 0 ${r(c.x - rx)} ${r(c.y)}Z`)
    } else {
      flush()
      const [a, b] = s.line.map(at)
      out.push({ type: 'line', x1: a!.x, y1: a!.y, x2: b!.x, y2: b!.y, lineWidth: s.width * size, lineColor: s.color ?? BLACK, lineCap: 'round' })
    }
  }
  flush()
  return out
}
