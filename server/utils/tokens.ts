import { createHash, randomBytes } from 'node:crypto'
import type { H3Event } from 'h3'
import type { User } from 'lucia'
import type { Role } from '#shared/auth/roles'

// Personal API tokens. The secret is 32 random bytes (256 bits): nobody can guess it or search
// for it from its hash, so a plain SHA-256 is enough to store it. A slow hash (argon2) protects
// low-entropy passwords against guessing; here it would only add tens of milliseconds to every
// API request. The hash is also the look-up key, so one indexed read finds the token.

export const TOKEN_PREFIX = 'ionf_'

/** A new secret, shown to its owner once. */
export function newTokenSecret(): string {
  return TOKEN_PREFIX + randomBytes(32).toString('base64url')
}

export function hashTokenSecret(secret: string): string {
  return createHash('sha256').update(secret).digest('hex')
}

/** Requests per token per minute, per app instance (runtimeConfig.tokenRateLimit). */
function rateLimit(): number {
  return Number(useRuntimeConfig().tokenRateLimit) || 600
}

const windows = new Map<string, { start: number; count: number }>()

/** Counts one request of the token; 429 with Retry-After past the limit of the current minute. */
export function assertTokenRate(event: H3Event, tokenId: string): void {
  const now = Date.now()
  let w = windows.get(tokenId)
  if (!w || now - w.start >= 60_000) {
    if (windows.size > 10_000) windows.clear()
    w = { start: now, count: 0 }
    windows.set(tokenId, w)
  }
  w.count++
  if (w.count > rateLimit()) {
    const retryAfter = Math.max(1, Math.ceil((w.start + 60_000 - now) / 1000))
    setResponseHeader(event, 'Retry-After', retryAfter)
    throw createError({ statusCode: 429, statusMessage: 'Too many requests', message: 'This token has made too many requests; try again later', data: { retryAfterSeconds: retryAfter, limitPerMinute: rateLimit() } })
  }
}

function unauthorized(): never {
  throw createError({ statusCode: 401, statusMessage: 'Unauthorized', message: 'The API token is not valid, has expired or was revoked' })
}

/** The token and its owner for a bearer secret: from the short cache, else from PostgreSQL; 401 otherwise. */
export async function resolveToken(secret: string): Promise<{ token: TokenEntryToken; user: User }> {
  if (!secret.startsWith(TOKEN_PREFIX) || secret.length > 100) unauthorized()
  const hash = hashTokenSecret(secret)
  const today = new Date().toISOString().slice(0, 10)
  const cached = cachedToken(hash)
  if (cached) {
    if (cached.token.expiresOn < today) unauthorized()
    return cached
  }
  const row = await useDb()('api_tokens as t')
    .join('users as u', 'u.id', 't.user_id')
    .where('t.secret_hash', hash)
    .whereNull('t.revoked_at')
    .first('t.id', 't.scope', 't.expires_on', 'u.id as user_id', 'u.email', 'u.name', 'u.role', 'u.active')
  if (!row || !row.active || row.expires_on < today) unauthorized()
  const user = { id: row.user_id, email: row.email, name: row.name, role: row.role as Role, active: row.active } as User
  const token = { id: row.id, scope: row.scope, expiresOn: row.expires_on } as TokenEntryToken
  rememberToken(hash, token, user)
  return { token, user }
}
type TokenEntryToken = { id: string; scope: 'read' | 'read-write'; expiresOn: string }

// Last use is written at most once a minute per token and instance, so a busy script does not
// turn every read into a write; the first use from a new address is written (and audited) at once.
const lastWritten = new Map<string, number>()
const knownAddresses = new Set<string>()

/** Records the token's use: the last-use time and, the first time an address is seen, an audit row. */
export async function recordTokenUse(event: H3Event, tokenId: string): Promise<void> {
  const address = clientAddress(event)
  const seenKey = `${tokenId} ${address}`
  const now = Date.now()
  if (knownAddresses.has(seenKey) && now - (lastWritten.get(tokenId) ?? 0) < 60_000) return
  lastWritten.set(tokenId, now)
  const db = useDb()
  if (knownAddresses.has(seenKey)) {
    db('api_tokens').where({ id: tokenId }).update({ last_used_at: db.fn.now(), last_used_address: address }).catch(() => {})
    return
  }
  await db.transaction(async (trx) => {
    const fresh = await trx('api_token_addresses').insert({ token_id: tokenId, address }).onConflict(['token_id', 'address']).ignore().returning('address')
    await trx('api_tokens').where({ id: tokenId }).update({ last_used_at: trx.fn.now(), last_used_address: address })
    if (fresh.length) await writeAudit(trx, event, { action: 'token.used-from-new-address', entityType: 'api_token', entityId: tokenId, after: { address } })
  })
  if (knownAddresses.size > 50_000) knownAddresses.clear()
  knownAddresses.add(seenKey)
}

/** Forgets this instance's memory of a token (on revocation). */
export function forgetTokenUse(tokenId: string): void {
  windows.delete(tokenId)
  lastWritten.delete(tokenId)
}
