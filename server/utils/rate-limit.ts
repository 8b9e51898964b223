import type { H3Event } from 'h3'

/** Sign-in attempts allowed per account and per address within the window. */
export const SIGN_IN_LIMIT = 5
export const SIGN_IN_WINDOW_MINUTES = 15
/** The first lock-out lasts this long; each further one within a day doubles it, up to the cap. */
export const LOCKOUT_FIRST_SECONDS = 60
export const LOCKOUT_MAX_SECONDS = 15 * 60

export interface SignInTicket {
  keys: string[]
}

const W = `interval '${SIGN_IN_WINDOW_MINUTES} minutes'`

// One statement per key: the row lock ON CONFLICT takes makes the count exact under any number
// of parallel requests. A key under a lock-out is not counted up (the lock answers instead).
const RESERVE = `
insert into sign_in_throttle as t (key, attempts, window_start) values (?, 1, now())
on conflict (key) do update set
  attempts = case when t.locked_until > now() then t.attempts when t.window_start < now() - ${W} then 1 else t.attempts + 1 end,
  window_start = case when t.locked_until > now() then t.window_start when t.window_start < now() - ${W} then now() else t.window_start end,
  lockouts = case when t.last_lockout < now() - interval '1 day' then 0 else t.lockouts end
returning attempts, locked_until, greatest(1, ceil(extract(epoch from (t.locked_until - now()))))::int as wait`

// Exactly one request starts a lock-out: the one that finds the count over the limit and no lock.
// The count starts afresh when the lock ends, so the person gets their attempts back then.
const LOCK = `
update sign_in_throttle set
  locked_until = now() + make_interval(secs => least(?::int * power(2, lockouts)::int, ?::int)),
  lockouts = lockouts + 1, last_lockout = now(), attempts = 0, window_start = now()
where key = ? and attempts > ? and (locked_until is null or locked_until <= now())
returning greatest(1, ceil(extract(epoch from (locked_until - now()))))::int as wait, lockouts`

function tooMany(event: H3Event, wait: number): never {
  setResponseHeader(event, 'Retry-After', wait)
  throw createError({ statusCode: 429, statusMessage: 'Too many attempts', message: 'Too many failed sign-ins; try again later', data: { retryAfterSeconds: wait } })
}

async function reserve(event: H3Event, key: string, email: string): Promise<number | null> {
  const db = useDb()
  const { rows } = await db.raw(RESERVE, [key])
  const r = rows[0] as { attempts: number; locked_until: Date | null; wait: number }
  if (r.locked_until && new Date(r.locked_until).getTime() > Date.now()) return r.wait
  if (r.attempts <= SIGN_IN_LIMIT) return null
  const locked = (await db.raw(LOCK, [LOCKOUT_FIRST_SECONDS, LOCKOUT_MAX_SECONDS, key, SIGN_IN_LIMIT])).rows[0] as { wait: number; lockouts: number } | undefined
  if (locked) {
    const [scope] = key.split(':')
    await writeAudit(db, event, { action: 'auth.locked-out', entityType: 'user', after: { email, scope, seconds: locked.wait, lockouts: locked.lockouts } }, { id: await userIdOf(email), email })
    return locked.wait
  }
  const again = (await db('sign_in_throttle').where({ key }).first('locked_until')) as { locked_until: Date | null } | undefined
  return again?.locked_until ? Math.max(1, Math.ceil((new Date(again.locked_until).getTime() - Date.now()) / 1000)) : LOCKOUT_FIRST_SECONDS
}

async function userIdOf(email: string): Promise<string | null> {
  return ((await useDb()('users').whereRaw('lower(email) = ?', [email]).first('id')) as { id: string } | undefined)?.id ?? null
}

/**
 * Counts this attempt against the address and the account before the password is checked, and
 * refuses with 429 and Retry-After when either is over SIGN_IN_LIMIT in the window or locked out.
 * Lock-outs grow (1, 2, 4, 8, 15 minutes) and never last longer than LOCKOUT_MAX_SECONDS, and a
 * password reset lifts the account's lock: someone elsewhere cannot shut a person out for good.
 * Each refusal and each lock-out is an audit row.
 */
export async function reserveSignIn(event: H3Event, email: string): Promise<SignInTicket> {
  const keys = [`address:${clientAddress(event)}`, `account:${email}`]
  const taken: string[] = []
  for (const key of keys) {
    const wait = await reserve(event, key, email)
    if (wait !== null) {
      await releaseSignIn({ keys: taken })
      await writeAudit(useDb(), event, { action: 'auth.sign-in-refused', entityType: 'user', after: { email, limit: key.split(':')[0] } }, { id: await userIdOf(email), email })
      tooMany(event, wait)
    }
    taken.push(key)
  }
  return { keys: taken }
}

/** Gives back the attempts a successful sign-in reserved: only failures count. */
export async function releaseSignIn(ticket: SignInTicket): Promise<void> {
  if (!ticket.keys.length) return
  await useDb()('sign_in_throttle').whereIn('key', ticket.keys).where('attempts', '>', 0).decrement('attempts', 1)
}

/** Records one failed sign-in (kept for good: the history is never deleted) and its audit row. */
export async function recordSignInFailure(event: H3Event, email: string, userId: string | null): Promise<void> {
  const db = useDb()
  await db.transaction(async (trx) => {
    await trx('sign_in_failures').insert({ email, address: clientAddress(event) })
    await writeAudit(trx, event, { action: 'auth.sign-in-failed', entityType: 'user', entityId: userId, after: { email } }, { id: userId, email })
  })
}

/** Lifts an account's lock-out and count (after the person proved who they are by a reset link). */
export async function clearAccountLock(email: string): Promise<void> {
  await useDb()('sign_in_throttle').where({ key: `account:${email}` }).update({ attempts: 0, locked_until: null, window_start: useDb().fn.now() })
}
