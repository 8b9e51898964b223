/**
 * The security headers of every response, and the Content-Security-Policy of the pages. Pages
 * allow only our own scripts, plus the few inline scripts the server renders (Nuxt's start-up
 * data), each by its SHA-256, so an injected script cannot run. Styles allow inline `style`
 * attributes, which Vue binds for widths and colours. No page may be framed.
 */

export const BASE_HEADERS: Record<string, string> = {
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'same-origin',
  'X-Frame-Options': 'DENY',
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Permissions-Policy': 'camera=(self), microphone=(), geolocation=()',
}

/** The policy of anything that is not a page (JSON, CSV, PDF): nothing runs, nothing frames it. */
export const API_CSP = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'"

/** The policy of a page whose inline scripts have these SHA-256 digests (base64). */
export function pageCsp(inlineScriptHashes: readonly string[]): string {
  const scripts = ["'self'", ...inlineScriptHashes.map((h) => `'sha256-${h}'`)].join(' ')
  return [
    "default-src 'self'",
    `script-src ${scripts}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "media-src 'self' blob:",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ')
}

/** The bodies of the inline, executable scripts of an HTML page (JSON data blocks excluded). */
export function inlineScripts(html: string): string[] {
  const out: string[] = []
  const re = /<script(\s[^>]*)?>([\s\S]*?)<\/script>/gi
  for (let m = re.exec(html); m; m = re.exec(html)) {
    const attrs = m[1] ?? ''
    if (/\ssrc\s*=/i.test(attrs)) continue
    const type = /\stype\s*=\s*["']?([^"'\s>]+)/i.exec(attrs)?.[1]?.toLowerCase()
    if (type && type !== 'module' && type !== 'text/javascript' && type !== 'application/javascript') continue
    out.push(m[2]!)
  }
  return out
}
