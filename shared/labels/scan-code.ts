/**
 * The sample code a scanned or typed text names: a label's URL (…/scan/S-2026-000042), the
 * code itself, or a code typed loosely ("s 2026 42", "S-2026-42"), padded to six digits. Null
 * when the text names no sample code.
 */
export function sampleCodeFrom(text: string): string | null {
  const t = text.trim()
  const url = /\/scan\/(S-\d{4}-\d{6,})(?:[/?#]|$)/i.exec(t)
  if (url) return url[1]!.toUpperCase()
  const loose = /^S[\s-]*(\d{4})[\s-]+(\d+)$/i.exec(t)
  if (!loose) return null
  return `S-${loose[1]}-${loose[2]!.padStart(6, '0')}`
}
