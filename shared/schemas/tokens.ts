import { z } from 'zod'

/** What a token may do: `read` (GET and HEAD only) or `read-write` (whatever its owner's role may). */
export const TOKEN_SCOPES = ['read', 'read-write'] as const
export type TokenScope = (typeof TOKEN_SCOPES)[number]

/** A token lives at most this many days. */
export const TOKEN_MAX_DAYS = 365

function isoDay(d: Date): string {
  return d.toISOString().slice(0, 10)
}

/** The latest expiry a token created on `today` may have. */
export function latestExpiry(today = new Date()): string {
  return isoDay(new Date(today.getTime() + TOKEN_MAX_DAYS * 86_400_000))
}

export const CreateTokenBody = z.object({
  name: z.string().trim().min(1, 'Enter a name').max(80, 'Use at most 80 characters'),
  scope: z.enum(TOKEN_SCOPES, { message: 'Scope must be read or read-write' }),
  expiresOn: z.iso
    .date({ message: 'Give the expiry as YYYY-MM-DD' })
    .refine((d) => d > isoDay(new Date()), 'The expiry must be after today')
    .refine((d) => d <= latestExpiry(), `The expiry must be at most ${TOKEN_MAX_DAYS} days from today`),
})
export type CreateTokenBody = z.infer<typeof CreateTokenBody>
