import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { createSample } from '../support/samples'
import { dayFromNow } from '../support/certificates'

// Custody by people: a check-out names a person of the lab or an external user with their
// institution, lands in structured columns of its custody event, and shows in "My check-outs"
// and "Overdue".
let c: Awaited<ReturnType<typeof everyone>>
let tech: Client
let people: { id: string; name: string; role: string }[]
beforeAll(async () => {
  c = await everyone()
  tech = c.technician
  people = (await tech.get('/api/custody/people')).body.items
})
afterAll(closeTestDb)

const act = (client: Client, id: string, body: Record<string, unknown>) => client.post(`/api/samples/${id}/custody`, body)
const person = (role: string) => people.find((p) => p.role === role)!

describe('check-out to a person', () => {
  it('lists active people by name, without e-mail addresses, and searches them', async () => {
    expect(people.map((p) => p.role).sort()).toEqual(expect.arrayContaining(['auditor', 'manager', 'scientist', 'technician']))
    expect(Object.keys(people[0]!).sort()).toEqual(['id', 'name', 'role'])
    const scientist = person('scientist')
    const found = (await tech.get(`/api/custody/people?q=${encodeURIComponent(scientist.name.slice(0, 4).toLowerCase())}`)).body.items
    expect(found.map((p: any) => p.id)).toContain(scientist.id)
    expect((await tech.get('/api/custody/people?q=%25%25')).body.items).toEqual([])
  })

  it('checks out to a person of the lab: holder id and due date in columns, shown in their "mine" list', async () => {
    const scientist = person('scientist')
    const s = await createSample(c.manager)
    const out = await act(tech, s.id, { action: 'check-out', version: 1, holder: { userId: scientist.id }, run: 'Run 26-201', dueBack: dayFromNow(5) })
    expect(out.status, JSON.stringify(out.body)).toBe(201)
    expect(out.body.custody.checkout).toMatchObject({ holder: scientist.name, holderUserId: scientist.id, holderInstitution: null, dueBack: dayFromNow(5) })
    const [event] = await testDb()('custody_events').where({ sample_id: s.id, kind: 'checked_out' }).select('*', testDb().raw('due_back::text as due_text'))
    expect(event).toMatchObject({ holder_user_id: scientist.id, holder_name: scientist.name, holder_institution: null, due_text: dayFromNow(5) })
    const mine = (await tech.get('/api/checkouts?scope=mine')).body.items
    const row = mine.find((k: any) => k.sample.id === s.id)
    expect(row).toMatchObject({ holder: scientist.name, heldByMe: false, overdue: false, daysLeft: 5, checkedOutBy: 'Priya Lindqvist' })
    // The manager did not check it out and does not hold it: not in the manager's own list.
    expect((await c.manager.get('/api/checkouts?scope=mine')).body.items.map((k: any) => k.sample.id)).not.toContain(s.id)
    expect((await c.manager.get('/api/checkouts?scope=open')).body.items.map((k: any) => k.sample.id)).toContain(s.id)
  })

  it('checks out to an external user with their institution', async () => {
    const s = await createSample(c.manager)
    const out = await act(c.manager, s.id, { action: 'check-out', version: 1, holder: { name: 'Ilse Marwood', institution: 'Brelund University' }, run: 'Guest beam time', dueBack: dayFromNow(2) })
    expect(out.status).toBe(201)
    const [event] = await testDb()('custody_events').where({ sample_id: s.id, kind: 'checked_out' })
    expect(event).toMatchObject({ holder_user_id: null, holder_name: 'Ilse Marwood', holder_institution: 'Brelund University' })
    expect((await c.manager.get('/api/checkouts?scope=mine')).body.items.find((k: any) => k.sample.id === s.id)).toMatchObject({ holderInstitution: 'Brelund University' })
  })

  it('refuses free text, an unknown person and a deactivated one, saying what is accepted', async () => {
    const s = await createSample(c.manager)
    const text = await act(tech, s.id, { action: 'check-out', version: 1, holder: 'Somebody', run: 'R', dueBack: dayFromNow(1) })
    expect(text.status).toBe(400)
    expect(text.body.data.issues[0]).toMatchObject({ path: 'holder' })
    expect(text.body.data.issues[0].message).toMatch(/person from the list/)
    const noInstitution = await act(tech, s.id, { action: 'check-out', version: 1, holder: { name: 'Ilse Marwood' }, run: 'R', dueBack: dayFromNow(1) })
    expect(noInstitution.status).toBe(400)
    const unknown = await act(tech, s.id, { action: 'check-out', version: 1, holder: { userId: 'no-such-person' }, run: 'R', dueBack: dayFromNow(1) })
    expect(unknown.status).toBe(400)
    expect(unknown.body.data.issues[0]).toEqual({ path: 'holder.userId', message: 'Choose an active person from the list' })
    const [gone] = await testDb()('users').insert({ id: `gone-${Date.now()}`, email: `gone-${Date.now()}@larchmere-lab.example`, name: 'Former Colleague', role: 'scientist', password_hash: 'x', active: false }).returning('id')
    const inactive = await act(tech, s.id, { action: 'check-out', version: 1, holder: { userId: gone!.id }, run: 'R', dueBack: dayFromNow(1) })
    expect(inactive.status).toBe(400)
    expect((await tech.get('/api/custody/people?q=Former')).body.items).toEqual([])
    expect(await testDb()('custody_events').where({ sample_id: s.id })).toEqual([])
  })

  it('lists overdue check-outs for technicians and managers, and only those', async () => {
    const late = await createSample(c.manager)
    const onTime = await createSample(c.manager)
    // the signed-in technician (other tests may have added technicians to the people list)
    const me = (await tech.get('/api/auth/me')).body as { id: string }
    await act(tech, late.id, { action: 'check-out', version: 1, holder: { userId: me.id }, run: 'Run 26-190', dueBack: dayFromNow(1) })
    await act(tech, onTime.id, { action: 'check-out', version: 1, holder: { userId: me.id }, run: 'Run 26-191', dueBack: dayFromNow(1) })
    await testDb()('sample_checkouts').where({ sample_id: late.id }).update({ due_back: testDb().raw('current_date - 3') })
    for (const who of [tech, c.manager]) {
      const overdue = (await who.get('/api/checkouts?scope=overdue')).body.items
      const ids = overdue.map((k: any) => k.sample.id)
      expect(ids).toContain(late.id)
      expect(ids).not.toContain(onTime.id)
      expect(overdue.every((k: any) => k.overdue && k.daysLeft < 0)).toBe(true)
    }
    const mine = (await tech.get('/api/checkouts?scope=mine')).body.items
    expect(mine.find((k: any) => k.sample.id === late.id)).toMatchObject({ heldByMe: true, overdue: true, daysLeft: -3 })
    expect((await c.scientist.get('/api/checkouts?scope=overdue')).status).toBe(403)
  })
})
