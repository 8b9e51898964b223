import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { signedIn, unique, type Client } from '../support/api'
import { closeTestDb, testDb } from '../support/db'

let manager: Client
let place: string
beforeAll(async () => {
  manager = await signedIn('manager')
  place = `IMP-${unique()}`
  const r = await manager.post('/api/locations', { kind: 'room', code: place, name: 'Import test room' })
  expect(r.status).toBe(201)
})
afterAll(closeTestDb)

const HEADER = 'name,material,formula,form,areal_density_ug_cm2,location,hazard_statements,composition,fraction_basis'
const csv = (...rows: string[]) => [HEADER, ...rows].join('\n') + '\n'
const post = (body: string, dryRun: boolean) => manager.request('POST', `/api/samples/import${dryRun ? '?dryRun=true' : ''}`, body, { 'content-type': 'text/csv' })
const samplesNamed = (prefix: string) => testDb()('samples').whereLike('name', `${prefix}%`)

describe('CSV import', () => {
  it('reports every problem by line and column in a dry run, and writes nothing', async () => {
    const tag = unique()
    const file = csv(
      `${tag} good,Gold,Au,foil,200,${place},,Au 1,atom`,
      `${tag} bad form,Gold,Au,blanket,200,,,Au 1,atom`,
      `${tag} bad sum,Lithium fluoride,LiF,foil,150,NO-SUCH-PLACE,,Li-7 0.5 enr 99.9%; F 0.4,atom`,
      `"${tag} bad hazard, quoted",Lead,Pb,foil,400,,H360 H999,Pb-208 1 enr 99%,atom`,
      `${tag} bad composition,Nickel,Ni,foil,abc,,,Nickel one,atom`,
    )
    const r = await post(file, true)
    expect(r.status, JSON.stringify(r.body)).toBe(200)
    expect(r.body).toMatchObject({ dryRun: true, rows: 5, valid: false })
    const at = (line: number) => r.body.errors.filter((e: { line: number }) => e.line === line)
    expect(at(2)).toEqual([])
    expect(at(3)).toEqual([{ line: 3, column: 'form', message: expect.stringContaining('stripper_foil') }])
    expect(at(4).map((e: { column: string }) => e.column).sort()).toEqual(['composition', 'location'])
    expect(at(4).find((e: { column: string }) => e.column === 'composition').message).toContain('0.9000')
    expect(at(5)).toEqual([{ line: 5, column: 'hazard_statements', message: expect.stringContaining('H999') }])
    expect(at(6).map((e: { column: string }) => e.column).sort()).toEqual(['areal_density_ug_cm2', 'composition'])
    expect(await samplesNamed(tag)).toEqual([])
  })

  it('names unknown and missing columns on line 1', async () => {
    const r = await post('name,material,colour\nA,B,red\n', true)
    expect(r.body.errors).toEqual(
      expect.arrayContaining([
        { line: 1, column: 'colour', message: expect.stringContaining('Unknown column') },
        { line: 1, column: 'form', message: 'This column is required' },
      ]),
    )
  })

  it('imports nothing when one row is wrong', async () => {
    const tag = unique()
    const r = await post(csv(`${tag} one,Gold,Au,foil,200,,,Au 1,atom`, `${tag} two,Gold,Au,foil,-5,,,Au 1,atom`), false)
    expect(r.status).toBe(400)
    expect(r.body.data.errors).toEqual([{ line: 3, column: 'areal_density_ug_cm2', message: expect.any(String) }])
    expect(await samplesNamed(tag)).toEqual([])
  })

  it('imports every row of a good file in one go, each audited', async () => {
    const tag = unique()
    const check = await post(csv(`${tag} one,Gold,Au,foil,200,${place},,Au 1,atom`, `${tag} two,Water ice,H2O,other,,,,H 0.111894; O 0.888106,mass`), true)
    expect(check.body).toMatchObject({ valid: true, errors: [] })
    expect(await samplesNamed(tag)).toEqual([])
    const r = await post(csv(`${tag} one,Gold,Au,foil,200,${place},,Au 1,atom`, `${tag} two,Water ice,H2O,other,,,,H 0.111894; O 0.888106,mass`), false)
    expect(r.status, JSON.stringify(r.body)).toBe(201)
    expect(r.body.created).toHaveLength(2)
    const rows = await samplesNamed(tag).orderBy('name')
    expect(rows.map((s) => s.name)).toEqual([`${tag} one`, `${tag} two`])
    const audit = await testDb()('audit_log').whereIn('entity_id', rows.map((s) => s.id)).select('action')
    expect(audit.map((a) => a.action)).toEqual(['sample.imported', 'sample.imported'])
  })

  // The database refuses the third row (a trigger installed for this test only), after the first
  // two were written inside the import's transaction: all of them must be gone, their audit rows
  // too, and the codes they drew are not handed out again.
  it('rolls the whole import back when the database fails halfway', async () => {
    const tag = unique()
    const db = testDb()
    await db.raw(`
      create or replace function test_refuse_sample() returns trigger language plpgsql as $$
      begin
        if new.name like '%refused by database' then raise exception 'refused for the test'; end if;
        return new;
      end $$;
      create trigger test_refuse_sample before insert on samples for each row execute function test_refuse_sample();
    `)
    const seqBefore = Number((await db.raw('select last_value from sample_code_seq')).rows[0].last_value)
    try {
      const r = await post(csv(`${tag} one,Gold,Au,foil,200,,,Au 1,atom`, `${tag} two,Gold,Au,foil,200,,,Au 1,atom`, `${tag} refused by database,Gold,Au,foil,200,,,Au 1,atom`), false)
      expect(r.status).toBe(500)
    } finally {
      await db.raw('drop trigger if exists test_refuse_sample on samples; drop function if exists test_refuse_sample()')
    }
    expect(await samplesNamed(tag)).toEqual([])
    expect(await db('audit_log').where('action', 'sample.imported').whereRaw(`after->>'name' like ?`, [`${tag}%`])).toEqual([])
    const next = await manager.post('/api/samples', { name: `${tag} after`, material: 'Gold', form: 'foil' })
    expect(Number(next.body.code.slice(7))).toBeGreaterThan(seqBefore + 3)
  })
})
