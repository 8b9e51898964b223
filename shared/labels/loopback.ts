/**
 * True when `url` points at this machine only (localhost, 127.0.0.0/8, ::1, 0.0.0.0): a QR code
 * carrying it opens nothing on a phone. Unparseable URLs count as loopback, so they warn too.
 */
export function isLoopbackUrl(url: string): boolean {
  let host: string
  try {
    host = new URL(url).hostname.toLowerCase().replace(/^\[|\]$/g, '')
  } catch {
    return true
  }
  return host === 'localhost' || host.endsWith('.localhost') || /^127(\.\d{1,3}){3}$/.test(host) || host === '::1' || host === '0.0.0.0' || host === '::'
}
