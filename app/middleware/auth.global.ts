import { can, type Capability } from '#shared/auth/roles'

// A convenience only: the server checks every request itself. This keeps signed-out people on
// the sign-in page and tells a role plainly when a page is not theirs.
export default defineNuxtRouteMiddleware(async (to) => {
  const session = useSessionStore()
  if (!session.loaded) await session.refresh(useRequestFetch() as typeof $fetch)
  if (to.meta.public) return
  if (!session.user) {
    return navigateTo({ path: '/sign-in', query: to.fullPath !== '/' ? { next: to.fullPath } : {} })
  }
  const capability = to.meta.capability as Capability | undefined
  if (capability && !can(session.user.role, capability)) {
    throw createError({ statusCode: 403, statusMessage: 'This page is not part of your role', fatal: true })
  }
})
