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
