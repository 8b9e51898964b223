import type { H3Event } from 'h3'
import type { z } from 'zod'
import { findBadText } from '#shared/schemas/common'

function invalid(error: z.ZodError): never {
  throw createError({
    statusCode: 400,
    statusMessage: 'Invalid input',
    message: 'Invalid input',
    data: { issues: error.issues.map((i) => ({ path: i.path.join('.'), message: i.message })) },
  })
}

function check<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const bad = findBadText(value)
  if (bad) throw createError({ statusCode: 400, statusMessage: 'Invalid input', message: 'Invalid input', data: { issues: [bad] } })
  const parsed = schema.safeParse(value)
  if (!parsed.success) invalid(parsed.error)
  return parsed.data
}

/** The JSON body, parsed by `schema`; a malformed body or bad field is a 400 with `data.issues`. */
export async function readValid<S extends z.ZodType>(event: H3Event, schema: S): Promise<z.output<S>> {
  let body: unknown
  try {
    body = await readBody(event)
  } catch (e) {
    if ((e as { statusCode?: number }).statusCode === 413) throw e
    throw createError({ statusCode: 400, statusMessage: 'Malformed body', message: 'The request body is not valid JSON' })
  }
  return check(schema, body ?? {})
}

/** The query string, parsed by `schema`. */
export function queryValid<S extends z.ZodType>(event: H3Event, schema: S): z.output<S> {
  return check(schema, getQuery(event))
}

/** The route params, parsed by `schema`; a param that cannot name anything is a 404. */
export function paramsValid<S extends z.ZodType>(event: H3Event, schema: S): z.output<S> {
  const parsed = schema.safeParse(getRouterParams(event, { decode: true }))
  if (!parsed.success) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'Not found' })
  return parsed.data
}
