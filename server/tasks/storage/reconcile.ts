// The daily comparison of the object store with the rows (nuxt.config.ts schedules it). It only
// reports: an audit row and a log line when something is off. Removing orphans is for a person,
// with `npm run reconcile -- --fix`.
export default defineTask({
  meta: { name: 'storage:reconcile', description: 'Objects nothing points at, and rows whose object is missing' },
  async run() {
    const found = await reconcileStore(useDb(), useObjectStore(), await useBucket())
    const summary = { objects: found.objects, references: found.references, orphans: found.orphans.map((o) => o.key), missing: found.missing.map((m) => ({ table: m.table, id: m.id, key: m.key })) }
    if (found.orphans.length || found.missing.length) {
      console.warn(`Store reconciliation: ${found.orphans.length} object(s) nothing points at, ${found.missing.length} row(s) whose object is missing`)
      await writeAudit(useDb(), null, { action: 'storage.reconciled', entityType: 'storage', after: summary })
    }
    return { result: summary }
  },
})
