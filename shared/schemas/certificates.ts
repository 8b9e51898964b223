import { z } from 'zod'
import { ListQuery } from './common'
import { CERTIFICATE_STATUSES, SUBJECT_TYPES } from '../certificates/payload'

const emptyAsUndefined = (v: unknown) => (v === '' ? undefined : v)

/** POST /api/certificates: what to certify. For a species, the newest recorded result is certified. */
export const IssueCertificateBody = z.strictObject({
  subjectType: z.enum(SUBJECT_TYPES, { error: 'The subject type is sample or species' }),
  subjectId: z.uuid({ error: 'Not a valid id' }),
})

const reason = (what: string) =>
  z.string({ error: `Give the reason for ${what}` }).trim().min(3, `Give the reason for ${what} (at least 3 characters)`).max(1000, 'Use at most 1000 characters')

/** POST /api/certificates/:id/supersede: a corrected version, and why. */
export const SupersedeBody = z.strictObject({ reason: reason('the correction') })

/** POST /api/certificates/:id/revoke. */
export const RevokeBody = z.strictObject({ reason: reason('revoking') })

export const CERTIFICATE_SORTS = ['number', 'issuedAt', 'status', 'subject', 'version', 'validUntil'] as const

const isoDay = z.preprocess(emptyAsUndefined, z.iso.date({ error: 'Enter a date as YYYY-MM-DD' }).optional())

/** GET /api/certificates: search, filters, sort, paging. */
export const CertificateListQuery = ListQuery.extend({
  sort: z.preprocess(emptyAsUndefined, z.string().regex(new RegExp(`^-?(${CERTIFICATE_SORTS.join('|')})$`), `Sort by one of: ${CERTIFICATE_SORTS.join(', ')} (prefix - for descending)`).optional()),
  status: z.preprocess(emptyAsUndefined, z.enum(CERTIFICATE_STATUSES, { error: `The status is one of: ${CERTIFICATE_STATUSES.join(', ')}` }).optional()),
  subjectType: z.preprocess(emptyAsUndefined, z.enum(SUBJECT_TYPES, { error: 'The subject type is sample or species' }).optional()),
  subjectId: z.preprocess(emptyAsUndefined, z.uuid({ error: 'Not a valid id' }).optional()),
  from: isoDay,
  to: isoDay,
})

/** GET /api/certificates/zip: the certificates issued from `from` to `to`, both days included. */
export const CertificateZipQuery = z
  .object({ from: isoDay, to: isoDay, status: z.preprocess(emptyAsUndefined, z.enum(CERTIFICATE_STATUSES).optional()) })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'The period ends before it starts', path: ['to'] })

// GET /api/public/verify/:number. Malformed input is not an error there: it simply names no
// certificate we issued.
export const VerifyParams = z.object({ number: z.string().max(40).catch('') })
export const VerifyQuery = z.object({ digest: z.string().max(128).optional().catch(undefined) })
