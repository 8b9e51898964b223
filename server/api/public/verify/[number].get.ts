import { timingSafeEqual } from 'node:crypto'
import { VerifyParams as Params, VerifyQuery as Query } from '#shared/schemas/certificates'
import { CERTIFICATE_NUMBER_PATTERN, DIGEST_PATTERN } from '#shared/certificates/canonical'
import { certifiedSummary } from '#shared/certificates/summary'

// Malformed input is not an error here: it simply names no certificate we issued.

const ANSWER = { issued: 'genuine', superseded: 'superseded', revoked: 'revoked' } as const
const DUMMY = Buffer.alloc(32)

// Public: is this certificate, with this digest, ours — and is it still current? Without the
// matching digest every number is "unknown" and nothing else is said, so the route tells nothing
// to someone who has not seen the certificate. With it, the answer adds what the certificate
// certifies (from the frozen payload) and the SHA-256 of the issued PDF, so the holder can compare
// the paper's values and the file's bytes (hashed in the browser; the file is never uploaded):
// neither tells more than the certificate itself does, and guessing a 256-bit
// digest is hopeless; the per-address limit only keeps the route from being used to load the
// database.
export default defineEventHandler(async (event) => {
  assertVerifyAllowed(event)
  setResponseHeader(event, 'Cache-Control', 'no-store')
  const { number } = paramsValid(event, Params)
  const digest = (queryValid(event, Query).digest ?? '').trim().toLowerCase()
  const row = CERTIFICATE_NUMBER_PATTERN.test(number) ? await useDb()('certificates').where({ number }).first('status', 'sha256', 'pdf_sha256', 'payload') : undefined
  const given = DIGEST_PATTERN.test(digest) ? Buffer.from(digest, 'hex') : DUMMY
  const stored = row ? Buffer.from(row.sha256, 'hex') : DUMMY
  // Compared in constant time even when there is nothing to compare with.
  const matches = timingSafeEqual(given, stored) && given !== DUMMY && !!row
  if (!matches) return { status: 'unknown' as const }
  return { status: ANSWER[row!.status], certified: certifiedSummary(row!.payload), pdfSha256: row!.pdf_sha256 }
})
