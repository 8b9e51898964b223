import { CAN } from '#shared/auth/roles'
import { CreateTokenBody } from '#shared/schemas/tokens'

// Creates a personal API token. Its secret is in this answer only; the database keeps its hash.
// A token cannot mint tokens (requireSession): a leaked one cannot outlive its own expiry.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.useTokens)
  const me = requireSession(event)
  const body = await readValid(event, CreateTokenBody)
  const secret = newTokenSecret()
  const row = await useDb().transaction(async (trx) => {
    const [created] = await trx('api_tokens')
      .insert({ user_id: me.id, name: body.name, scope: body.scope, expires_on: body.expiresOn, secret_hash: hashTokenSecret(secret), prefix: secret.slice(0, TOKEN_PREFIX.length + 6) })
      .returning(['id', 'name', 'scope', 'prefix', 'expires_on', 'created_at'])
    await writeAudit(trx, event, { action: 'token.created', entityType: 'api_token', entityId: created!.id, after: { name: body.name, scope: body.scope, expiresOn: body.expiresOn } })
    return created!
  })
  setResponseStatus(event, 201)
  return { id: row.id, name: row.name, scope: row.scope, prefix: row.prefix, expiresOn: row.expires_on, createdAt: row.created_at, secret }
})
