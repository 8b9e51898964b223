// Comparing the object store with the rows that point into it. Pure: the lists come in, the
// differences go out; the server task and `npm run reconcile` feed it from the store and the database.

export interface ListedObject {
  key: string
  size: number
  lastModified: Date | null
}

export interface ObjectReference {
  key: string
  table: string
  id: string
}

export interface Reconciliation {
  /** Objects no row points at, older than the grace period: safe to remove. */
  orphans: ListedObject[]
  /** Objects no row points at yet, but too young to judge: an upload may be between its put and its row. */
  recent: ListedObject[]
  /** Rows whose object is not in the store. */
  missing: ObjectReference[]
  objects: number
  references: number
}

/**
 * Lists objects nothing points at and rows whose object is missing. An object younger than
 * `graceMs` (or of unknown age) is never called an orphan: uploads store the object first and
 * write the row after it.
 */
export function reconcile(objects: ListedObject[], references: ObjectReference[], { now = new Date(), graceMs = 3_600_000 } = {}): Reconciliation {
  const referenced = new Set(references.map((r) => r.key))
  const stored = new Set(objects.map((o) => o.key))
  const orphans: ListedObject[] = []
  const recent: ListedObject[] = []
  for (const o of objects) {
    if (referenced.has(o.key)) continue
    if (o.lastModified && now.getTime() - o.lastModified.getTime() >= graceMs) orphans.push(o)
    else recent.push(o)
  }
  const missing = references.filter((r) => !stored.has(r.key))
  const byKey = (a: { key: string }, b: { key: string }) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0)
  return { orphans: orphans.sort(byKey), recent: recent.sort(byKey), missing: missing.sort(byKey), objects: objects.length, references: references.length }
}
