/**
 * The radioactive-source inventory: every radioactive sample's activity today (decay-corrected,
 * daughters grown in), summed per nuclide per room and for the laboratory, against the licence
 * limits a manager sets. Pure: the server gathers the rows.
 */
import { activityOn } from './decay'

export interface Source {
  sampleId: string
  code: string
  name: string
  nuclide: string
  referenceBq: number
  /** 'YYYY-MM-DD' (or a timestamp) of the reference activity */
  referenceDate: string
  /** the room the sample is kept in (the place itself or the room around it), null when unplaced */
  room: { id: string; code: string; name: string } | null
}

export interface LicenceLimit {
  id?: string
  nuclide: string
  /** null: the limit for the whole laboratory */
  roomId: string | null
  limitBq: number
}

export interface Total {
  nuclide: string
  activityBq: number
  limitBq: number | null
  /** share of the limit, 1 = at the limit */
  ratio: number | null
  exceeded: boolean
}

export interface Inventory {
  on: string
  sources: (Source & { activityTodayBq: number; daughters: { nuclide: string; activityBq: number }[]; halfLifeKnown: boolean })[]
  rooms: { id: string | null; code: string; name: string; totals: Total[] }[]
  lab: Total[]
  exceeded: { where: string; nuclide: string; activityBq: number; limitBq: number }[]
}

// `roomId`: a room's id, null for the laboratory, undefined for sources in no room (no limit applies).
function totals(byNuclide: Map<string, number>, limits: readonly LicenceLimit[], roomId: string | null | undefined): Total[] {
  // A limit set for a nuclide with no source still shows, at zero.
  const own = roomId === undefined ? [] : limits.filter((l) => l.roomId === roomId)
  const names = new Set([...byNuclide.keys(), ...own.map((l) => l.nuclide)])
  return [...names].sort().map((nuclide) => {
    const activityBq = byNuclide.get(nuclide) ?? 0
    const limit = own.find((l) => l.nuclide === nuclide)
    const limitBq = limit ? limit.limitBq : null
    const ratio = limitBq ? activityBq / limitBq : null
    return { nuclide, activityBq, limitBq, ratio, exceeded: limitBq !== null && activityBq > limitBq }
  })
}

function add(map: Map<string, number>, nuclide: string, bq: number) {
  map.set(nuclide, (map.get(nuclide) ?? 0) + bq)
}

/** The inventory of `sources` on `on` against `limits`. */
export function buildInventory(sources: readonly Source[], limits: readonly LicenceLimit[], on: string | Date): Inventory {
  const day = new Date(on).toISOString()
  const lab = new Map<string, number>()
  const rooms = new Map<string, { id: string | null; code: string; name: string; byNuclide: Map<string, number> }>()
  const rows = sources.map((s) => {
    const a = activityOn(s.nuclide, s.referenceBq, s.referenceDate, day)
    const key = s.room?.id ?? ''
    if (!rooms.has(key)) rooms.set(key, { id: s.room?.id ?? null, code: s.room?.code ?? '—', name: s.room?.name ?? 'Not in a room', byNuclide: new Map() })
    const room = rooms.get(key)!
    for (const [nuclide, bq] of [[s.nuclide, a.activityBq] as const, ...a.daughters.map((d) => [d.nuclide, d.activityBq] as const)]) {
      add(lab, nuclide, bq)
      add(room.byNuclide, nuclide, bq)
    }
    return { ...s, activityTodayBq: a.activityBq, daughters: a.daughters, halfLifeKnown: a.known }
  })
  // Rooms with a limit but no source still show.
  for (const l of limits) if (l.roomId && !rooms.has(l.roomId)) rooms.set(l.roomId, { id: l.roomId, code: '', name: '', byNuclide: new Map() })
  const roomList = [...rooms.values()].map((r) => ({ id: r.id, code: r.code, name: r.name, totals: totals(r.byNuclide, limits, r.id ?? undefined) }))
  const labTotals = totals(lab, limits, null)
  const exceeded = [
    ...labTotals.filter((t) => t.exceeded).map((t) => ({ where: 'the laboratory', nuclide: t.nuclide, activityBq: t.activityBq, limitBq: t.limitBq! })),
    ...roomList.flatMap((r) => r.totals.filter((t) => t.exceeded).map((t) => ({ where: `room ${r.code}`, nuclide: t.nuclide, activityBq: t.activityBq, limitBq: t.limitBq! }))),
  ]
  return { on: day.slice(0, 10), sources: rows, rooms: roomList.sort((a, b) => a.code.localeCompare(b.code)), lab: labTotals, exceeded }
}

/**
 * The limits a change would newly exceed: the inventory before and after, compared. Answers the
 * ones exceeded after that were not exceeded before (a registration or a move that crosses a limit).
 */
export function newlyExceeded(before: Inventory, after: Inventory): Inventory['exceeded'] {
  const key = (e: { where: string; nuclide: string }) => `${e.where}|${e.nuclide}`
  const was = new Set(before.exceeded.map(key))
  return after.exceeded.filter((e) => !was.has(key(e)))
}
