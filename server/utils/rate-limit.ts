import type { H3Event } from 'h3'

/** Failed sign-ins allowed per account and per address within the window. */
export const SIGN_IN_LIMIT = 5
export const SIGN_IN_WINDOW_MINUTES = 15

/**
 * Refuses with 429 and Retry-After when the account or the address has had SIGN_IN_LIMIT failed
 * sign-ins in the last window. Counts live in PostgreSQL so every app instance sees the same.
 */
export async function assertSignInAllowed(event: H3Event, email: string): Promise<void> {
  const db = useDb()
  const address = clientAddress(event)
  const since = db.raw(`now() - interval '${SIGN_IN_WINDOW_MINUTES} minutes'`)
  const rows = await db('sign_in_failures')
    .where('at', '>', since)
    .andWhere((q) => q.where({ email }).orWhere({ address }))
    .select('email', 'address', 'at')
    .orderBy('at', 'asc')
  const byEmail = rows.filter((r) => r.email === email)
  const byAddress = rows.filter((r) => r.address === address)
  const blocking = [byEmail, byAddress].filter((list) => list.length >= SIGN_IN_LIMIT)
  if (!blocking.length) return
  // The block lifts when enough of the oldest failures leave the window.
  const freeAt = Math.max(...blocking.map((list) => new Date(list[list.length - SIGN_IN_LIMIT]!.at).getTime() + SIGN_IN_WINDOW_MINUTES * 60_000))
  const retryAfter = Math.max(1, Math.ceil((freeAt - Date.now()) / 1000))
  setResponseHeader(event, 'Retry-After', retryAfter)
  throw createError({ statusCode: 429, statusMessage: 'Too many attempts', message: 'Too many failed sign-ins; try again later', data: { retryAfterSeconds: retryAfter } })
}

/** Records one failed sign-in for the account and the address. */
export async function recordSignInFailure(event: H3Event, email: string): Promise<void> {
  await useDb()('sign_in_failures').insert({ email, address: clientAddress(event) })
}

/** Forgets an account's failures after a successful sign-in. */
export async function clearSignInFailures(email: string): Promise<void> {
  await useDb()('sign_in_failures').where({ email }).delete()
}
