import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import knexFactory, { type Knex } from 'knex'
import { everyone } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { certifiableSample, issue } from '../support/certificates'

// Everything here runs through the app's own connection string (NUXT_DATABASE_URL, the role the
// server logs in as): what these statements cannot do, no bug or injection in the app can do.
let app: Knex
let certId: string
beforeAll(async () => {
  app = knexFactory({ client: 'pg', connection: process.env.NUXT_DATABASE_URL, pool: { min: 0, max: 1 } })
  const { manager } = await everyone()
  certId = (await issue(manager, 'sample', (await certifiableSample(manager)).id)).id
})
afterAll(async () => {
  await app?.destroy()
  await closeTestDb()
})

/** Runs `sql` in a transaction that is always rolled back, so a statement that wrongly passes changes nothing. */
async function attempt(sql: string, bindings: unknown[] = []): Promise<void> {
  await app.transaction(async (trx) => {
    await trx.raw(sql, bindings as Knex.RawBinding[])
    throw new Error('passed')
  })
}

describe('the app role', () => {
  it('is a login that is not a superuser, creates nothing and owns nothing', async () => {
    const { rows } = await app.raw(`
      select r.rolname, r.rolsuper, r.rolcreatedb, r.rolcreaterole, r.rolbypassrls, r.rolreplication,
        (select count(*)::int from pg_class c where c.relowner = r.oid) as owned_relations,
        (select count(*)::int from pg_proc p where p.proowner = r.oid) as owned_functions,
        has_database_privilege(current_database(), 'create') as db_create,
        has_database_privilege(current_database(), 'temporary') as db_temp,
        has_schema_privilege('public', 'create') as schema_create
      from pg_roles r where r.rolname = current_user`)
    expect(rows[0].rolname).not.toBe('postgres')
    expect(rows[0]).toMatchObject({ rolsuper: false, rolcreatedb: false, rolcreaterole: false, rolbypassrls: false, rolreplication: false, owned_relations: 0, owned_functions: 0, db_create: false, db_temp: false, schema_create: false })
  })

  it.each([
    ['turn triggers off for the session', 'set local session_replication_role = replica', /permission denied/],
    ['disable the audit trigger', 'alter table audit_log disable trigger audit_log_no_update_delete', /must be owner/],
    ['disable every custody trigger', 'alter table custody_events disable trigger all', /must be owner/],
    ['drop the audit trigger', 'drop trigger audit_log_no_update_delete on audit_log', /must be owner/],
    ['drop the certificate guard', 'drop trigger certificates_guard on certificates', /must be owner/],
    ['truncate custody_events', 'truncate custody_events', /permission denied/],
    ['truncate audit_log', 'truncate audit_log', /permission denied/],
    ['truncate certificates', 'truncate certificates cascade', /permission denied/],
    ['update audit_log', `update audit_log set action = 'rewritten'`, /permission denied/],
    ['delete from audit_log', 'delete from audit_log', /permission denied/],
    ['update custody_events', `update custody_events set kind = 'moved'`, /permission denied/],
    ['delete from custody_events', 'delete from custody_events', /permission denied/],
    ['rewrite a certificate payload', `update certificates set payload = '{}'::jsonb`, /permission denied/],
    ['rewrite a certificate digest', `update certificates set pdf_sha256 = repeat('0', 64)`, /permission denied/],
    ['delete a certificate', 'delete from certificates', /permission denied/],
    ['create a table', 'create table evil (x int)', /permission denied/],
    ['create a temporary table', 'create temporary table evil (x int)', /permission denied/],
    ['create a function', `create function evil() returns int language sql as 'select 1'`, /permission denied/],
    ['create a schema', 'create schema evil', /permission denied/],
    ['drop a table', 'drop table samples cascade', /must be owner/],
    ['alter a table', 'alter table samples add column evil int', /must be owner/],
    ['read the migration ledger', 'select * from knex_migrations', /permission denied/],
    ['become the superuser', 'set role postgres', /permission denied/],
    ['become the owner', 'set role ionfolio_owner', /permission denied/],
    ['change its own attributes', 'alter role current_user superuser', /permission denied|must be superuser/],
  ])('refuses to %s', async (_what, sql, refusal) => {
    await expect(attempt(sql)).rejects.toThrow(refusal)
  })

  it('may still make the one status move of an issued certificate (and nothing else on it)', async () => {
    const { rows } = await app.raw(`select id from users where role = 'manager' limit 1`)
    await app.transaction(async (trx) => {
      const moved = await trx('certificates').where({ id: certId }).update({ status: 'revoked', revoked_at: trx.fn.now(), revoked_by: rows[0].id, revoke_reason: 'privilege test' }).returning('status')
      expect(moved).toEqual([{ status: 'revoked' }])
      await trx.rollback()
    }).catch((e) => {
      if (!(e instanceof Error) || !/rollback/i.test(e.message)) throw e
    })
    await expect(attempt(`update certificates set subject_label = 'forged' where id = ?`, [certId])).rejects.toThrow(/permission denied/)
    expect((await testDb()('certificates').where({ id: certId }).first()).status).toBe('issued')
  })

  it('reads and appends rows as the app needs to', async () => {
    const [row] = await app('audit_log').insert({ action: 'test.privileges', entity_type: 'test' }).returning('id')
    expect(row.id).toBeDefined()
    expect(Number((await app('samples').count({ n: '*' }).first())!.n)).toBeGreaterThan(0)
  })
})

