import { Lucia, TimeSpan, type Session, type User } from 'lucia'
import { NodePostgresAdapter } from '@lucia-auth/adapter-postgresql'
import pg from 'pg'
import type { Role } from '#shared/auth/roles'

/** How long a session lasts after its last use. */
export const SESSION_HOURS = 12

let pool: pg.Pool | null = null
let lucia: Lucia<Record<never, never>, DatabaseUserAttributes> | null = null

interface DatabaseUserAttributes {
  email: string
  name: string
  role: Role
  active: boolean
}

function cookieSecure(): boolean {
  const config = useRuntimeConfig()
  const explicit = String(config.cookieSecure ?? '')
  if (explicit === 'true') return true
  if (explicit === 'false') return false
  return String(config.public.baseUrl).startsWith('https://')
}

/** Lucia, on its own small pg pool, storing sessions in PostgreSQL so app servers stay stateless. */
export function useLucia() {
  if (!lucia) {
    const config = useRuntimeConfig()
    pool = new pg.Pool({ connectionString: config.databaseUrl, max: 4, connectionTimeoutMillis: 5_000 })
    pool.on('error', () => {
      // an idle client lost its server (database restart); the pool replaces it on next use
    })
    lucia = new Lucia(new NodePostgresAdapter(pool, { user: 'users', session: 'sessions' }), {
      // A session lasts 12 hours from its last use (Lucia extends it past half-time), and its
      // cookie carries the same expiry, so the browser forgets it when the server does.
      sessionExpiresIn: new TimeSpan(SESSION_HOURS, 'h'),
      sessionCookie: {
        name: 'ionfolio_session',
        expires: true,
        attributes: { secure: cookieSecure(), sameSite: 'lax' },
      },
      getUserAttributes: (a) => ({ email: a.email, name: a.name, role: a.role, active: a.active }),
    })
  }
  return lucia
}

/** Closes Lucia's pool (Nitro's close hook). */
export async function closeLucia(): Promise<void> {
  if (pool) {
    const p = pool
    pool = null
    lucia = null
    await p.end()
  }
}

declare module 'lucia' {
  interface Register {
    Lucia: ReturnType<typeof useLucia>
    DatabaseUserAttributes: DatabaseUserAttributes
  }
}

declare module 'h3' {
  interface H3EventContext {
    user: User | null
    session: Session | null
    /** The API token the request came with (null for a cookie session or nobody). */
    token: { id: string; scope: 'read' | 'read-write'; expiresOn: string } | null
  }
}
