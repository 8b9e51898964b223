import { describe, expect, it } from 'vitest'
import { buildInventory, newlyExceeded, type Source } from '../../../shared/radioactivity/inventory'

const room = (id: string) => ({ id, code: id.toUpperCase(), name: `Room ${id}` })
const src = (id: string, nuclide: string, bq: number, r: string | null, date = '2026-12-01'): Source => ({ sampleId: id, code: id, name: id, nuclide, referenceBq: bq, referenceDate: date, room: r ? room(r) : null })

describe('licence totals per room and for the laboratory', () => {
  const sources = [src('a', 'Am-241', 30e3, 'b1'), src('b', 'Am-241', 25e3, 'b2'), src('c', 'Cs-137', 1e3, 'b1'), src('d', 'Am-241', 1e3, null)]
  const limits = [
    { nuclide: 'Am-241', roomId: null, limitBq: 50e3 },
    { nuclide: 'Am-241', roomId: 'b1', limitBq: 40e3 },
    { nuclide: 'Cs-137', roomId: 'b2', limitBq: 5e3 },
  ]
  // One day after the reference: ²⁴¹Am (432.6 y) and ¹³⁷Cs (30.08 y) have decayed by less than 10⁻⁴.
  const inv = buildInventory(sources, limits, '2026-12-02')

  it('sums each nuclide per room and for the lab, with the limit and its share', () => {
    const b1 = inv.rooms.find((r) => r.id === 'b1')!
    expect(b1.totals.find((t) => t.nuclide === 'Am-241')).toMatchObject({ limitBq: 40e3, exceeded: false })
    expect(b1.totals.find((t) => t.nuclide === 'Am-241')!.activityBq).toBeCloseTo(30e3, -1)
    const lab = inv.lab.find((t) => t.nuclide === 'Am-241')!
    expect(lab.activityBq).toBeCloseTo(56e3, -1)
    expect(lab.ratio).toBeCloseTo(56 / 50, 3)
    expect(lab.exceeded).toBe(true)
    // A room limit for a nuclide that room does not hold shows at zero.
    expect(inv.rooms.find((r) => r.id === 'b2')!.totals.find((t) => t.nuclide === 'Cs-137')).toMatchObject({ activityBq: 0, limitBq: 5e3, exceeded: false })
    // Sources in no room count for the lab but fall under no room's limit (nor the lab's, twice).
    const loose = inv.rooms.find((r) => r.id === null)!
    expect(loose.name).toBe('Not in a room')
    expect(loose.totals).toEqual([{ nuclide: 'Am-241', activityBq: expect.any(Number), limitBq: null, ratio: null, exceeded: false }])
    expect(inv.exceeded).toEqual([{ where: 'the laboratory', nuclide: 'Am-241', activityBq: expect.any(Number), limitBq: 50e3 }])
  })

  it('names only the limits a move newly crosses', () => {
    const moved = buildInventory(sources.map((s) => (s.sampleId === 'b' ? { ...s, room: room('b1') } : s)), limits, '2026-12-02')
    expect(newlyExceeded(inv, moved)).toEqual([{ where: 'room B1', nuclide: 'Am-241', activityBq: expect.any(Number), limitBq: 40e3 }])
    expect(newlyExceeded(moved, moved)).toEqual([])
  })

  it('counts depleted uranium\'s daughters under their own names once grown in', () => {
    const du = buildInventory([src('u', 'U-238', 8.5, 'b1', '2020-01-01')], [{ nuclide: 'Th-234', roomId: 'b1', limitBq: 5 }], '2026-12-02')
    const b1 = du.rooms[0]!.totals
    expect(b1.map((t) => t.nuclide)).toEqual(['Pa-234m', 'Th-234', 'U-238'])
    expect(b1.find((t) => t.nuclide === 'Th-234')).toMatchObject({ exceeded: true })
  })
})
