import { z } from 'zod'

export const IdParam = z.object({ id: z.uuid({ message: 'Not a valid id' }) })
export const TextIdParam = z.object({ id: z.string().min(1).max(100) })

/** Paging and sorting shared by every list route: `q`, `sort`, `page`, `pageSize`. */
export const ListQuery = z.object({
  q: z.string().trim().max(200).optional(),
  sort: z.string().max(60).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
})

// A year 0000 in an ISO date: PostgreSQL has no year 0, and most software misreads it.
const YEAR_ZERO = /(^|[^0-9])0000-[0-9]{2}-[0-9]{2}/

/** What is wrong with one text, or null: a NUL character, or a date in the year 0000. */
export function badTextProblem(text: string): string | null {
  if (text.includes('\u0000')) return 'Text may not contain the NUL character'
  if (YEAR_ZERO.test(text)) return 'There is no year 0000; give a date from year 0001 on'
  return null
}

/**
 * The first NUL character or year-0000 date anywhere in a parsed body or query (keys included),
 * with the path to it ("components.0.notes"), or null. Every route's input passes through this
 * before its schema (server/utils/validation.ts), so no schema can forget it.
 */
export function findBadText(value: unknown, path: (string | number)[] = [], depth = 0): { path: string; message: string } | null {
  if (depth > 20) return null
  if (typeof value === 'string') {
    const message = badTextProblem(value)
    return message ? { path: path.join('.'), message } : null
  }
  if (Array.isArray(value)) {
    for (const [i, v] of value.entries()) {
      const found = findBadText(v, [...path, i], depth + 1)
      if (found) return found
    }
    return null
  }
  if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      const keyProblem = badTextProblem(k)
      if (keyProblem) return { path: [...path, k.replace(/\u0000/g, '\\0')].join('.'), message: keyProblem }
      const found = findBadText(v, [...path, k], depth + 1)
      if (found) return found
    }
  }
  return null
}
