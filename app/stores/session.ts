import { defineStore } from 'pinia'
import type { Role } from '#shared/auth/roles'

export interface SessionUser {
  id: string
  email: string
  name: string
  role: Role
}

/** The signed-in person, shared by the layout, the route guard and the pages. */
export const useSessionStore = defineStore('session', () => {
  const user = ref<SessionUser | null>(null)
  const loaded = ref(false)

  /** Reloads the person from the server; `fetcher` forwards the cookie during server rendering. */
  async function refresh(fetcher: typeof $fetch = $fetch) {
    try {
      user.value = await fetcher<SessionUser>('/api/auth/me')
    } catch {
      user.value = null
    }
    loaded.value = true
  }

  async function signIn(email: string, password: string) {
    user.value = await $fetch<SessionUser>('/api/auth/sign-in', { method: 'POST', body: { email, password } })
    loaded.value = true
  }

  async function signOut() {
    await $fetch('/api/auth/sign-out', { method: 'POST' })
    user.value = null
  }

  function setUser(u: SessionUser | null) {
    user.value = u
    loaded.value = true
  }

  return { user, loaded, refresh, signIn, signOut, setUser }
})
