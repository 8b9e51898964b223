import type { z } from 'zod'
import type { Capability } from '../auth/roles'

// One entry per route file under server/api/ (tests/api/openapi.test.ts checks both ways).
// The zod schemas are the very ones the handler validates with, imported from shared/schemas/.

/** Who may call: a capability of shared/auth/roles.ts, any signed-in person, or anyone. */
export type Access = Capability | 'signed-in' | 'public'

export interface RouteAnswer {
  /** HTTP status of success (200 unless said). */
  status?: number
  description: string
  /** media type; application/json unless said */
  type?: string
  schema?: z.ZodType
}

export interface ApiRoute {
  method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE'
  /** OpenAPI style: /api/samples/{id} */
  path: string
  summary: string
  description?: string
  access: Access
  params?: z.ZodObject
  query?: z.ZodObject
  /** a zod schema (JSON), or another media type described in words */
  body?: z.ZodType | { type: string; description: string }
  answer: RouteAnswer
  /** errors beyond those implied by access and inputs (401/403/400/404), e.g. 409, 429 */
  errors?: Record<number, string>
}

/** Declares a resource's routes, typed. */
export function routes(list: ApiRoute[]): ApiRoute[] {
  return list
}
