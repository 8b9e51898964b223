import type { Knex } from 'knex'
import PgBoss from 'pg-boss'
import { appRole } from './lib/roles'

// The job queue's schema (pg-boss 10, schema `pgboss`), created here by the database owner
// rather than by the app at start-up: the app starts pg-boss with `migrate: false`, so it
// needs no CREATE right and can run as a least-privileged role. pg-boss's own construction SQL
// is used as is, less its BEGIN/COMMIT (Knex runs every migration in a transaction already).
//
// The app's login role (migrations/lib/roles.ts) gets rows and functions in the schema, not
// objects: usage, SELECT/INSERT/UPDATE/DELETE and EXECUTE, now and, through default privileges,
// for the queue tables the next migration (or a later pg-boss upgrade run as the owner) creates.
// A pg-boss upgrade: add a migration that runs PgBoss.getMigrationPlans(schema, version).
const SCHEMA = 'pgboss'

export async function up(knex: Knex): Promise<void> {
  const plan = PgBoss.getConstructionPlans(SCHEMA)
    .replace(/^\s*BEGIN;/, '')
    .replace(/COMMIT;\s*$/, '')
  await knex.raw(plan)
  const app = await appRole(knex)
  if (!app) return
  await knex.raw(`grant usage on schema ${SCHEMA} to ??`, [app])
  await knex.raw(`grant select, insert, update, delete on all tables in schema ${SCHEMA} to ??`, [app])
  await knex.raw(`grant execute on all functions in schema ${SCHEMA} to ??`, [app])
  await knex.raw(`alter default privileges in schema ${SCHEMA} grant select, insert, update, delete on tables to ??`, [app])
  await knex.raw(`alter default privileges in schema ${SCHEMA} grant execute on functions to ??`, [app])
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`drop schema if exists ${SCHEMA} cascade`)
}
