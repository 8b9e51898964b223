import type { H3Event } from 'h3'

/** Verification requests allowed per client address per window. */
export const VERIFY_LIMIT = 30
export const VERIFY_WINDOW_MS = 60_000
const MAX_TRACKED = 10_000

// Counted in this process's memory, unlike the sign-in limits. A wrong guess at a certificate
// learns nothing (a 256-bit digest), so the limit only protects against load, and a per-instance
// count does that without a database write for every anonymous request. With N instances behind
// a balancer an address may make up to N × the limit.
const hits = new Map<string, number[]>()

/** Refuses with 429 and Retry-After when this address has used up its verifications for now. */
export function assertVerifyAllowed(event: H3Event): void {
  const now = Date.now()
  const address = clientAddress(event)
  const recent = (hits.get(address) ?? []).filter((t) => now - t < VERIFY_WINDOW_MS)
  if (recent.length >= VERIFY_LIMIT) {
    const retryAfter = Math.max(1, Math.ceil((recent[0]! + VERIFY_WINDOW_MS - now) / 1000))
    setResponseHeader(event, 'Retry-After', retryAfter)
    throw createError({ statusCode: 429, statusMessage: 'Too many requests', message: 'Too many verifications from this address; try again in a minute', data: { retryAfterSeconds: retryAfter } })
  }
  recent.push(now)
  hits.delete(address)
  hits.set(address, recent)
  // Forget the longest-idle addresses (a Map keeps insertion order) when too many are tracked.
  while (hits.size > MAX_TRACKED) hits.delete(hits.keys().next().value!)
}
