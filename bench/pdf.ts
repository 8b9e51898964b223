/**
 * Speed of the PDFs: a one-page certificate (target: median under 150 ms) and an A4 sheet
 * of 100 labels (target: under 2 s), each measured three times in the same run: with the fonts
 * as the server has them (WOFF converted once to TrueType without the OpenType layout tables,
 * in pdfmake's virtual file system), converted with every table kept, and with pdfmake handed
 * the @fontsource WOFF files themselves (the baseline). A one-line PDF with the same fonts gives
 * the floor. Each font mode runs in a fresh process, since the fonts are registered once per
 * process.
 *
 * The certificate is also timed rendered and signed with a throwaway laboratory key (what issuing
 * does), against the same certificate unsigned.
 *
 *   npm run bench:pdf             prints the table
 *   npm run bench:pdf -- --out d  also writes the documents into d/ to look at
 */
import { execFileSync } from 'node:child_process'
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { renderPdf, type FontMode } from '../server/pdf/fonts'
import { preparePackageFonts } from '../server/pdf/package-fonts'
import { loadSigningKey, signCertificatePdf } from '../server/pdf/sign'
import { ensureSigningKey } from '../scripts/lib/signing.mjs'
import { hazardousCertificate, labels, onePageCertificate, speciesCertificate, trivial } from './pdf-fixtures'

const TARGET = { certificate: 150, sheet: 2000 }
const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b)
  const m = s.length >> 1
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2
}

async function time(build: () => Record<string, unknown>, runs: number, warm = 3, after: (pdf: Buffer) => Promise<Buffer> = async (b) => b): Promise<{ ms: number; bytes: number; pages: number }> {
  let last: Buffer = Buffer.alloc(0)
  for (let i = 0; i < warm; i++) last = await after(await renderPdf(build()))
  const each: number[] = []
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now()
    last = await after(await renderPdf(build()))
    each.push(performance.now() - t0)
  }
  const pages = (last.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? []).length
  return { ms: median(each), bytes: last.length, pages }
}

async function measure(mode: FontMode) {
  const t0 = performance.now()
  await preparePackageFonts(mode)
  const fontsMs = performance.now() - t0
  const keyFiles = ensureSigningKey(path.join(os.tmpdir(), 'ionfolio-bench-signing'))
  const key = loadSigningKey(readFileSync(keyFiles.NUXT_SIGNING_P12_PATH), keyFiles.NUXT_SIGNING_P12_PASSPHRASE)
  const sign = (pdf: Buffer) => signCertificatePdf(pdf, key, { name: 'Bench', reason: 'Bench', location: 'Bench', contactInfo: 'bench@example.org' })
  return {
    fontsMs,
    signed: mode === 'ttf' ? await time(onePageCertificate, 40, 3, sign) : null,
    trivial: await time(trivial, 40),
    certificate: await time(onePageCertificate, 40),
    sheet: await time(() => labels(100, 'sheet'), 10, 2),
  }
}

const mode = process.argv.includes('--mode') ? (process.argv[process.argv.indexOf('--mode') + 1] as FontMode) : null
if (mode) {
  process.stdout.write(JSON.stringify(await measure(mode)))
  process.exit(0)
}

const self = fileURLToPath(import.meta.url)
const child = (m: FontMode) => JSON.parse(execFileSync(process.execPath, ['--import', 'tsx', self, '--mode', m], { encoding: 'utf8' })) as Awaited<ReturnType<typeof measure>>
const ttf = child('ttf')
const full = child('ttf-full')
const woff = child('woff-paths')

const f = (ms: number) => `${ms.toFixed(1)} ms`
console.log(`PDF benchmark, medians (${process.version}, ${process.arch})`)
console.log('  app:  WOFF converted once to TrueType, OpenType layout tables left out (what the server does)')
console.log('  full: WOFF converted once to TrueType, every table kept')
console.log('  woff: pdfmake handed the @fontsource WOFF files (baseline)\n')
console.log(`font set-up, once per process: app ${f(ttf.fontsMs)}, full ${f(full.fontsMs)}, woff ${f(woff.fontsMs)} (metrics only)`)
const rows: [string, keyof typeof ttf, number | null][] = [
  ['one-line PDF (floor)', 'trivial', null],
  ['one-page certificate', 'certificate', TARGET.certificate],
  ['sheet of 100 labels', 'sheet', TARGET.sheet],
]
console.log('\ndocument                 pages         app        full        woff   woff/app   full/app   app/floor   target')
for (const [name, key, target] of rows) {
  const a = ttf[key] as { ms: number; pages: number }
  const b = full[key] as { ms: number }
  const w = woff[key] as { ms: number }
  const verdict = target === null ? '' : a.ms < target ? `< ${target} ms: met` : `< ${target} ms: MISSED`
  const cells = [f(a.ms), f(b.ms), f(w.ms)].map((c) => c.padStart(11)).join(' ')
  console.log(`${name.padEnd(24)} ${String(a.pages).padStart(5)} ${cells} ${(w.ms / a.ms).toFixed(2).padStart(9)}× ${(b.ms / a.ms).toFixed(2).padStart(9)}× ${(a.ms / ttf.trivial.ms).toFixed(1).padStart(10)}×   ${verdict}`)
}
if (ttf.signed) console.log(`\none-page certificate, rendered and signed (app fonts): ${f(ttf.signed.ms)}, ${(ttf.signed.ms / ttf.certificate.ms).toFixed(2)}× unsigned   ${ttf.signed.ms < TARGET.certificate ? `< ${TARGET.certificate} ms: met` : `< ${TARGET.certificate} ms: MISSED`}`)
if (ttf.certificate.pages !== 1) console.log(`\nNote: the "one-page" certificate came out at ${ttf.certificate.pages} pages.`)

const out = process.argv.includes('--out') ? process.argv[process.argv.indexOf('--out') + 1] : null
if (out) {
  await preparePackageFonts('ttf')
  mkdirSync(out, { recursive: true })
  const docs: [string, () => Record<string, unknown>][] = [
    ['certificate-one-page.pdf', onePageCertificate],
    ['certificate-hazardous.pdf', hazardousCertificate],
    ['certificate-species.pdf', speciesCertificate],
    ['labels-sheet-100.pdf', () => labels(100, 'sheet')],
    ['labels-single-6.pdf', () => labels(6, 'single')],
  ]
  for (const [name, build] of docs) writeFileSync(path.join(out, name), await renderPdf(build()))
  console.log(`\nWrote ${docs.length} documents to ${out}`)
}
