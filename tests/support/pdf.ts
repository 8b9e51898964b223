import { execFile } from 'node:child_process'
import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { promisify } from 'node:util'
import { PNG } from 'pngjs'

const run = promisify(execFile)

function tmpFile(name: string, bytes: Uint8Array): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'ionfolio-pdf-'))
  const file = path.join(dir, name)
  writeFileSync(file, bytes)
  return file
}

/** The text of a PDF as Debian's poppler-utils `pdftotext` reads it (reading order; `layout` keeps columns). */
export async function pdfText(pdf: Uint8Array, layout = false): Promise<string> {
  const file = tmpFile('doc.pdf', pdf)
  const { stdout } = await run('pdftotext', [...(layout ? ['-layout'] : []), '-enc', 'UTF-8', file, '-'], { maxBuffer: 32 * 1024 * 1024 })
  return stdout
}

/** Page count and page size in points, from poppler's `pdfinfo`. */
export async function pdfPages(pdf: Uint8Array): Promise<{ pages: number; width: number; height: number }> {
  const { stdout } = await run('pdfinfo', [tmpFile('doc.pdf', pdf)])
  const size = /Page size:\s+([\d.]+) x ([\d.]+) pts/.exec(stdout)!
  return { pages: Number(/Pages:\s+(\d+)/.exec(stdout)![1]), width: Number(size[1]), height: Number(size[2]) }
}

/** Renders every page with poppler's `pdftoppm -r <dpi>`, answering the PNG files in page order. */
export async function renderPages(pdf: Uint8Array, dpi = 300): Promise<string[]> {
  const file = tmpFile('doc.pdf', pdf)
  const prefix = path.join(path.dirname(file), 'page')
  await run('pdftoppm', ['-r', String(dpi), '-png', file, prefix], { maxBuffer: 64 * 1024 * 1024 })
  return readdirSync(path.dirname(file))
    .filter((f) => f.startsWith('page') && f.endsWith('.png'))
    .sort((a, b) => Number(/(\d+)\.png$/.exec(a)![1]) - Number(/(\d+)\.png$/.exec(b)![1]))
    .map((f) => path.join(path.dirname(file), f))
}

/**
 * Every QR code ZBar's `zbarimg` finds in an image (Debian zbar-tools: a decoder of its own,
 * not the jsQR the scan page uses). Codes only, no other symbologies.
 */
export async function zbar(png: string): Promise<string[]> {
  try {
    const { stdout } = await run('zbarimg', ['--quiet', '--raw', '-Sdisable', '-Sqrcode.enable', png])
    return stdout.split('\n').filter(Boolean)
  } catch (e: any) {
    // zbarimg exits 4 when it finds no symbol
    if (e?.code === 4) return []
    throw e
  }
}

// A rendered page is decoded once however many crops are cut from it.
const decoded = new Map<string, PNG>()
const readPng = (file: string) => {
  if (!decoded.has(file)) decoded.set(file, PNG.sync.read(readFileSync(file)))
  return decoded.get(file)!
}

/** Crops a rectangle given in millimetres out of a page rendered at `dpi`, as a new PNG file. */
export function cropMm(png: string, dpi: number, box: { x: number; y: number; w: number; h: number }): string {
  const page = readPng(png)
  const px = (mm: number) => Math.round((mm / 25.4) * dpi)
  const out = new PNG({ width: px(box.w), height: px(box.h) })
  PNG.bitblt(page, out, px(box.x), px(box.y), out.width, out.height, 0, 0)
  const file = `${png.replace(/\.png$/, '')}-${px(box.x)}-${px(box.y)}.png`
  writeFileSync(file, PNG.sync.write(out))
  return file
}

/** The box (mm from the top-left corner) holding every non-white pixel of a rendered page. */
export function inkBox(png: string, dpi: number): { left: number; top: number; right: number; bottom: number } {
  const page = readPng(png)
  let [x0, y0, x1, y1] = [page.width, page.height, -1, -1]
  for (let y = 0; y < page.height; y++) {
    for (let x = 0; x < page.width; x++) {
      const i = (y * page.width + x) * 4
      if (page.data[i]! < 245 || page.data[i + 1]! < 245 || page.data[i + 2]! < 245) {
        if (x < x0) x0 = x
        if (x > x1) x1 = x
        if (y < y0) y0 = y
        if (y > y1) y1 = y
      }
    }
  }
  const mm = (px: number) => (px / dpi) * 25.4
  return { left: mm(x0), top: mm(y0), right: mm(page.width - 1 - x1), bottom: mm(page.height - 1 - y1) }
}

/** The longest horizontal run of dark pixels (mm) in the band `fromMm`…`toMm` from the top of a page rendered at `dpi`. */
export function longestDarkRunMm(png: string, dpi: number, fromMm: number, toMm: number): number {
  const page = readPng(png)
  const px = (mm: number) => Math.round((mm / 25.4) * dpi)
  let best = 0
  for (let y = px(fromMm); y <= Math.min(page.height - 1, px(toMm)); y++) {
    let run = 0
    for (let x = 0; x < page.width; x++) {
      const i = (y * page.width + x) * 4
      run = page.data[i]! < 100 && page.data[i + 1]! < 100 && page.data[i + 2]! < 100 ? run + 1 : 0
      if (run > best) best = run
    }
  }
  return (best / dpi) * 25.4
}

/** How many pixels of a rendered page, within a box in mm, are the GHS frame's red (strong red, little green or blue). */
export function redPixels(png: string, dpi: number, box: { x: number; y: number; w: number; h: number }): number {
  const page = readPng(png)
  const px = (mm: number) => Math.round((mm / 25.4) * dpi)
  let n = 0
  for (let y = px(box.y); y < Math.min(page.height, px(box.y + box.h)); y++) {
    for (let x = px(box.x); x < Math.min(page.width, px(box.x + box.w)); x++) {
      const i = (y * page.width + x) * 4
      if (page.data[i]! > 180 && page.data[i + 1]! < 90 && page.data[i + 2]! < 90) n++
    }
  }
  return n
}
