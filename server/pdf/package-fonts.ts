// The PDF fonts read straight from the installed @fontsource packages, for the benches and the
// unit tests, which run without Nitro (the server reads the same files as server assets).
import { readFile } from 'node:fs/promises'
import { createRequire } from 'node:module'
import path from 'node:path'
import { FONT_SOURCES, preparePdfFonts, type FontMode } from './fonts'

const require = createRequire(import.meta.url)

/** The path of one @fontsource WOFF file by its name. */
export function fontPath(file: string): string {
  const source = Object.values(FONT_SOURCES).find((s) => file.startsWith(`${s.prefix}-`))!
  return path.join(path.dirname(require.resolve(`${source.pkg}/package.json`)), 'files', file)
}

/** Loads the PDF fonts from the packages (as TrueType, or as the WOFF paths for a baseline). */
export function preparePackageFonts(mode: FontMode = 'ttf'): Promise<void> {
  return preparePdfFonts((file) => readFile(fontPath(file)), { mode, pathOf: fontPath })
}
