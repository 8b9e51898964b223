import { testBaseUrl } from './env'
import { randomAddress, type Client } from './api'

/** A token made by `owner` through the API; answers its id and secret. */
export async function createToken(owner: Client, scope: 'read' | 'read-write', name = 'test token', days = 30): Promise<{ id: string; secret: string }> {
  const expiresOn = new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10)
  const r = await owner.post('/api/tokens', { name, scope, expiresOn })
  if (r.status !== 201) throw new Error(`could not create a token: ${r.status} ${JSON.stringify(r.body)}`)
  return { id: r.body.id, secret: r.body.secret }
}

/** A request with `Authorization: Bearer`, no cookie and no Origin header, as a script sends it. */
export async function bearer(secret: string, method: string, path: string, body?: unknown, address = randomAddress()): Promise<{ status: number; body: any; headers: Headers }> {
  const headers: Record<string, string> = { authorization: `Bearer ${secret}`, 'x-forwarded-for': address }
  if (body !== undefined) headers['content-type'] = 'application/json'
  const res = await fetch(testBaseUrl() + path, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) })
  const type = res.headers.get('content-type') ?? ''
  return { status: res.status, headers: res.headers, body: type.includes('json') ? await res.json() : Buffer.from(await res.arrayBuffer()) }
}
