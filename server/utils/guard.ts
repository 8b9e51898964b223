import type { H3Event } from 'h3'
import type { User } from 'lucia'
import type { Role } from '#shared/auth/roles'

/** The signed-in person, or a 401. */
export function requireUser(event: H3Event): User {
  const user = event.context.user
  if (!user) throw createError({ statusCode: 401, statusMessage: 'Unauthorized', message: 'Sign in first' })
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
