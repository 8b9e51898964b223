/**
 * Every QR code in one image, for a photo of several labels (a sheet, a tray of containers).
 * jsQR answers one code per call, and on a busy image it often answers none (finder patterns of
 * neighbouring codes confuse it). So the image is cut into overlapping tiles of a few sizes, each
 * tile decoded, the code found painted over (its quad, widened by the quiet zone) and the tile
 * decoded again until it yields nothing more. Pure: pixels in, texts out, so the scan page and the
 * tests run the same code.
 */
import jsQR from 'jsqr'

export interface Pixels {
  data: Uint8ClampedArray
  width: number
  height: number
}
interface Point {
  x: number
  y: number
}

/** Paints the convex quad `q` (widened by `grow` of its size about its centre) white, in place. */
function paintOver(img: Pixels, q: Point[], grow: number) {
  const cx = q.reduce((s, p) => s + p.x, 0) / q.length
  const cy = q.reduce((s, p) => s + p.y, 0) / q.length
  const poly = q.map((p) => ({ x: cx + (p.x - cx) * (1 + grow), y: cy + (p.y - cy) * (1 + grow) }))
  const y0 = Math.max(0, Math.floor(Math.min(...poly.map((p) => p.y))))
  const y1 = Math.min(img.height - 1, Math.ceil(Math.max(...poly.map((p) => p.y))))
  for (let y = y0; y <= y1; y++) {
    // The row's crossings with the polygon's edges bound what lies inside it.
    const xs: number[] = []
    for (let i = 0; i < poly.length; i++) {
      const a = poly[i]!
      const b = poly[(i + 1) % poly.length]!
      if ((a.y <= y && b.y > y) || (b.y <= y && a.y > y)) xs.push(a.x + ((y - a.y) * (b.x - a.x)) / (b.y - a.y))
    }
    if (xs.length < 2) continue
    const from = Math.max(0, Math.floor(Math.min(...xs)))
    const to = Math.min(img.width - 1, Math.ceil(Math.max(...xs)))
    img.data.fill(255, (y * img.width + from) * 4, (y * img.width + to + 1) * 4)
  }
}

/**
 * Decodes `img` again and again, painting over each code found, at most `max` times; adds the
 * texts to `found` and the symbols' widths to `sizes`. `paint` also gets each quad found, to
 * paint it over elsewhere (in the whole image the tile was cut from).
 */
function decodeRepeatedly(img: Pixels, found: string[], max: number, sizes: number[], paint?: (q: Point[]) => void) {
  for (let i = 0; i < max; i++) {
    const code = jsQR(img.data, img.width, img.height, { inversionAttempts: 'dontInvert' })
    if (!code) return
    if (!found.includes(code.data)) found.push(code.data)
    const l = code.location
    // The corners are those of the symbol; its width is their distance.
    sizes.push(Math.hypot(l.topRightCorner.x - l.topLeftCorner.x, l.topRightCorner.y - l.topLeftCorner.y))
    const quad = [l.topLeftCorner, l.topRightCorner, l.bottomRightCorner, l.bottomLeftCorner]
    paintOver(img, quad, 0.3)
    paint?.(quad)
  }
}

function crop(img: Pixels, x: number, y: number, w: number, h: number): Pixels {
  const data = new Uint8ClampedArray(w * h * 4)
  for (let r = 0; r < h; r++) data.set(img.data.subarray(((y + r) * img.width + x) * 4, ((y + r) * img.width + x + w) * 4), r * w * 4)
  return { data, width: w, height: h }
}

/** `img` scaled by `f` (< 1), each pixel the mean of the source pixels it covers (grey is enough). */
function shrink(img: Pixels, f: number): Pixels {
  const w = Math.max(1, Math.round(img.width * f))
  const h = Math.max(1, Math.round(img.height * f))
  const data = new Uint8ClampedArray(w * h * 4)
  for (let y = 0; y < h; y++) {
    const sy0 = Math.floor(y / f)
    const sy1 = Math.min(img.height, Math.max(sy0 + 1, Math.floor((y + 1) / f)))
    for (let x = 0; x < w; x++) {
      const sx0 = Math.floor(x / f)
      const sx1 = Math.min(img.width, Math.max(sx0 + 1, Math.floor((x + 1) / f)))
      let sum = 0
      for (let sy = sy0; sy < sy1; sy++) for (let sx = sx0; sx < sx1; sx++) {
        const i = (sy * img.width + sx) * 4
        sum += img.data[i]! + img.data[i + 1]! + img.data[i + 2]!
      }
      const v = sum / (3 * (sy1 - sy0) * (sx1 - sx0))
      const o = (y * w + x) * 4
      data[o] = data[o + 1] = data[o + 2] = v
      data[o + 3] = 255
    }
  }
  return { data, width: w, height: h }
}

/** Overlapping tiles of `side` px every `stride` px across `img` from (`start`, `start`), each decoded on its own. */
function decodeTiles(img: Pixels, side: number, stride: number, found: string[], sizes: number[], start = 0) {
  for (let y = start; y + stride < img.height || y === start; y += stride) {
    for (let x = start; x + stride < img.width || x === start; x += stride) {
      const w = Math.min(side, img.width - x)
      const h = Math.min(side, img.height - y)
      // A code found is painted over in the whole image too, so the tiles overlapping it
      // neither decode it again nor mistake its finder patterns for a neighbour's.
      if (w >= 40 && h >= 40) decodeRepeatedly(crop(img, x, y, w, h), found, 2, sizes, (q) => paintOver(img, q.map((p) => ({ x: p.x + x, y: p.y + y })), 0.3))
    }
  }
}

/**
 * The texts of every QR code found in `img`, each once, in the order found; `img` is left as it
 * was. First the whole image, then coarse tiles (a third of the shorter side) until one code is
 * found: its size sets the fine pass, where the image is scaled so a code is about 80 px across
 * (about 3 px per module for the labels' 25 modules) and cut into tiles 2 codes wide every 0.7
 * code, so every code lies whole, with its quiet zone, in at least one tile.
 */
export function decodeAll(img: Pixels): string[] {
  const found: string[] = []
  const sizes: number[] = []
  decodeRepeatedly(crop(img, 0, 0, img.width, img.height), found, 60, sizes)
  if (!sizes.length) {
    const side = Math.floor(Math.min(img.width, img.height) / 3)
    if (side >= 40) decodeTiles(crop(img, 0, 0, img.width, img.height), side, Math.floor(side / 2), found, sizes)
  }
  if (!sizes.length) return found
  const q = Math.min(...sizes)
  const f = Math.min(1, 80 / q)
  const small = f < 0.9 ? shrink(img, f) : crop(img, 0, 0, img.width, img.height)
  const qs = q * (f < 0.9 ? f : 1)
  const side = Math.round(2 * qs)
  const stride = Math.round(0.7 * qs)
  decodeTiles(small, side, stride, found, sizes)
  // jsQR can still miss a code in every tile of that grid (a neighbour's finder pattern at the
  // tile's edge); the codes found are painted over by now, so a grid shifted by half a stride
  // looks again at what is left
  decodeTiles(small, side, stride, found, sizes, Math.round(stride / 2))
  return found
}
