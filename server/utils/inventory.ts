import type { Knex } from 'knex'
import { placesById, type PlaceRef } from './samples'
import { buildInventory, newlyExceeded, type Inventory, type LicenceLimit, type Source } from '#shared/radioactivity/inventory'

/** The room a place is in: the place itself when it is a room, else the nearest room around it. */
function roomOf(places: Map<string, PlaceRef>, id: string | null): Source['room'] {
  for (let p = id ? places.get(id) : undefined, depth = 0; p && depth < 10; p = p.parentId ? places.get(p.parentId) : undefined, depth++) {
    if (p.kind === 'room') return { id: p.id, code: p.code, name: p.name }
  }
  return null
}

/** A change to try before it is made: a sample placed elsewhere, or a source not yet registered. */
export type InventoryChange = { move: { sampleId: string; locationId: string | null } } | { add: Omit<Source, 'room'> & { locationId: string | null } }

/**
 * The laboratory's radioactive sources (samples marked radioactive, not retired) with their
 * activity today and the totals against the licence limits. The reference date is the one
 * recorded with the activity, else the date received, else the date registered.
 */
export async function loadInventory(db: Knex | Knex.Transaction, on: Date = new Date(), change?: InventoryChange): Promise<Inventory> {
  const [rows, limitRows, places] = await Promise.all([
    db('samples').where({ radioactive: true }).whereNot('status', 'retired').whereNotNull('nuclide').whereNotNull('activity_bq').orderBy('code'),
    db('licence_limits').select('*'),
    placesById(db),
  ])
  const day = (d: string | Date | null) => (d ? (typeof d === 'string' ? d.slice(0, 10) : d.toISOString().slice(0, 10)) : null)
  const sources: Source[] = rows.map((r) => {
    const locationId = change && 'move' in change && change.move.sampleId === r.id ? change.move.locationId : r.location_id
    return {
      sampleId: r.id,
      code: r.code,
      name: r.name,
      nuclide: r.nuclide!,
      referenceBq: r.activity_bq!,
      referenceDate: day(r.activity_reference_on) ?? day(r.received_on) ?? day(r.created_at)!,
      room: roomOf(places, locationId),
    }
  })
  if (change && 'add' in change) sources.push({ ...change.add, room: roomOf(places, change.add.locationId) })
  const limits: LicenceLimit[] = limitRows.map((l) => ({ id: l.id, nuclide: l.nuclide, roomId: l.location_id, limitBq: l.limit_bq }))
  const inventory = buildInventory(sources, limits, on)
  for (const room of inventory.rooms) {
    const p = room.id ? places.get(room.id) : undefined
    if (p && !room.code) Object.assign(room, { code: p.code, name: p.name })
  }
  return inventory
}

/** The licence limits a change would newly exceed (empty when none, or when nothing radioactive moves). */
export async function licenceWarnings(db: Knex | Knex.Transaction, change: InventoryChange) {
  const now = new Date()
  const [before, after] = await Promise.all([loadInventory(db, now), loadInventory(db, now, change)])
  return newlyExceeded(before, after).map((e) => ({ ...e, message: `This would put ${e.where} over its licence limit for ${e.nuclide}` }))
}
