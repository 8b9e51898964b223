import { CAN } from '#shared/auth/roles'
import type { LicenceLimitRow } from '#shared/types/db'

// The licence limits, per nuclide, for a room or the whole laboratory.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readInventory)
  const db = useDb()
  const rows: (LicenceLimitRow & { room_code: string | null; room_name: string | null })[] = await db('licence_limits as l').leftJoin('locations as p', 'p.id', 'l.location_id').orderBy(['l.nuclide', 'p.code']).select('l.*', 'p.code as room_code', 'p.name as room_name')
  return {
    items: rows.map((r) => ({ id: r.id, nuclide: r.nuclide, roomId: r.location_id, room: r.location_id ? { code: r.room_code ?? '', name: r.room_name ?? '' } : null, limitBq: r.limit_bq, updatedAt: r.updated_at })),
  }
})
