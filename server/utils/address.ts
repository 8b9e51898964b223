import type { H3Event } from 'h3'

/** The caller's address: the socket's, or the first X-Forwarded-For hop behind a trusted proxy. */
export function clientAddress(event: H3Event): string {
  if (useRuntimeConfig().trustProxy === true || String(useRuntimeConfig().trustProxy) === 'true') {
    const forwarded = getRequestHeader(event, 'x-forwarded-for')
    const first = forwarded?.split(',')[0]?.trim()
    if (first && first.length <= 64) return first
  }
  return event.node.req.socket.remoteAddress ?? 'unknown'
}
