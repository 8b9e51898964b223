import pg from 'pg'
import type { Session, User } from 'lucia'

// Validating a session is a database round trip on every request, and under load it is most of a
// request's cost. Validated sessions are kept here for a short while. The cache is only a copy:
// every change that must end or alter a session (sign-out, deactivation, a role change) is
// announced through PostgreSQL NOTIFY, and every app instance LISTENs and forgets the affected
// entries at once. While the listening connection is down the cache is not used at all, so an
// announcement can never be missed.

const TTL_MS = 30_000
const MAX_ENTRIES = 20_000
const CHANNEL = 'ionfolio_session_events'

interface Entry {
  session: Session
  user: User
  until: number
}

const entries = new Map<string, Entry>()

/** A validated API token: its owner, scope and expiry (tokens share the announcements and the TTL). */
export interface TokenEntry {
  token: { id: string; scope: 'read' | 'read-write'; expiresOn: string }
  user: User
  until: number
}
const tokens = new Map<string, TokenEntry>()
let listening = false
let client: pg.Client | null = null
let stopped = false

/** A still-valid cached session, or null (also whenever the cache cannot be trusted). */
export function cachedSession(id: string): Entry | null {
  if (!listening) return null
  const hit = entries.get(id)
  if (!hit) return null
  if (hit.until <= Date.now()) {
    entries.delete(id)
    return null
  }
  return hit
}

/** Keeps a freshly validated session for a short while. */
export function rememberSession(session: Session, user: User): void {
  if (!listening) return
  if (entries.size >= MAX_ENTRIES) entries.delete(entries.keys().next().value!)
  entries.set(session.id, { session: { ...session, fresh: false }, user, until: Math.min(Date.now() + TTL_MS, session.expiresAt.getTime()) })
}

/** A still-valid cached token by the hash of its secret, or null. */
export function cachedToken(hash: string): TokenEntry | null {
  if (!listening) return null
  const hit = tokens.get(hash)
  if (!hit) return null
  if (hit.until <= Date.now()) {
    tokens.delete(hash)
    return null
  }
  return hit
}

/** Keeps a freshly validated token for a short while. */
export function rememberToken(hash: string, token: TokenEntry['token'], user: User): void {
  if (!listening) return
  if (tokens.size >= MAX_ENTRIES) tokens.delete(tokens.keys().next().value!)
  tokens.set(hash, { token, user, until: Date.now() + TTL_MS })
}

function forget(payload: string): void {
  if (payload.startsWith('s:')) entries.delete(payload.slice(2))
  else if (payload.startsWith('t:')) {
    const tokenId = payload.slice(2)
    for (const [hash, e] of tokens) if (e.token.id === tokenId) tokens.delete(hash)
  } else if (payload.startsWith('u:')) {
    const userId = payload.slice(2)
    for (const [id, e] of entries) if (e.user.id === userId) entries.delete(id)
    for (const [hash, e] of tokens) if (e.user.id === userId) tokens.delete(hash)
  } else {
    entries.clear()
    tokens.clear()
  }
}

/** SQL that announces a session's end; run it inside the transaction that ends the session. */
export function sessionEndedNotice(sessionId: string): [string, string[]] {
  return ['select pg_notify(?, ?)', [CHANNEL, `s:${sessionId}`]]
}

/** SQL that announces a change to a person (role, deactivation); run it inside the same transaction. */
export function userChangedNotice(userId: string): [string, string[]] {
  return ['select pg_notify(?, ?)', [CHANNEL, `u:${userId}`]]
}

/** SQL that announces a token's revocation; run it inside the revoking transaction. */
export function tokenRevokedNotice(tokenId: string): [string, string[]] {
  return ['select pg_notify(?, ?)', [CHANNEL, `t:${tokenId}`]]
}

/** Forgets locally at once (the NOTIFY reaches the other instances, and this one again). */
export function forgetLocally(kind: 's' | 'u' | 't', id: string): void {
  forget(`${kind}:${id}`)
}

/** Opens the listening connection and keeps it open, reconnecting after failures (Nitro plugin). */
export async function listenForSessionEvents(connectionString: string): Promise<void> {
  stopped = false
  const connect = async (): Promise<void> => {
    if (stopped) return
    const c = new pg.Client({ connectionString, connectionTimeoutMillis: 5_000 })
    const lost = () => {
      if (client !== c) return
      listening = false
      entries.clear()
      tokens.clear()
      client = null
      c.end().catch(() => {})
      if (!stopped) setTimeout(connect, 1_000)
    }
    c.on('error', lost)
    c.on('end', lost)
    c.on('notification', (n) => forget(n.payload ?? ''))
    try {
      await c.connect()
      await c.query(`listen ${CHANNEL}`)
      client = c
      entries.clear()
      tokens.clear()
      listening = true
    } catch {
      c.end().catch(() => {})
      if (!stopped) setTimeout(connect, 1_000)
    }
  }
  await connect()
}

/** Closes the listening connection (Nitro's close hook). */
export async function stopSessionEvents(): Promise<void> {
  stopped = true
  listening = false
  entries.clear()
  tokens.clear()
  const c = client
  client = null
  await c?.end().catch(() => {})
}
