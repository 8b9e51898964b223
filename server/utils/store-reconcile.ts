import type { Knex } from 'knex'
import type { Client } from 'minio'
import { reconcile, type ListedObject, type ObjectReference, type Reconciliation } from '../../shared/storage/reconcile'

// Plain imports and explicit arguments, so `npm run reconcile` runs exactly what the daily task runs.

/** Every row that points into the object store, with its key. */
export async function objectReferences(db: Knex): Promise<ObjectReference[]> {
  const [sheets, certs] = await Promise.all([db('datasheets').select('id', 'object_key'), db('certificates').select('id', 'object_key')])
  return [...sheets.map((r) => ({ key: r.object_key as string, table: 'datasheets', id: String(r.id) })), ...certs.map((r) => ({ key: r.object_key as string, table: 'certificates', id: String(r.id) }))]
}

/** Every object in the bucket. */
export async function listBucket(store: Client, bucket: string): Promise<ListedObject[]> {
  const out: ListedObject[] = []
  for await (const o of store.listObjectsV2(bucket, '', true)) {
    if (o.name) out.push({ key: o.name, size: Number(o.size ?? 0), lastModified: o.lastModified ? new Date(o.lastModified) : null })
  }
  return out
}

/**
 * Compares the bucket with the rows; with `fix`, removes the orphan objects (never a row, never an
 * object some row points at, never one younger than the grace period). Answers what it found and removed.
 */
export async function reconcileStore(db: Knex, store: Client, bucket: string, { fix = false, graceMs = 3_600_000 } = {}): Promise<Reconciliation & { removed: string[] }> {
  // The rows are read after the listing: an upload that finishes in between has its row by then.
  const objects = await listBucket(store, bucket)
  const found = reconcile(objects, await objectReferences(db), { graceMs })
  const removed: string[] = []
  if (fix) {
    for (const o of found.orphans) {
      await store.removeObject(bucket, o.key)
      removed.push(o.key)
    }
  }
  return { ...found, removed }
}
