// The radiation trefoil as a vector path: a central disc of radius R and three blades, each an
// annular sector from 1.5 R to 5 R spanning 60°, 120° apart, one pointing down (ISO 361:1975
// proportions — from memory). Black on a yellow disc, the colours that standard sets.

const r = (v: number) => Math.round(v * 1000) / 1000

function point(cx: number, cy: number, radius: number, degrees: number): string {
  const a = (degrees * Math.PI) / 180
  return `${r(cx + radius * Math.cos(a))} ${r(cy + radius * Math.sin(a))}`
}

/** Canvas vectors in page coordinates (for a canvas placed at the page origin) of a trefoil `size` points across, top-left at (x, y). */
export function trefoilVectors(x: number, y: number, size: number) {
  const cx = x + size / 2
  const cy = y + size / 2
  const R = size / 2 / 5.4
  const disc = `M${point(cx, cy, R, 0)}A${r(R)} ${r(R)} 0 1 1 ${point(cx, cy, R, 180)}A${r(R)} ${r(R)} 0 1 1 ${point(cx, cy, R, 360)}Z`
  // Page y grows downwards, so 90° points down; the other two blades point up-left and up-right.
  const blades = [90, 210, 330]
    .map((c) => {
      const [a1, a2] = [c - 30, c + 30]
      return `M${point(cx, cy, 1.5 * R, a1)}L${point(cx, cy, 5 * R, a1)}A${r(5 * R)} ${r(5 * R)} 0 0 1 ${point(cx, cy, 5 * R, a2)}L${point(cx, cy, 1.5 * R, a2)}A${r(1.5 * R)} ${r(1.5 * R)} 0 0 0 ${point(cx, cy, 1.5 * R, a1)}Z`
    })
    .join('')
  return [
    { type: 'ellipse', x: cx, y: cy, r1: size / 2, r2: size / 2, color: '#ffd200' },
    { type: 'path', d: disc + blades, color: '#000000' },
  ]
}
