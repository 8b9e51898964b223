import { createHash } from 'node:crypto'
import type { H3Event } from 'h3'

export interface StoredObjectRecord {
  entityType: 'certificate' | 'datasheet'
  entityId: string
  /** How people name it: a certificate number, a datasheet's file name. */
  label: string
  key: string
  sha256: string
  maxBytes: number
}

/** What the store held instead of the recorded bytes. */
type Found = { sha256: string } | { missing: true } | { oversized: true }

// One alert mail per object and hour: a page reloaded twenty times is one incident, not twenty mails.
const ALERT_EVERY_MS = 3_600_000
const alerted = new Map<string, number>()

/**
 * The stored bytes of a record, read whole and checked against the SHA-256 the record holds
 * before anything is sent. A mismatch (or a missing object) is written to the audit trail, mailed
 * to the managers and answered 502: the app never streams bytes it cannot vouch for. A silent or
 * unreachable store is a 503.
 */
export async function readVerified(event: H3Event, rec: StoredObjectRecord): Promise<Buffer> {
  let bytes: Buffer | null = null
  let found: Found
  try {
    bytes = await readObject(rec.key, rec.maxBytes)
    found = { sha256: createHash('sha256').update(bytes).digest('hex') }
  } catch (e) {
    if ((e as { code?: string }).code === 'NoSuchKey') found = { missing: true }
    else if (e instanceof ObjectTooLargeError) found = { oversized: true }
    else throw storeUnavailable(event)
  }
  if (bytes && 'sha256' in found && found.sha256 === rec.sha256) return bytes
  await reportMismatch(event, rec, found)
  throw createError({
    statusCode: 502,
    statusMessage: 'Bad Gateway',
    message: 'The stored file does not match its record, so it was not served. The lab managers have been told.',
    data: { reason: 'stored-object-mismatch' },
  })
}

/** The audit row (always) and the managers' mail (at most hourly per object; a failure is logged). */
async function reportMismatch(event: H3Event, rec: StoredObjectRecord, found: Found): Promise<void> {
  const actual = 'sha256' in found ? found.sha256 : null
  const finding = 'missing' in found ? 'The store no longer has the object at all.' : 'oversized' in found ? 'The object in the store is larger than the recorded file.' : `SHA-256 now found in the store: ${actual}`
  await writeAudit(useDb(), event, {
    action: 'storage.mismatch',
    entityType: rec.entityType,
    entityId: rec.entityId,
    after: { label: rec.label, objectKey: rec.key, sha256OnRecord: rec.sha256, sha256Found: actual, missing: 'missing' in found, oversized: 'oversized' in found },
  })
  const last = alerted.get(rec.key)
  if (last && Date.now() - last < ALERT_EVERY_MS) return
  alerted.set(rec.key, Date.now())
  try {
    const managers = await useDb()('users').where({ role: 'manager', active: true }).orderBy('email').pluck('email')
    if (!managers.length) return
    const what = rec.entityType === 'certificate' ? 'certificate' : 'datasheet'
    await sendMail({ to: managers, ...storeMismatchMail({ what, label: rec.label, key: rec.key, expected: rec.sha256, finding, at: new Date().toISOString() }) })
  } catch (e) {
    alerted.delete(rec.key)
    console.error('Stored-file alert not sent:', e instanceof Error ? e.message : e)
  }
}
