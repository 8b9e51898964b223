import type { Knex } from 'knex'
import PgBoss from 'pg-boss'

// The job queue's schema (pg-boss 10, schema `pgboss`), created here by the database owner
// rather than by the app at start-up: the app starts pg-boss with `migrate: false`, so it
// needs no CREATE right and can run as a least-privileged role. pg-boss's own construction SQL
// is used as is, less its BEGIN/COMMIT (Knex runs every migration in a transaction already).
//
// The app's role needs to use the schema: this grants it to PUBLIC, or, when
// IONFOLIO_APP_DB_ROLE names the app's role at migration time, to that role only. Default
// privileges cover the queue tables the next migration (or a later pg-boss upgrade run as the
// owner) creates. A pg-boss upgrade: add a migration that runs PgBoss.getMigrationPlans(schema, version).
export const SCHEMA = 'pgboss'

export function appRole(knex: Knex): string {
  const role = process.env.IONFOLIO_APP_DB_ROLE?.trim()
  return role ? knex.raw('??', [role]).toQuery() : 'PUBLIC'
}

export async function up(knex: Knex): Promise<void> {
  const plan = PgBoss.getConstructionPlans(SCHEMA)
    .replace(/^\s*BEGIN;/, '')
    .replace(/COMMIT;\s*$/, '')
  await knex.raw(plan)
  const to = appRole(knex)
  await knex.raw(`grant usage on schema ${SCHEMA} to ${to}`)
  await knex.raw(`grant select, insert, update, delete on all tables in schema ${SCHEMA} to ${to}`)
  await knex.raw(`grant execute on all functions in schema ${SCHEMA} to ${to}`)
  await knex.raw(`alter default privileges in schema ${SCHEMA} grant select, insert, update, delete on tables to ${to}`)
  await knex.raw(`alter default privileges in schema ${SCHEMA} grant execute on functions to ${to}`)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`drop schema if exists ${SCHEMA} cascade`)
}
