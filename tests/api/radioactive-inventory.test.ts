import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone, unique, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { createSample } from '../support/samples'

let c: Awaited<ReturnType<typeof everyone>>
let manager: Client
const rooms: Record<string, { id: string; shelf: string; code: string }> = {}
// ²²Na, T½ = 2.6018 y (NUBASE2020, from memory): a nuclide no other test registers, so the lab totals are ours.
const NA22_DAYS = 2.6018 * 365.25
const daysAgo = (d: number) => new Date(Date.now() - d * 86_400_000).toISOString().slice(0, 10)

beforeAll(async () => {
  c = await everyone()
  manager = c.manager
  for (const name of ['a', 'b']) {
    const code = `RAD-${name}-${unique()}`
    const room = await manager.post('/api/locations', { kind: 'room', code, name: `Source room ${name}` })
    const cab = await manager.post('/api/locations', { kind: 'cabinet', code: `${code}-C`, name: 'Source safe', parentId: room.body.id })
    const shelf = await manager.post('/api/locations', { kind: 'shelf', code: `${code}-C-1`, name: 'Top shelf', parentId: cab.body.id })
    expect(shelf.status, JSON.stringify(shelf.body)).toBe(201)
    rooms[name] = { id: room.body.id, shelf: shelf.body.id, code }
  }
})
afterAll(closeTestDb)

const source = (bq: number, where: string, referenceDate: string) =>
  createSample(manager, {
    name: `Na-22 check source ${unique()}`,
    material: 'Sodium-22 sealed source',
    formula: null,
    form: 'other',
    arealDensity: null,
    bulkDensity: null,
    radioactive: true,
    nuclide: 'Na-22',
    activityBq: bq,
    activityReferenceDate: referenceDate,
    locationId: where,
    components: [{ z: 11, massNumber: 22, fraction: 1, basis: 'atom', enrichmentPercent: 100 }],
  })

describe('the radioactive-source inventory against licence limits', () => {
  let moving: any

  it('lets a manager set limits per nuclide for the lab and per room, refusing a place that is not a room', async () => {
    const lab = await manager.request('PUT', '/api/licence-limits', { nuclide: '22Na', limitBq: 100e3 })
    expect(lab.status, JSON.stringify(lab.body)).toBe(200)
    expect(lab.body).toMatchObject({ nuclide: 'Na-22', roomId: null, limitBq: 100e3 })
    const room = await manager.request('PUT', '/api/licence-limits', { nuclide: 'Na-22', roomId: rooms.a!.id, limitBq: 50e3 })
    expect(room.status).toBe(200)
    const shelf = await manager.request('PUT', '/api/licence-limits', { nuclide: 'Na-22', roomId: rooms.a!.shelf, limitBq: 1 })
    expect(shelf.status).toBe(400)
    expect(shelf.body.data.issues[0].path).toBe('roomId')
    const again = await manager.request('PUT', '/api/licence-limits', { nuclide: 'Na-22', limitBq: 100e3 })
    expect(again.body.id).toBe(lab.body.id)
    expect(await testDb()('audit_log').where({ entity_type: 'licence_limit', entity_id: lab.body.id }).count({ n: '*' }).first()).toEqual({ n: '2' })
  })

  it('corrects each source for decay since its reference date, and sums it into its room', async () => {
    // 40 kBq two half-lives ago is 10 kBq today (A = A₀ · 2^(−t/T½)).
    const s = await source(40e3, rooms.a!.shelf, daysAgo(Math.round(2 * NA22_DAYS)))
    expect(s.licenceWarnings).toEqual([])
    const inv = await c.auditor.get('/api/inventory')
    expect(inv.status).toBe(200)
    const row = inv.body.sources.find((x: { sampleId: string }) => x.sampleId === s.id)
    expect(row.room.code).toBe(rooms.a!.code)
    expect(row.activityTodayBq / 10e3).toBeCloseTo(1, 2)
    const roomA = inv.body.rooms.find((r: { id: string }) => r.id === rooms.a!.id)
    expect(roomA.totals.find((t: { nuclide: string }) => t.nuclide === 'Na-22')).toMatchObject({ limitBq: 50e3, exceeded: false })
    expect(inv.body.halfLifeSource).toContain('NUBASE2020')
  })

  it('warns when a registration puts the lab over its limit', async () => {
    const first = await source(60e3, rooms.b!.shelf, daysAgo(0))
    expect(first.licenceWarnings).toEqual([])
    moving = await source(45e3, rooms.b!.shelf, daysAgo(0))
    expect(moving.licenceWarnings).toEqual([{ where: 'the laboratory', nuclide: 'Na-22', activityBq: expect.any(Number), limitBq: 100e3, message: 'This would put the laboratory over its licence limit for Na-22' }])
    const lab = (await manager.get('/api/inventory')).body.lab.find((t: { nuclide: string }) => t.nuclide === 'Na-22')
    expect(lab.exceeded).toBe(true)
    expect(lab.activityBq / 115e3).toBeCloseTo(1, 2)
  })

  it('warns when a move puts a room over its limit, and makes the move', async () => {
    const r = await c.technician.post(`/api/samples/${moving.id}/custody`, { action: 'move', version: moving.version, locationId: rooms.a!.shelf })
    expect(r.status, JSON.stringify(r.body)).toBe(201)
    expect(r.body.sample.locationId).toBe(rooms.a!.shelf)
    expect(r.body.licenceWarnings).toEqual([expect.objectContaining({ where: `room ${rooms.a!.code}`, nuclide: 'Na-22', limitBq: 50e3 })])
  })

  it('exports the inventory as CSV, daughters on their own lines', async () => {
    const du = await createSample(manager, { name: `DU foil ${unique()}`, radioactive: true, nuclide: 'U-238', activityBq: 12, activityReferenceDate: daysAgo(400), locationId: rooms.b!.shelf, components: [{ z: 92, massNumber: 238, fraction: 1, basis: 'atom', enrichmentPercent: 99.8 }] })
    const csv = await c.auditor.get('/api/inventory?format=csv')
    expect(csv.status).toBe(200)
    const lines = String(csv.body).trim().split('\n')
    expect(lines[0]).toBe('code,name,room,nuclide,reference_activity_bq,reference_date,on,activity_bq,basis')
    const mine = lines.filter((l) => l.startsWith(du.code))
    expect(mine.map((l) => l.split(',')[3])).toEqual(['U-238', 'Th-234', 'Pa-234m'])
    // 400 days on, ²³⁴Th (24.1 d) stands in secular equilibrium with ²³⁸U: 12 Bq each.
    for (const l of mine) expect(Number(l.split(',')[7])).toBeCloseTo(12, 3)
  })

  it('removes a limit, once', async () => {
    const limits = (await manager.get('/api/licence-limits')).body.items.filter((l: { nuclide: string; roomId: string | null }) => l.nuclide === 'Na-22' && l.roomId === rooms.a!.id)
    expect(limits).toHaveLength(1)
    expect((await manager.delete(`/api/licence-limits/${limits[0].id}`)).status).toBe(200)
    expect((await manager.delete(`/api/licence-limits/${limits[0].id}`)).status).toBe(404)
  })
})
