/// <reference path="./pdfmake.d.ts" />
/**
 * The fonts of every PDF: Inter for text and Roboto Mono for codes and digests, from the
 * @fontsource packages the pages use too. @fontsource splits each font into subsets by script;
 * a PDF font is one file, so each subset becomes a pdfmake family of its own, and `runs()`
 * hands every character to the first subset that has it (latin, then latin-ext, then greek).
 *
 * Start-up converts each WOFF to TrueType once and registers the result in pdfmake's virtual
 * file system: handing pdfmake the WOFF files instead makes every document inflate them again.
 * The TrueType files leave out the OpenType layout tables (GSUB, GPOS, GDEF): shaping with them
 * was most of the time of a certificate, and a certificate or label needs no ligatures or
 * contextual forms. Without them pdfmake sets each glyph at its plain advance width, the same
 * width textWidth() measures, so fitted label lines are exact.
 */
import pdfmake from 'pdfmake'
import { woffToSfnt } from './woff'
import { fontMetrics, type FontMetrics } from './font-metrics'

export type Family = 'Inter' | 'Mono'

/** The @fontsource files used, by package; each family takes a regular and a bold weight. */
export const FONT_SOURCES: Record<Family, { pkg: string; prefix: string; subsets: string[]; normal: number; bold: number }> = {
  Inter: { pkg: '@fontsource/inter', prefix: 'inter', subsets: ['latin', 'latin-ext', 'greek'], normal: 400, bold: 600 },
  Mono: { pkg: '@fontsource/roboto-mono', prefix: 'roboto-mono', subsets: ['latin', 'latin-ext'], normal: 400, bold: 700 },
}

/** Every WOFF file the PDFs need, as `package/files/name`. */
export function fontFileNames(): string[] {
  return Object.values(FONT_SOURCES).flatMap((s) => s.subsets.flatMap((sub) => [s.normal, s.bold].map((w) => `${s.prefix}-${sub}-${w}-normal.woff`)))
}

/** OpenType layout tables the converted fonts leave out (see above). */
export const OMITTED_TABLES = ['GSUB', 'GPOS', 'GDEF'] as const

const pdfFamily = (family: Family, subset: string) => (subset === 'latin' ? family : `${family}-${subset}`)

interface Subset {
  name: string
  metrics: FontMetrics
  bold: FontMetrics
}
const subsetsOf = new Map<Family, Subset[]>()
let ready: Promise<void> | null = null

/**
 * How fonts reach pdfmake: converted TrueType without the layout tables (the app); for the
 * bench's baselines, converted with every table kept, or the WOFF files as they are.
 */
export type FontMode = 'ttf' | 'ttf-full' | 'woff-paths'

/**
 * Loads, converts and registers the fonts once; later calls return the same promise. `read`
 * answers the bytes of one WOFF file by its name; `pathOf` is needed for 'woff-paths' only.
 */
export function preparePdfFonts(read: (file: string) => Promise<Buffer>, opts: { mode?: FontMode; pathOf?: (file: string) => string } = {}): Promise<void> {
  ready ??= (async () => {
    const mode = opts.mode ?? 'ttf'
    const families: Record<string, { normal: string; bold: string; italics: string; bolditalics: string }> = {}
    const allowed = new Set<string>()
    for (const [family, source] of Object.entries(FONT_SOURCES) as [Family, (typeof FONT_SOURCES)[Family]][]) {
      const subsets: Subset[] = []
      for (const subset of source.subsets) {
        const files: Record<'normal' | 'bold', string> = { normal: '', bold: '' }
        const metrics: Partial<Record<'normal' | 'bold', FontMetrics>> = {}
        for (const weight of ['normal', 'bold'] as const) {
          const name = `${source.prefix}-${subset}-${source[weight]}-normal.woff`
          const woff = await read(name)
          const ttf = woffToSfnt(woff, { omit: mode === 'ttf' ? OMITTED_TABLES : [] })
          metrics[weight] = fontMetrics(ttf)
          if (mode !== 'woff-paths') {
            files[weight] = name.replace(/\.woff$/, '.ttf')
            pdfmake.virtualfs.writeFileSync(files[weight], ttf)
          } else {
            files[weight] = opts.pathOf!(name)
            allowed.add(files[weight])
          }
        }
        subsets.push({ name: pdfFamily(family, subset), metrics: metrics.normal!, bold: metrics.bold! })
        families[pdfFamily(family, subset)] = { normal: files.normal, bold: files.bold, italics: files.normal, bolditalics: files.bold }
      }
      subsetsOf.set(family, subsets)
    }
    pdfmake.setFonts(families)
    // Documents are built from our own data only: no image or font is ever fetched by URL, and
    // local files are read only in the baseline mode, and only the font files named above.
    pdfmake.setUrlAccessPolicy(() => false)
    pdfmake.setLocalAccessPolicy((p: string) => allowed.has(p))
  })().catch((e) => {
    ready = null
    throw e
  })
  return ready
}

