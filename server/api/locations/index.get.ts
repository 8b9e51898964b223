import { CAN } from '#shared/auth/roles'

// Every storage place with its path and how many samples (not retired) it holds, counting the
// places inside it, as the list's place filter does.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const db = useDb()
  const [places, counts] = await Promise.all([
    placesById(db),
    db('samples').whereNot('status', 'retired').whereNotNull('location_id').groupBy('location_id').select('location_id').count({ n: '*' }),
  ])
  const held = new Map<string, number>()
  for (const c of counts) {
    for (let id: string | null = c.location_id as string, depth = 0; id && depth < 10; id = places.get(id)?.parentId ?? null, depth++) {
      held.set(id, (held.get(id) ?? 0) + Number(c.n))
    }
  }
  const items = [...places.values()]
    .map((p) => ({ ...p, samples: held.get(p.id) ?? 0 }))
    .sort((a, b) => a.path.localeCompare(b.path, 'en', { numeric: true }))
  return { items, total: items.length }
})
