import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { createSample } from '../support/samples'
import { dayFromNow } from '../support/certificates'

let c: Awaited<ReturnType<typeof everyone>>
let tech: Client
let places: { id: string; path: string }[]
beforeAll(async () => {
  c = await everyone()
  tech = c.technician
  places = (await tech.get('/api/locations')).body.items
})
afterAll(closeTestDb)

async function act(client: Client, id: string, body: Record<string, unknown>) {
  return client.post(`/api/samples/${id}/custody`, body)
}

describe('custody actions from the bench card', () => {
  it('moves a sample: the sample, one custody event and one audit row, and the version moves on', async () => {
    const s = await createSample(c.manager, { locationId: places[0]!.id })
    const r = await act(tech, s.id, { action: 'move', version: 1, locationId: places[1]!.id, note: 'Moved for the beam time' })
    expect(r.status, JSON.stringify(r.body)).toBe(201)
    expect(r.body.sample).toMatchObject({ locationId: places[1]!.id, version: 2 })
    const events = await testDb()('custody_events').where({ sample_id: s.id })
    expect(events).toHaveLength(1)
    expect(events[0]).toMatchObject({ kind: 'moved', details: { from: { id: places[0]!.id }, to: { id: places[1]!.id, path: places[1]!.path }, note: 'Moved for the beam time' } })
    const audit = await testDb()('audit_log').where({ entity_id: s.id, action: 'sample.custody.moved' })
    expect(audit).toHaveLength(1)
    expect(audit[0]!.actor_email).toBe('technician@larchmere-lab.example')
    expect(audit[0]!.before.locationId).toBe(places[0]!.id)
    expect(audit[0]!.after.locationId).toBe(places[1]!.id)
  })

  it('answers a stale version with 409 and the current state, and changes nothing', async () => {
    const s = await createSample(c.manager)
    expect((await act(tech, s.id, { action: 'condition', version: 1, note: 'Edges slightly curled' })).status).toBe(201)
    const stale = await act(tech, s.id, { action: 'move', version: 1, locationId: places[2]!.id })
    expect(stale.status).toBe(409)
    expect(stale.body.data.current.sample).toMatchObject({ id: s.id, version: 2, locationId: null })
    expect(stale.body.data.current.custody.events).toHaveLength(1)
    expect(await testDb()('custody_events').where({ sample_id: s.id })).toHaveLength(1)
  })

  it('checks out once: a second check-out is refused until it is checked back in', async () => {
    const s = await createSample(c.manager)
    const out = await act(tech, s.id, { action: 'check-out', version: 1, holder: { name: 'Ilse Marwood', institution: 'Brelund Institute of Technology' }, run: 'Run 26-114', dueBack: dayFromNow(3) })
    expect(out.status).toBe(201)
    expect(out.body.sample.status).toBe('in_use')
    expect(out.body.custody.checkout).toMatchObject({ holder: 'Ilse Marwood', holderUserId: null, holderInstitution: 'Brelund Institute of Technology', run: 'Run 26-114', dueBack: dayFromNow(3), checkedOutBy: 'Priya Lindqvist' })
    const twice = await act(tech, s.id, { action: 'check-out', version: 2, holder: { name: 'Someone else', institution: 'Elsewhere' }, run: 'Run 26-115', dueBack: dayFromNow(3) })
    expect(twice.status).toBe(409)
    expect(twice.body.message).toBe('This sample is already checked out')
    expect(twice.body.data.checkout.holder).toBe('Ilse Marwood')
    const back = await act(tech, s.id, { action: 'check-in', version: 2, locationId: places[3]!.id, note: 'Returned intact' })
    expect(back.status).toBe(201)
    expect(back.body.sample).toMatchObject({ status: 'available', locationId: places[3]!.id })
    expect(back.body.custody.checkout).toBeNull()
    expect((await act(tech, s.id, { action: 'check-in', version: 3 })).body.message).toBe('This sample is not checked out')
    const history = (await c.auditor.get(`/api/samples/${s.id}/custody`)).body.events.map((e: any) => e.kind)
    expect(history).toEqual(['checked_in', 'checked_out'])
  })

  it('refuses a check-out due back in the past, and of a quarantined sample', async () => {
    const s = await createSample(c.manager)
    const past = await act(tech, s.id, { action: 'check-out', version: 1, holder: { name: 'A. Person', institution: 'Somewhere' }, run: 'R1', dueBack: '2020-01-01' })
    expect(past.status).toBe(400)
    expect(past.body.data.issues[0].path).toBe('dueBack')
    const q = await createSample(c.manager, { status: 'quarantined' })
    const r = await act(tech, q.id, { action: 'check-out', version: 1, holder: { name: 'A. Person', institution: 'Somewhere' }, run: 'R1', dueBack: dayFromNow(1) })
    expect(r.status).toBe(409)
    expect(r.body.message).toMatch(/quarantined/)
  })

  it('records use in mg or cm², updates what is left, never below zero, and marks it depleted at zero', async () => {
    // 500 µg/cm² (the sample body's areal density): 2 cm² are 1 mg.
    const s = await createSample(c.manager, { massMg: 10 })
    const mg = await act(tech, s.id, { action: 'consume', version: 1, amount: 3, unit: 'mg' })
    expect(mg.body.sample.massMg).toBe(7)
    const area = await act(tech, s.id, { action: 'consume', version: 2, amount: 2, unit: 'cm2' })
    expect(area.status).toBe(201)
    expect(area.body.sample.massMg).toBe(6)
    expect(area.body.custody.areaUsedCm2).toBe(2)
    const event = area.body.custody.events[0]
    expect(event.details).toMatchObject({ amount: 2, unit: 'cm2', massUsedMg: 1, arealDensityUgCm2: 500, massBeforeMg: 7, massAfterMg: 6 })
    const tooMuch = await act(tech, s.id, { action: 'consume', version: 3, amount: 6.5, unit: 'mg' })
    expect(tooMuch.status).toBe(400)
    expect(tooMuch.body.message).toBe('Only 6 mg left')
    expect(tooMuch.body.data).toMatchObject({ remainingMg: 6, usedMg: 6.5, issues: [{ path: 'amount', message: 'Only 6 mg left' }] })
    expect(await testDb()('custody_events').where({ sample_id: s.id })).toHaveLength(2)
    const all = await act(tech, s.id, { action: 'consume', version: 3, amount: 6, unit: 'mg' })
    expect(all.body.sample).toMatchObject({ massMg: 0, status: 'depleted' })
  })

  it('notes use without a remainder when no mass is on record', async () => {
    const s = await createSample(c.manager, { massMg: null })
    const r = await act(tech, s.id, { action: 'consume', version: 1, amount: 1.5, unit: 'cm2' })
    expect(r.status).toBe(201)
    expect(r.body.sample.massMg).toBeNull()
    expect(r.body.custody.events[0].details.unchanged).toBe('no mass on record')
  })

  it('refuses every action on a retired sample, saying so', async () => {
    const s = await createSample(c.manager)
    await c.manager.delete(`/api/samples/${s.id}?version=1`)
    for (const body of [
      { action: 'move', version: 2, locationId: places[0]!.id },
      { action: 'condition', version: 2, note: 'Looks fine' },
      { action: 'check-out', version: 2, holder: { name: 'A. Person', institution: 'Somewhere' }, run: 'R1', dueBack: dayFromNow(1) },
    ]) {
      const r = await act(tech, s.id, body)
      expect(r.status).toBe(409)
      expect(r.body.message).toBe('This sample is retired: custody actions are closed')
      expect(r.body.data.reason).toBe('retired')
    }
    expect(await testDb()('custody_events').where({ sample_id: s.id })).toEqual([])
  })

  it('checks each action by its own schema', async () => {
    const s = await createSample(c.manager)
    const unknownAction = await act(tech, s.id, { action: 'teleport', version: 1 })
    expect(unknownAction.status).toBe(400)
    const noWho = await act(tech, s.id, { action: 'check-out', version: 1, run: 'R1', dueBack: dayFromNow(1) })
    expect(noWho.body.data.issues.map((i: any) => i.path)).toContain('holder')
    const negative = await act(tech, s.id, { action: 'consume', version: 1, amount: -1, unit: 'mg' })
    expect(negative.body.data.issues[0].path).toBe('amount')
    const noVersion = await act(tech, s.id, { action: 'condition', note: 'ok then' })
    expect(noVersion.body.data.issues[0].path).toBe('version')
    const sameplace = await createSample(c.manager, { locationId: places[0]!.id })
    expect((await act(tech, sameplace.id, { action: 'move', version: 1, locationId: places[0]!.id })).status).toBe(400)
  })

  it('is for technicians and managers only; everyone reads the history', async () => {
    const s = await createSample(c.manager)
    expect((await act(c.scientist, s.id, { action: 'condition', version: 1, note: 'I should not' })).status).toBe(403)
    expect((await act(c.auditor, s.id, { action: 'condition', version: 1, note: 'Nor I' })).status).toBe(403)
    expect((await act(c.manager, s.id, { action: 'condition', version: 1, note: 'Checked by the manager' })).status).toBe(201)
    expect((await c.scientist.get(`/api/samples/${s.id}/custody`)).body.events).toHaveLength(1)
  })

  it('keeps custody events append-only in the database', async () => {
    const s = await createSample(c.manager)
    await act(tech, s.id, { action: 'condition', version: 1, note: 'First look' })
    await expect(testDb()('custody_events').where({ sample_id: s.id }).update({ kind: 'moved' })).rejects.toThrow(/append-only/)
    await expect(testDb()('custody_events').where({ sample_id: s.id }).delete()).rejects.toThrow(/append-only/)
  })
})
