import { CAN } from '#shared/auth/roles'

// Every storage place with its path and how many samples (not retired) it holds directly.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readSamples)
  const db = useDb()
  const [places, counts] = await Promise.all([
    placesById(db),
    db('samples').whereNot('status', 'retired').whereNotNull('location_id').groupBy('location_id').select('location_id').count({ n: '*' }),
  ])
  const held = new Map(counts.map((c) => [c.location_id as string, Number(c.n)]))
  const items = [...places.values()]
    .map((p) => ({ ...p, samples: held.get(p.id) ?? 0 }))
    .sort((a, b) => a.path.localeCompare(b.path, 'en', { numeric: true }))
  return { items, total: items.length }
})
