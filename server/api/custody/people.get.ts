import { CAN } from '#shared/auth/roles'
import { HolderSearchQuery } from '#shared/schemas/custody'

// The people a sample can be checked out to: active users only, found by name, for the bench
// card's searchable select. Names and roles only: no e-mail addresses leave through this route.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.custody)
  const { q } = queryValid(event, HolderSearchQuery)
  const rows = await useDb()('users')
    .where({ active: true })
    .where((w) => {
      if (q) w.whereILike('name', `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`)
    })
    .orderBy('name')
    .limit(50)
    .select('id', 'name', 'role')
  return { items: rows.map((r) => ({ id: r.id, name: r.name, role: r.role })) }
})
