import { z } from 'zod'
import { CAN, ROLES, type Capability } from '../auth/roles'
import type { ApiRoute } from './types'

// Builds the OpenAPI 3.1 document from the route contract (shared/api/contract/) and the zod
// schemas the handlers validate with, through zod 4's own JSON Schema output (draft 2020-12, the
// dialect OpenAPI 3.1 uses). Inputs are described as the client sends them (io: 'input').

type Json = Record<string, any>

function schemaOf(s: z.ZodType): Json {
  const out = z.toJSONSchema(s, { target: 'draft-2020-12', io: 'input', unrepresentable: 'any' }) as Json
  delete out.$schema
  return out
}

function rolesOf(route: ApiRoute): string[] {
  if (route.access === 'public') return ['anyone']
  if (route.access === 'signed-in') return [...ROLES]
  return [...(CAN[route.access as Capability] as readonly string[])]
}

const isZod = (x: unknown): x is z.ZodType => typeof x === 'object' && x !== null && '_zod' in x
const ERROR = { $ref: '#/components/schemas/Error' }
const json = (schema: Json) => ({ 'application/json': { schema } })

function errorsOf(route: ApiRoute): Record<string, string> {
  const e: Record<string, string> = {}
  const writes = route.method !== 'GET'
  if (route.query || isZod(route.body)) e['400'] = 'Invalid input: `data.issues` names each field and what it accepts'
  else if (route.body) e['400'] = 'The body cannot be read'
  if (route.access !== 'public') {
    e['401'] = 'Not signed in, or the API token is not valid, has expired or was revoked'
    if (route.access !== 'signed-in' || writes) e['403'] = writes ? 'Your role may not do this, or the API token has scope read' : 'Your role may not do this'
    e['429'] = 'Too many requests with this API token (Retry-After)'
  }
  if (route.params) e['404'] = 'Not found (or not yours to see)'
  return { ...e, ...Object.fromEntries(Object.entries(route.errors ?? {}).map(([k, v]) => [String(k), v])) }
}

function parametersOf(route: ApiRoute): Json[] {
  const out: Json[] = []
  for (const [where, s] of [['path', route.params], ['query', route.query]] as const) {
    if (!s) continue
    const js = schemaOf(s)
    const required = new Set<string>(js.required ?? [])
    for (const [name, prop] of Object.entries<Json>(js.properties ?? {})) {
      const { description, ...schema } = prop
      out.push({ name, in: where, required: where === 'path' || required.has(name), ...(description ? { description } : {}), schema })
    }
  }
  return out
}

function operationOf(route: ApiRoute): Json {
  const roles = rolesOf(route)
  const who = route.access === 'public' ? 'Anyone, without signing in.' : `Roles: ${roles.join(', ')}.`
  const op: Json = {
    operationId: `${route.method.toLowerCase()}${route.path.replace(/^\/api/, '').replace(/[{}]/g, '').replace(/[^A-Za-z0-9]+(.)?/g, (_, c: string | undefined) => (c ? c.toUpperCase() : ''))}`,
    summary: route.summary,
    description: [route.description, who].filter(Boolean).join('\n\n'),
    tags: [route.path.split('/')[2] ?? 'api'],
    'x-roles': roles,
    security: route.access === 'public' ? [] : [{ bearerToken: [] }, { sessionCookie: [] }],
  }
  const parameters = parametersOf(route)
  if (parameters.length) op.parameters = parameters
  if (route.body) {
    op.requestBody = !isZod(route.body)
        ? { required: true, description: route.body.description, content: { [route.body.type]: { schema: route.body.type === 'multipart/form-data' ? { type: 'object', properties: { file: { type: 'string', contentMediaType: 'application/octet-stream' } }, required: ['file'] } : { type: 'string' } } } }
        : { required: true, content: json(schemaOf(route.body)) }
  }
  const a = route.answer
  const type = a.type ?? 'application/json'
  op.responses = {
    [String(a.status ?? 200)]: { description: a.description, content: { [type]: { schema: a.schema ? schemaOf(a.schema) : type === 'application/json' ? { type: 'object' } : { type: 'string', contentMediaType: type } } } },
    ...Object.fromEntries(Object.entries(errorsOf(route)).map(([status, description]) => [status, { description, content: json(ERROR) }])),
  }
  return op
}

/** The OpenAPI 3.1 document of `routes`. */
export function openApiDocument(routes: ApiRoute[], info: { version: string; serverUrl: string }): Json {
  const paths: Json = {}
  for (const r of routes) (paths[r.path] ??= {})[r.method.toLowerCase()] = operationOf(r)
  return {
    openapi: '3.1.0',
    info: {
      title: 'Ionfolio API',
      version: info.version,
      description:
        'Target samples, ion species and certificates of the laboratory. Scripts authenticate with a personal API token from the account page, sent as `Authorization: Bearer <token>` (never in the URL). A `read` token may only GET; a `read-write` token may do what its owner\'s role may. Computed atomic data are estimates: each is given beside its reference value where one exists.',
    },
    servers: [{ url: info.serverUrl }],
    paths,
    components: {
      securitySchemes: {
        bearerToken: { type: 'http', scheme: 'bearer', description: 'A personal API token (ionf_…)' },
        sessionCookie: { type: 'apiKey', in: 'cookie', name: 'ionfolio_session', description: 'The browser session; state-changing requests also need a same-site Origin header' },
      },
      schemas: {
        Error: {
          type: 'object',
          properties: {
            statusCode: { type: 'integer' },
            statusMessage: { type: 'string' },
            message: { type: 'string' },
            data: { type: 'object', properties: { issues: { type: 'array', items: { type: 'object', properties: { path: { type: 'string' }, message: { type: 'string' } } } } } },
          },
          required: ['statusCode', 'message'],
        },
      },
    },
  }
}
