import type { H3Event } from 'h3'
import type { User } from 'lucia'
import type { Role } from '#shared/auth/roles'

const READS = new Set(['GET', 'HEAD'])

/**
 * The signed-in person (by session or API token), or a 401. A `read` token narrows its owner's
 * role to reading: anything but GET/HEAD is a 403 here, so every route that starts with
 * requireUser/requireRole enforces the scope without a line of its own.
 */
export function requireUser(event: H3Event): User {
  const user = event.context.user
  if (!user) throw createError({ statusCode: 401, statusMessage: 'Unauthorized', message: 'Sign in first' })
  const token = event.context.token
  if (token && token.scope !== 'read-write' && !READS.has(event.method)) {
    throw createError({ statusCode: 403, statusMessage: 'Forbidden', message: 'This API token may only read (scope read)', data: { scope: token.scope } })
  }
  return user
}

/** Like requireUser, but refuses API tokens: for what a token must not do to itself (minting tokens). */
export function requireSession(event: H3Event): User {
  const user = requireUser(event)
  if (event.context.token) throw createError({ statusCode: 403, statusMessage: 'Forbidden', message: 'Creating API tokens needs a signed-in session, not a token' })
  return user
}

/**
 * The signed-in person if they hold one of `roles`: 401 when signed out, 403 when the role may
 * not do this. Every API route starts with it (or with requireUser for "any signed-in role").
 */
export function requireRole(event: H3Event, ...roles: readonly Role[]): User {
  const user = requireUser(event)
  if (!roles.includes(user.role)) throw createError({ statusCode: 403, statusMessage: 'Forbidden', message: 'Your role may not do this' })
  return user
}