describe('the local cluster', () => {
  // Every login needs its own password, on TCP and on the socket: holding the app's login (or
  // reading this repository) is no way into the superuser's or the owner's.
  const withPassword = (url: string, password: string | null) => {
    const u = new URL(url)
    u.password = password ?? ''
    return u.toString()
  }
  const refused = async (connection: string) => {
    const db = knexFactory({ client: 'pg', connection, pool: { min: 0, max: 1 }, acquireConnectionTimeout: 5_000 })
    try {
      await db.raw('select 1')
      return false
    } catch (e) {
      return /password authentication failed|no password supplied|SASL|password must be a string/i.test(String((e as Error).message))
    } finally {
      await db.destroy()
    }
  }

  it('refuses the superuser, the owner and the app without their passwords or with the app password', async () => {
    const admin = process.env.IONFOLIO_TEST_ADMIN_DATABASE_URL!
    const owner = process.env.IONFOLIO_TEST_OWNER_DATABASE_URL!
    const appUrl = process.env.NUXT_DATABASE_URL!
    const appPassword = new URL(appUrl).password
    expect(appPassword.length).toBeGreaterThanOrEqual(32)
    expect(await refused(withPassword(admin, null))).toBe(true)
    expect(await refused(withPassword(admin, appPassword))).toBe(true)
    expect(await refused(withPassword(owner, appPassword))).toBe(true)
    expect(await refused(withPassword(owner, 'ionfolio-owner-local'))).toBe(true)
    expect(await refused(withPassword(appUrl, 'not-the-password'))).toBe(true)
    // and the real passwords do get in (so the refusals above are about the password)
    expect(await refused(appUrl)).toBe(false)
    expect(await refused(owner)).toBe(false)
  })

  it('has no trust rule left in pg_hba.conf', async () => {
    const { readFileSync } = await import('node:fs')
    const rules = readFileSync(`${process.env.IONFOLIO_TEST_PG_DATA}/pg_hba.conf`, 'utf8').split('\n').filter((l) => l.trim() && !l.trim().startsWith('#'))
    expect(rules.length).toBeGreaterThan(0)
    expect(rules.filter((l) => /\btrust\b/.test(l))).toEqual([])
  })
})

describe('a table a later migration makes append-only', () => {
  it('is protected by the same triggers and revokes (migrations/lib/append-only.ts)', async () => {
    const admin = testDb()
    const { makeAppendOnly } = await import('../../migrations/lib/append-only')
    const owner = knexFactory({ client: 'pg', connection: process.env.IONFOLIO_TEST_OWNER_DATABASE_URL, pool: { min: 0, max: 1 } })
    try {
      await owner.raw('drop table if exists test_ledger')
      // Made by the owner, as a migration would: the default privileges give the app its rows.
      await owner.raw('create table test_ledger (id serial primary key, note text)')
      await makeAppendOnly(owner, 'test_ledger')
      await app('test_ledger').insert({ note: 'first' })
      expect(await app('test_ledger').select('note')).toEqual([{ note: 'first' }])
      await expect(attempt(`update test_ledger set note = 'x'`)).rejects.toThrow(/permission denied/)
      await expect(attempt('truncate test_ledger')).rejects.toThrow(/permission denied/)
      // The triggers bind the owner too.
      await expect(owner.raw('truncate test_ledger')).rejects.toThrow(/test_ledger is append-only: TRUNCATE/)
      await expect(owner.raw('delete from test_ledger')).rejects.toThrow(/test_ledger is append-only: DELETE/)
    } finally {
      await admin.raw('drop table if exists test_ledger')
      await owner.destroy()
    }
  })
})
