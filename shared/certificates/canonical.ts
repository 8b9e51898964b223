/**
 * The canonical JSON of a certificate's frozen payload, whose SHA-256 is printed on the
 * certificate and checked by the public verification page. Object keys sorted by UTF-16 code
 * units, no whitespace, numbers and strings as JSON.stringify writes them: for payloads made only
 * of strings, finite numbers, booleans, null, arrays and objects this is the serialisation of
 * RFC 8785 (JSON Canonicalization Scheme). Anyone can recompute it from the payload.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value === 'boolean' || typeof value === 'string') return JSON.stringify(value)
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new TypeError('a certificate payload holds finite numbers only')
    return JSON.stringify(value)
  }
  if (Array.isArray(value)) return `[${value.map((v) => (v === undefined ? 'null' : canonicalJson(v))).join(',')}]`
  if (typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`
  }
  throw new TypeError(`a certificate payload cannot hold a ${typeof value}`)
}

/** The pattern of a certificate number: C-, the year of issue, a six-or-more digit serial. */
export const CERTIFICATE_NUMBER_PATTERN = /^C-\d{4}-\d{6,}$/

/** A SHA-256 digest as lower-case hex. */
export const DIGEST_PATTERN = /^[0-9a-f]{64}$/