/** The family lists, for callers that must be sure the fonts are in (layout code). */
function subsets(family: Family): Subset[] {
  const s = subsetsOf.get(family)
  if (!s) throw new Error('PDF fonts are not loaded: call preparePdfFonts first')
  return s
}

// Characters none of the subsets has, written in ones they do.
const STAND_INS: Record<string, string> = { '→': '->', '←': '<-', '≤': '<=', '≥': '>=', '≈': '~', '√': 'sqrt', '∑': 'sum', '⋅': '·', '−': '-' }
// Superscript and subscript digits: only ¹ ² ³ are in a subset (Latin-1), so a run of them is
// set as raised or lowered plain digits, except a lone ¹ ² ³ (cm², m³), which prints as it is.
const SUPERSCRIPT = '⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻'
const SUBSCRIPT = '₀₁₂₃₄₅₆₇₈₉₊₋'
const PLAIN = '0123456789+-'
const LONE_GLYPH = '¹²³'
const PLAIN_TEXT = /^[\x20-\x7e\u00a0-\u00b1\u00b4-\u00b8\u00ba-\u00ff]*$/

export interface Run {
  text: string
  font?: string
  sup?: boolean
  sub?: boolean
}

/**
 * A text as pdfmake inlines, each run in a subset that has its characters (⁵⁸Ni and CO₂ get
 * raised or lowered digits). Plain Latin-1 text comes back as it is.
 */
export function runs(text: string, family: Family = 'Inter'): string | Run[] {
  if (PLAIN_TEXT.test(text)) return family === 'Inter' ? text : [{ text, font: family }]
  const list = subsets(family)
  const base = list[0]!.name
  const out: Run[] = []
  const push = (piece: string, font: string, shift?: 'sup' | 'sub') => {
    const last = out[out.length - 1]
    if (last && last.font === font && (last.sup ? 'sup' : last.sub ? 'sub' : undefined) === shift) last.text += piece
    else out.push({ text: piece, font, ...(shift ? { [shift]: true } : {}) })
  }
  const chars = [...text]
  let i = 0
  while (i < chars.length) {
    const ch = chars[i]!
    const set = SUPERSCRIPT.includes(ch) ? SUPERSCRIPT : SUBSCRIPT.includes(ch) ? SUBSCRIPT : null
    if (set) {
      let j = i
      while (j < chars.length && set.includes(chars[j]!)) j++
      if (!(j - i === 1 && set === SUPERSCRIPT && LONE_GLYPH.includes(ch))) {
        push(chars.slice(i, j).map((c) => PLAIN[set.indexOf(c)]).join(''), base, set === SUPERSCRIPT ? 'sup' : 'sub')
        i = j
        continue
      }
    }
    const cp = ch.codePointAt(0)!
    const subset = list.find((s) => s.metrics.advance.has(cp))
    if (subset) push(ch, subset.name)
    else for (const stand of STAND_INS[ch] ?? '?') push(stand, base)
    i++
  }
  return out
}

/** Width of a text in points at `size`, from the advance widths of the weight it is set in (no kerning, as printed). */
export function textWidth(text: string, size: number, family: Family = 'Inter', bold = false): number {
  const list = subsets(family)
  let em = 0
  for (const ch of text) {
    const cp = ch.codePointAt(0)!
    const subset = list.find((s) => s.metrics.advance.has(cp))
    em += subset ? (bold ? subset.bold : subset.metrics).advance.get(cp) ?? subset.metrics.advance.get(cp)! : 0.6
  }
  return em * size
}

/** Renders a document definition to PDF bytes (fonts must be prepared). */
export async function renderPdf(doc: Record<string, unknown>): Promise<Buffer> {
  if (!ready) throw new Error('PDF fonts are not loaded: call preparePdfFonts first')
  await ready
  return pdfmake.createPdf(doc).getBuffer()
}
