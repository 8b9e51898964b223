import { ListQuery } from '#shared/schemas/common'
import { CAN } from '#shared/auth/roles'

const SORTS: Record<string, string> = { name: 'name', email: 'email', role: 'role', created: 'created_at' }

export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.managePeople)
  const { q, sort, page, pageSize } = queryValid(event, ListQuery)

  const db = useDb()
  const filtered = () =>
    db('users').where((w) => {
      if (q) w.whereILike('name', `%${q}%`).orWhereILike('email', `%${q}%`)
    })
  const total = await countRows(filtered())
  const desc = sort?.startsWith('-')
  const column = SORTS[(sort ?? 'name').replace(/^-/, '')] ?? 'name'
  const rows = await filtered()
    .select('id', 'email', 'name', 'role', 'active', 'created_at', 'deactivated_at')
    .orderBy(column, desc ? 'desc' : 'asc')
    .orderBy('id')
    .limit(pageSize)
    .offset((page - 1) * pageSize)
  const invitations = await db('invitations')
    .whereNull('accepted_at')
    .whereNull('revoked_at')
    .where('expires_at', '>', db.fn.now())
    .select('id', 'email', 'name', 'role', 'expires_at', 'created_at')
    .orderBy('created_at', 'desc')

  return {
    items: rows.map((r) => ({ id: r.id, email: r.email, name: r.name, role: r.role, active: r.active, createdAt: r.created_at, deactivatedAt: r.deactivated_at })),
    total,
    page,
    pageSize,
    invitations: invitations.map((i) => ({ id: i.id, email: i.email, name: i.name, role: i.role, expiresAt: i.expires_at, createdAt: i.created_at })),
  }
})
