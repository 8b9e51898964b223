import { randomInt } from 'node:crypto'
import { DEMO_PEOPLE } from '../../seeds/01_people'
import { testBaseUrl } from './env'

export type RoleName = (typeof DEMO_PEOPLE)[number]['role']
export const DEMO = Object.fromEntries(DEMO_PEOPLE.map((p) => [p.role, p])) as Record<RoleName, (typeof DEMO_PEOPLE)[number]>

export interface Reply<T = any> {
  status: number
  headers: Headers
  body: T
}

/** A fresh client address from the documentation range 198.51.100.0/24, for the rate limits. */
export function randomAddress(): string {
  return `198.51.${randomInt(0, 255)}.${randomInt(1, 254)}`
}

/** An HTTP client with its own cookie and address, acting like one browser. */
export class Client {
  cookie = ''
  address = randomAddress()

  /** `base`: another app instance than the test run's (tests/support/instance.ts). */
  constructor(readonly base?: string) {}

  async request<T = any>(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<Reply<T>> {
    const base = this.base ?? testBaseUrl()
    const h: Record<string, string> = { 'x-forwarded-for': this.address, origin: base, ...headers }
    if (this.cookie) h.cookie = this.cookie
    let payload: BodyInit | undefined
    if (body instanceof FormData || typeof body === 'string' || body instanceof Uint8Array) payload = body as BodyInit
    else if (body !== undefined) {
      payload = JSON.stringify(body)
      h['content-type'] = 'application/json'
    }
    const res = await fetch(base + path, { method, headers: h, body: payload, redirect: 'manual' })
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';')
      const [name, value] = pair!.split('=')
      if (name === 'ionfolio_session') this.cookie = value ? `${name}=${value}` : ''
    }
    const type = res.headers.get('content-type') ?? ''
    const parsed = type.includes('json') ? await res.json() : type.startsWith('text/') ? await res.text() : Buffer.from(await res.arrayBuffer())
    return { status: res.status, headers: res.headers, body: parsed as T }
  }

  get<T = any>(path: string, headers?: Record<string, string>) {
    return this.request<T>('GET', path, undefined, headers)
  }
  post<T = any>(path: string, body?: unknown, headers?: Record<string, string>) {
    return this.request<T>('POST', path, body, headers)
  }
  patch<T = any>(path: string, body?: unknown) {
    return this.request<T>('PATCH', path, body)
  }
  delete<T = any>(path: string) {
    return this.request<T>('DELETE', path)
  }

  async signIn(email: string, password: string): Promise<Reply> {
    return this.post('/api/auth/sign-in', { email, password })
  }
}

/** A client signed in as the demo person of `role`. */
export async function signedIn(role: RoleName): Promise<Client> {
  const c = new Client()
  const r = await c.signIn(DEMO[role].email, DEMO[role].password)
  if (r.status !== 200) throw new Error(`could not sign in as ${role}: ${r.status} ${JSON.stringify(r.body)}`)
  return c
}

/** Signed-in clients for all four roles and an anonymous one. */
export async function everyone(): Promise<Record<RoleName | 'anonymous', Client>> {
  const [manager, scientist, technician, auditor] = await Promise.all((['manager', 'scientist', 'technician', 'auditor'] as const).map(signedIn))
  return { manager: manager!, scientist: scientist!, technician: technician!, auditor: auditor!, anonymous: new Client() }
}

/** A short unique suffix for names and e-mails made by a test. */
export function unique(): string {
  return `${Date.now().toString(36)}${randomInt(0, 1e6).toString(36)}`
}
