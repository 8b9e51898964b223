import { CAN, can } from '#shared/auth/roles'

interface Listed {
  id: string
  name: string
  scope: 'read' | 'read-write'
  prefix: string
  expires_on: string
  created_at: Date
  last_used_at: Date | null
  last_used_address: string | null
  revoked_at: Date | null
  owner_id: string
  owner_name: string
  owner_email: string
}

// Your own tokens; a lab manager sees every person's, with the owner named. Never the secret.
export default defineEventHandler(async (event) => {
  const me = requireRole(event, ...CAN.useTokens)
  const all = can(me.role, 'manageAllTokens')
  const rows: Listed[] = await useDb()('api_tokens as t')
    .join('users as u', 'u.id', 't.user_id')
    .modify((q) => {
      if (!all) q.where('t.user_id', me.id)
    })
    .orderBy([{ column: 't.revoked_at', order: 'desc', nulls: 'first' }, { column: 't.created_at', order: 'desc' }])
    .select('t.id', 't.name', 't.scope', 't.prefix', 't.expires_on', 't.created_at', 't.last_used_at', 't.last_used_address', 't.revoked_at', 'u.id as owner_id', 'u.name as owner_name', 'u.email as owner_email')
  return {
    items: rows.map((r) => ({
      id: r.id,
      name: r.name,
      scope: r.scope,
      prefix: r.prefix,
      expiresOn: r.expires_on,
      createdAt: r.created_at,
      lastUsedAt: r.last_used_at,
      lastUsedAddress: r.last_used_address,
      revokedAt: r.revoked_at,
      owner: { id: r.owner_id, name: r.owner_name, email: r.owner_email },
    })),
  }
})
