import { describe, it, expect, beforeAll } from 'vitest'
import { parse } from 'csv-parse/sync'
import { signedIn, unique, type Client } from '../support/api'
import { createSample } from '../support/samples'

// A small stock of its own, all carrying one tag in the lot, so every query here can be narrowed
// to exactly these samples whatever else the database holds.
let manager: Client
let tag: string
let room: { id: string; code: string }
let shelf: { id: string; code: string }
const made: Record<string, { id: string; code: string }> = {}
const inDays = (n: number) => new Date(Date.now() + n * 86_400_000).toISOString().slice(0, 10)

beforeAll(async () => {
  manager = await signedIn('manager')
  tag = unique()
  const place = async (kind: string, code: string, parentId: string | null) => {
    const r = await manager.post('/api/locations', { kind, code, name: `${kind} ${code}`, parentId })
    expect(r.status, JSON.stringify(r.body)).toBe(201)
    return r.body
  }
  room = await place('room', `R${tag}`, null)
  const cabinet = await place('cabinet', `R${tag}-C1`, room.id)
  shelf = await place('shelf', `R${tag}-C1-S1`, cabinet.id)
  const lot = (n: string) => `LOT-${tag}-${n}`
  made.pb = await createSample(manager, { name: 'Lead target', material: 'Lead, enriched', formula: 'Pb', lot: lot('pb'), components: [{ z: 82, massNumber: 208, fraction: 1, basis: 'atom', enrichmentPercent: 99 }], recertifyBy: inDays(10), hazardStatements: 'H360FD', locationId: shelf.id })
  made.ni = await createSample(manager, { name: 'Nickel target', material: 'Nickel, enriched', lot: lot('ni'), components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', enrichmentPercent: 99.6 }], recertifyBy: inDays(200) })
  made.gas = await createSample(manager, { name: 'Argon cylinder', material: 'Argon', formula: 'Ar', form: 'gas_cylinder', arealDensity: null, bulkDensity: null, lot: lot('ar'), hazardStatements: 'H280', components: [{ z: 18, massNumber: null, fraction: 1, basis: 'atom' }], recertifyBy: inDays(-3) })
  made.c = await createSample(manager, { name: 'Carbon stripper foil', material: 'Amorphous carbon', formula: 'C', form: 'stripper_foil', arealDensity: 5, status: 'in_use', lot: lot('c'), components: [{ z: 6, massNumber: null, fraction: 1, basis: 'atom' }] })
})

async function codes(query: string): Promise<string[]> {
  const r = await manager.get(`/api/samples?q=${encodeURIComponent(`LOT-${tag}`)}&pageSize=100&${query}`)
  expect(r.status, JSON.stringify(r.body)).toBe(200)
  expect(r.body.total).toBe(r.body.items.length)
  return r.body.items.map((i: { code: string }) => i.code).sort()
}
const expected = (...keys: string[]) => keys.map((k) => made[k]!.code).sort()

describe('the sample list', () => {
  it('finds by any word of code, name, material, formula, supplier or lot, ignoring case', async () => {
    expect(await codes('')).toEqual(expected('pb', 'ni', 'gas', 'c'))
    const one = await manager.get(`/api/samples?q=${encodeURIComponent(`lot-${tag}-NI`)}`)
    expect(one.body.items.map((i: { code: string }) => i.code)).toEqual([made.ni!.code])
    const two = await manager.get(`/api/samples?q=${encodeURIComponent(`${tag} stripper`)}`)
    expect(two.body.items.map((i: { code: string }) => i.code)).toEqual([made.c!.code])
    const byCode = await manager.get(`/api/samples?q=${made.gas!.code}`)
    expect(byCode.body.items.map((i: { code: string }) => i.code)).toEqual([made.gas!.code])
    expect((await manager.get(`/api/samples?q=${encodeURIComponent(`${tag} nothing-like-this`)}`)).body.total).toBe(0)
  })

  it('finds by the code or name of the storage place, including places around it', async () => {
    const r = await manager.get(`/api/samples?q=${encodeURIComponent(room.code)}`)
    expect(r.body.items.map((i: { code: string }) => i.code)).toEqual([made.pb!.code])
    expect(r.body.items[0].location).toEqual({ code: shelf.code, name: `shelf ${shelf.code}` })
  })

  it('counts the samples of a place with those of the places inside it', async () => {
    const r = await manager.get('/api/locations')
    const byId = new Map(r.body.items.map((p: { id: string; samples: number; path: string }) => [p.id, p]))
    expect(byId.get(room.id)).toMatchObject({ samples: 1, path: room.code })
    expect(byId.get(shelf.id)).toMatchObject({ samples: 1, path: `${room.code} › ${room.code}-C1 › ${shelf.code}` })
  })

  it('finds an isotope however it is written: Ni-58, 58Ni, Ni58, ⁵⁸Ni', async () => {
    for (const q of ['Ni-58', '58Ni', 'Ni58', 'ni-58', '⁵⁸Ni']) {
      const r = await manager.get(`/api/samples?q=${encodeURIComponent(`${q} LOT-${tag}`)}&pageSize=100`)
      expect(r.body.items.map((i: { code: string }) => i.code), q).toEqual([made.ni!.code])
    }
    expect((await manager.get(`/api/samples?q=${encodeURIComponent(`Ni-60 LOT-${tag}`)}`)).body.total).toBe(0)
  })

  it('takes a % or _ in the search as the character itself', async () => {
    expect((await manager.get(`/api/samples?q=${encodeURIComponent(`${tag}%`)}`)).body.total).toBe(0)
  })

  it.each([
    ['element=Pb', ['pb']],
    ['element=28', ['ni']],
    ['isotope=Ni-58', ['ni']],
    ['isotope=60Ni', []],
    ['form=gas_cylinder', ['gas']],
    ['status=in_use', ['c']],
    [`location=ROOM`, ['pb']],
    ['due=overdue', ['gas']],
    ['due=30', ['pb', 'gas']],
    ['hazard=toxic', ['pb']],
    ['hazard=pressurised', ['gas']],
    ['hazard=H360FD', ['pb']],
    ['hazard=H360', ['pb']],
    ['hazard=H360Df', []],
    ['hazard=h280', ['gas']],
  ])('filters %s', async (query, keys) => {
    expect(await codes(query.replace('ROOM', room.id))).toEqual(expected(...keys))
  })

  it('says what is wrong with a bad filter', async () => {
    const r = await manager.get('/api/samples?element=Xx&hazard=sticky&sort=colour')
    expect(r.status).toBe(400)
    expect(r.body.data.issues.map((i: { path: string }) => i.path).sort()).toEqual(['element', 'hazard', 'sort'])
  })

  it('sorts and pages', async () => {
    const byName = await manager.get(`/api/samples?q=LOT-${tag}&sort=name`)
    expect(byName.body.items.map((i: { name: string }) => i.name)).toEqual(['Argon cylinder', 'Carbon stripper foil', 'Lead target', 'Nickel target'])
    const desc = await manager.get(`/api/samples?q=LOT-${tag}&sort=-arealDensity`)
    expect(desc.body.items.map((i: { arealDensity: number | null }) => i.arealDensity)).toEqual([500, 500, 5, null])
    const page2 = await manager.get(`/api/samples?q=LOT-${tag}&sort=name&pageSize=1&page=2`)
    expect(page2.body).toMatchObject({ total: 4, page: 2, pageSize: 1 })
    expect(page2.body.items.map((i: { name: string }) => i.name)).toEqual(['Carbon stripper foil'])
    const past = await manager.get(`/api/samples?q=LOT-${tag}&pageSize=10&page=3`)
    expect(past.body).toMatchObject({ items: [], total: 4, page: 3 })
  })

  it('exports the same filtered list as CSV, composition included', async () => {
    const r = await manager.get(`/api/samples?q=LOT-${tag}&hazard=toxic&format=csv`)
    expect(r.status).toBe(200)
    expect(r.headers.get('content-type')).toMatch(/^text\/csv/)
    const rows = parse(r.body as string, { columns: true }) as Record<string, string>[]
    expect(rows).toHaveLength(1)
    expect(rows[0]).toMatchObject({ code: made.pb!.code, location: shelf.code, composition: 'Pb-208 1 enr 99%', fraction_basis: 'atom', hazard_statements: 'H360FD' })
  })
})
