/**
 * The datasheet files Ionfolio keeps, and how their content is checked. The file's name says
 * what it claims to be; the first bytes (PDF, PNG, JPEG signatures) or, for CSV and plain text,
 * every byte (valid UTF-8, no control characters) must agree, whatever the name says.
 */

/** 25 MB, decimal (25 000 000 bytes), as the text says: a scanned certificate of several pages fits; a video does not. */
export const DATASHEET_MAX_BYTES = 25_000_000
/** The limit as people read it, made from the number the check uses, so the two never differ. */
export const DATASHEET_MAX_TEXT = `${DATASHEET_MAX_BYTES / 1_000_000} MB`

export type DatasheetKind = 'pdf' | 'png' | 'jpeg' | 'csv' | 'text'

export const DATASHEET_KINDS: Record<DatasheetKind, { label: string; contentType: string; extensions: string[]; magic: number[] | null }> = {
  pdf: { label: 'PDF', contentType: 'application/pdf', extensions: ['.pdf'], magic: [0x25, 0x50, 0x44, 0x46, 0x2d] }, // "%PDF-"
  png: { label: 'PNG', contentType: 'image/png', extensions: ['.png'], magic: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  jpeg: { label: 'JPEG', contentType: 'image/jpeg', extensions: ['.jpg', '.jpeg'], magic: [0xff, 0xd8, 0xff] },
  csv: { label: 'CSV', contentType: 'text/csv', extensions: ['.csv'], magic: null },
  text: { label: 'plain text', contentType: 'text/plain', extensions: ['.txt'], magic: null },
}

/** For a file input's `accept` attribute and for messages. */
export const DATASHEET_ACCEPT = Object.values(DATASHEET_KINDS).flatMap((k) => k.extensions).join(',')
export const DATASHEET_ACCEPTED_TEXT = `PDF, PNG, JPEG, CSV or plain text (.pdf, .png, .jpg, .csv, .txt), at most ${DATASHEET_MAX_TEXT}`

/** The kind a file name claims, from its extension; null for anything not on the list. */
export function kindFromName(name: string): DatasheetKind | null {
  const dot = name.lastIndexOf('.')
  if (dot < 0) return null
  const ext = name.slice(dot).toLowerCase()
  return (Object.keys(DATASHEET_KINDS) as DatasheetKind[]).find((k) => DATASHEET_KINDS[k].extensions.includes(ext)) ?? null
}

/** True when `head` starts with the signature of `kind` (always true for the text kinds). */
export function magicMatches(kind: DatasheetKind, head: Uint8Array): boolean {
  const magic = DATASHEET_KINDS[kind].magic
  if (!magic) return true
  return head.length >= magic.length && magic.every((b, i) => head[i] === b)
}

/**
 * Checks text chunk by chunk: the bytes must decode as UTF-8 (a leading byte-order mark is
 * fine) and hold no control characters other than tab, line feed, form feed and carriage
 * return — which is what tells a text file from a binary one with a .txt name.
 */
export class TextChecker {
  private decoder = new TextDecoder('utf-8', { fatal: true })
  ok = true

  push(chunk: Uint8Array): void {
    if (!this.ok) return
    for (const b of chunk) {
      if ((b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0c && b !== 0x0d) || b === 0x7f) {
        this.ok = false
        return
      }
    }
    try {
      this.decoder.decode(chunk, { stream: true })
    } catch {
      this.ok = false
    }
  }

  /** Ends the check (a multi-byte character cut off at the end is an error). */
  end(): boolean {
    if (this.ok) {
      try {
        this.decoder.decode()
      } catch {
        this.ok = false
      }
    }
    return this.ok
  }
}

/** A file name safe to show and to put in a download header: no path, no control characters. */
export function cleanFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? ''
  const cleaned = base.replace(/[\u0000-\u001f\u007f"]/g, '').trim().slice(0, 200)
  return cleaned || 'datasheet'
}

/**
 * The Content-Disposition a stored datasheet carries: an ASCII fallback name and the RFC 6266 /
 * RFC 5987 UTF-8 form, so a download keeps accented names.
 */
export function contentDisposition(name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_')
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)}`
}
