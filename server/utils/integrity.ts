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
  let bytes: Buffer | null
  try {
    bytes = await readObject(rec.key, rec.maxBytes)
  } catch (e) {
    const code = (e as { code?: string }).code
    if (code !== 'NoSuchKey' && !(e instanceof Error && /larger than its record/.test(e.message))) throw storeUnavailable(event)
    bytes = null
  }
  const actual = bytes ? createHash('sha256').update(bytes).digest('hex') : null
  if (bytes && actual === rec.sha256) return bytes
  await reportMismatch(event, rec, actual)
  throw createError({
    statusCode: 502,
    statusMessage: 'Bad Gateway',
    message: 'The stored file does not match its record, so it was not served. The lab managers have been told.',
    data: { reason: 'stored-object-mismatch' },
  })
}

/** The audit row (always) and the managers' mail (at most hourly per object; a failure is logged). */
async function reportMismatch(event: H3Event, rec: StoredObjectRecord, actual: string | null): Promise<void> {
  await writeAudit(useDb(), event, {
    action: 'storage.mismatch',
    entityType: rec.entityType,
    entityId: rec.entityId,
    after: { label: rec.label, objectKey: rec.key, sha256OnRecord: rec.sha256, sha256Found: actual },
  })
  const last = alerted.get(rec.key)
  if (last && Date.now() - last < ALERT_EVERY_MS) return
  alerted.set(rec.key, Date.now())
  try {
    const managers = await useDb()('users').where({ role: 'manager', active: true }).orderBy('email').pluck('email')
    if (!managers.length) return
    const what = rec.entityType === 'certificate' ? 'certificate' : 'datasheet'
    await sendMail({ to: managers, ...storeMismatchMail({ what, label: rec.label, key: rec.key, expected: rec.sha256, actual, at: new Date().toISOString() }) })
  } catch (e) {
    alerted.delete(rec.key)
    console.error('Stored-file alert not sent:', e instanceof Error ? e.message : e)
  }
}
