import { z } from 'zod'
import { IdParam } from '../../schemas/common'
import { CreateTokenBody, TOKEN_SCOPES } from '../../schemas/tokens'
import { routes } from '../types'

const Token = z.object({
  id: z.uuid(),
  name: z.string(),
  scope: z.enum(TOKEN_SCOPES),
  prefix: z.string().describe('The first characters of the secret, to tell tokens apart'),
  expiresOn: z.iso.date(),
  createdAt: z.iso.datetime(),
  lastUsedAt: z.iso.datetime().nullable(),
  lastUsedAddress: z.string().nullable(),
  revokedAt: z.iso.datetime().nullable(),
  owner: z.object({ id: z.string(), name: z.string(), email: z.string() }),
})

export default routes([
  { method: 'GET', path: '/api/tokens', summary: 'API tokens: your own, or everyone\'s for a lab manager', access: 'useTokens', answer: { description: 'The tokens, never their secrets', schema: z.object({ items: z.array(Token) }) } },
  {
    method: 'POST',
    path: '/api/tokens',
    summary: 'Create a personal API token',
    description: 'Needs a signed-in session (a token cannot create tokens). The secret is in this answer only; send it as `Authorization: Bearer <secret>`.',
    access: 'useTokens',
    body: CreateTokenBody,
    answer: { status: 201, description: 'The token with its secret, shown this once', schema: Token.omit({ lastUsedAt: true, lastUsedAddress: true, revokedAt: true, owner: true }).extend({ secret: z.string() }) },
  },
  { method: 'DELETE', path: '/api/tokens/{id}', summary: 'Revoke a token at once', description: 'Your own, or anyone\'s for a lab manager.', access: 'useTokens', params: IdParam, answer: { description: 'id and revokedAt', schema: z.object({ id: z.uuid(), revokedAt: z.iso.datetime() }) } },
])
