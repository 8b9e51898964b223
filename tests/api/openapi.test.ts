import { describe, it, expect, beforeAll } from 'vitest'
import { readdirSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { Validator } from '@seriousme/openapi-schema-validator'
import { Client } from '../support/api'

// The served description must be valid OpenAPI 3.1 (checked with @seriousme/openapi-schema-validator,
// which validates against the OpenAPI Initiative's published JSON schemas) and name exactly the
// route files under server/api/.
const API_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../server/api')
// The catch-all that answers a JSON 404 for unknown /api paths: not a route of its own.
const NOT_ROUTES = new Set(['[...path].ts'])

function routeFiles(dir = API_DIR): Array<{ file: string; method: string; path: string }> {
  const out: Array<{ file: string; method: string; path: string }> = []
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name)
    if (entry.isDirectory()) out.push(...routeFiles(full))
    else if (entry.name.endsWith('.ts') && !NOT_ROUTES.has(path.relative(API_DIR, full))) {
      const rel = path.relative(API_DIR, full).replace(/\.ts$/, '')
      const m = /^(.*)\.(get|post|patch|put|delete)$/.exec(rel)
      if (!m) throw new Error(`server/api/${rel}.ts has no method in its name (e.g. .get.ts)`)
      const route = `/api/${m[1]!}`.replace(/\/index$/, '').replace(/\[([^\]]+)\]/g, '{$1}')
      out.push({ file: `server/api/${rel}.ts`, method: m[2]!.toUpperCase(), path: route })
    }
  }
  return out
}

let doc: any
beforeAll(async () => {
  const r = await new Client().get('/api/openapi.json')
  expect(r.status).toBe(200)
  doc = r.body
})

describe('GET /api/openapi.json', () => {
  it('is a valid OpenAPI 3.1 document', async () => {
    expect(doc.openapi).toBe('3.1.0')
    const result = await new Validator().validate(doc)
    expect(result.errors ?? [], JSON.stringify(result.errors)).toEqual([])
    expect(result.valid).toBe(true)
  })

  it('describes every route file under server/api/, and nothing else', () => {
    const files = routeFiles()
    const described = new Set(Object.entries<any>(doc.paths).flatMap(([p, ops]) => Object.keys(ops).map((m) => `${m.toUpperCase()} ${p}`)))
    const missing = files.filter((f) => !described.has(`${f.method} ${f.path}`)).map((f) => `${f.method} ${f.path} (${f.file}): add it to shared/api/contract/`)
    expect(missing, `routes without a description:\n${missing.join('\n')}`).toEqual([])
    const onDisk = new Set(files.map((f) => `${f.method} ${f.path}`))
    const extra = [...described].filter((d) => !onDisk.has(d))
    expect(extra, `described but no route file:\n${extra.join('\n')}`).toEqual([])
  })

  it('gives each route its roles, inputs and errors', () => {
    const post = doc.paths['/api/tokens'].post
    expect(post.requestBody.content['application/json'].schema.properties.scope.enum).toEqual(['read', 'read-write'])
    expect(Object.keys(post.responses)).toEqual(expect.arrayContaining(['201', '400', '401', '429']))
    const create = doc.paths['/api/samples'].post
    expect(create['x-roles']).toEqual(['manager'])
    expect(create.responses['403'].description).toMatch(/scope read/)
    const byId = doc.paths['/api/samples/{id}'].get
    expect(byId.parameters).toEqual([expect.objectContaining({ name: 'id', in: 'path', required: true })])
    expect(byId.responses['404']).toBeDefined()
    const lookup = doc.paths['/api/species/lookup'].get
    expect(lookup.parameters.some((p: any) => p.in === 'query')).toBe(true)
    expect(doc.paths['/api/public/verify/{number}'].get.security).toEqual([])
    expect(doc.components.securitySchemes.bearerToken.scheme).toBe('bearer')
  })
})
