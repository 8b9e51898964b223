import type { Knex } from 'knex'
import { appRole } from './roles'

// Append-only tables are protected twice: triggers that refuse UPDATE, DELETE and TRUNCATE for
// everyone short of a superuser, and grants that never give the app role those privileges in the
// first place. The app role cannot drop or disable the triggers: it owns no table.

/** The one trigger function every append-only table uses; says which table and which operation. */
async function ensureRefuseFunction(knex: Knex): Promise<void> {
  await knex.raw(`
    create or replace function refuse_append_only_change() returns trigger language plpgsql as $$
    begin
      raise exception '% is append-only: % is not allowed', tg_table_name, tg_op using errcode = 'insufficient_privilege';
    end $$;
  `)
}

/**
 * Installs the refusing triggers on `table`: BEFORE TRUNCATE (per statement) always, and BEFORE
 * UPDATE OR DELETE (per row) unless the table has its own row guard already (`rows: false`).
 */
export async function appendOnlyTriggers(knex: Knex, table: string, { rows = true } = {}): Promise<void> {
  await ensureRefuseFunction(knex)
  await knex.raw(`create or replace trigger ?? before truncate on ?? for each statement execute function refuse_append_only_change()`, [`${table}_refuse_truncate`, table])
  if (rows) {
    await knex.raw(`create or replace trigger ?? before update or delete on ?? for each row execute function refuse_append_only_change()`, [`${table}_refuse_update_delete`, table])
  }
}

/** Every table in schema public that refuses TRUNCATE by trigger: the mark of an append-only table. */
export async function appendOnlyTables(knex: Knex): Promise<string[]> {
  const { rows } = await knex.raw<{ rows: { table: string }[] }>(`
    select distinct c.relname as table from pg_trigger t join pg_class c on c.oid = t.tgrelid join pg_namespace n on n.oid = c.relnamespace
    where n.nspname = 'public' and not t.tgisinternal and (t.tgtype & 32) <> 0 order by 1
  `)
  return rows.map((r) => r.table)
}

/**
 * Takes UPDATE, DELETE and TRUNCATE on `tables` away from the app role, which keeps SELECT and
 * INSERT from the default privileges. (A table-level REVOKE also takes column grants away: a
 * table with a permitted status move grants its columns again afterwards, as certificates do.)
 */
export async function revokeChangesFromApp(knex: Knex, tables: string[]): Promise<void> {
  const app = await appRole(knex)
  if (!app) return
  for (const table of tables) await knex.raw('revoke update, delete, truncate on ?? from ??', [table, app])
}

/**
 * Makes `table` append-only: the triggers, and the app role's UPDATE/DELETE/TRUNCATE taken away.
 * Call it in the migration that creates the table (see DEVELOPERS.md, "An append-only table").
 */
export async function makeAppendOnly(knex: Knex, table: string): Promise<void> {
  await appendOnlyTriggers(knex, table)
  await revokeChangesFromApp(knex, [table])
}
