import { preparePdfFonts, renderPdf } from '../pdf/fonts'

/**
 * Makes the PDF fonts ready: the @fontsource WOFF files travel with the build as server assets
 * (nuxt.config.ts, nitro.serverAssets) and are converted to TrueType once per process.
 */
export function usePdfFonts(): Promise<void> {
  return preparePdfFonts(async (file) => {
    const base = file.startsWith('roboto-mono') ? 'assets:pdf-mono' : 'assets:pdf-inter'
    const raw = await useStorage(base).getItemRaw(file)
    if (!raw) throw new Error(`font ${file} is missing from the server assets`)
    return Buffer.from(raw as Uint8Array)
  })
}

/** Renders a pdfmake document with the app's fonts. */
export async function renderDocument(doc: Record<string, unknown>): Promise<Buffer> {
  await usePdfFonts()
  return renderPdf(doc)
}
