import type { Knex } from 'knex'
import { appRole } from './lib/roles'
import { appendOnlyTables, revokeChangesFromApp } from './lib/append-only'

// The app's login role gets rows, not objects: SELECT/INSERT/UPDATE/DELETE on tables and the use
// of sequences, for the tables there are now and (through default privileges of the owner role
// that runs migrations) for every table a later migration creates. It owns nothing, so it cannot
// alter, drop, disable a trigger or truncate; the append-only tables lose UPDATE/DELETE/TRUNCATE,
// and certificates get back only the columns of their one status move.
const CERTIFICATE_STATUS_COLUMNS = ['status', 'superseded_by', 'superseded_at', 'revoked_at', 'revoked_by', 'revoke_reason']
const MIGRATION_TABLES = ['knex_migrations', 'knex_migrations_lock']

export async function up(knex: Knex): Promise<void> {
  const app = await appRole(knex)
  if (!app) return
  const { rows } = await knex.raw<{ rows: { owner: string }[] }>('select current_user as owner')
  const owner = rows[0].owner
  await knex.raw('grant usage on schema public to ??', [app])
  await knex.raw('alter default privileges for role ?? in schema public grant select, insert, update, delete on tables to ??', [owner, app])
  await knex.raw('alter default privileges for role ?? in schema public grant usage, select on sequences to ??', [owner, app])
  await knex.raw('alter default privileges for role ?? in schema public grant execute on functions to ??', [owner, app])
  await knex.raw('grant select, insert, update, delete on all tables in schema public to ??', [app])
  await knex.raw('grant usage, select on all sequences in schema public to ??', [app])
  await knex.raw('revoke all on ?? from ??', [MIGRATION_TABLES[0], app])
  await knex.raw('revoke all on ?? from ??', [MIGRATION_TABLES[1], app])
  await revokeChangesFromApp(knex, await appendOnlyTables(knex))
  await knex.raw(`grant update (${CERTIFICATE_STATUS_COLUMNS.map(() => '??').join(', ')}) on certificates to ??`, [...CERTIFICATE_STATUS_COLUMNS, app])
}

export async function down(knex: Knex): Promise<void> {
  const app = await appRole(knex)
  if (!app) return
  await knex.raw('alter default privileges in schema public revoke all on tables from ??', [app])
  await knex.raw('alter default privileges in schema public revoke all on sequences from ??', [app])
  await knex.raw('alter default privileges in schema public revoke all on functions from ??', [app])
  await knex.raw('revoke all on all tables in schema public from ??', [app])
  await knex.raw('revoke all on all sequences in schema public from ??', [app])
}
