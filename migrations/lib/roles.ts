import type { Knex } from 'knex'

/**
 * The app's login role, which migrations grant to: IONFOLIO_APP_ROLE, else the user name in
 * NUXT_DATABASE_URL (the app's connection string). Null when the app would log in as the very role
 * that runs the migrations (a one-role set-up: nothing to grant, and nothing is protected either,
 * so it is announced). Throws when the role does not exist: create it first (README, Settings).
 */
export async function appRole(knex: Knex): Promise<string | null> {
  let name = process.env.IONFOLIO_APP_ROLE
  if (!name) {
    const url = process.env.NUXT_DATABASE_URL ?? 'postgres://ionfolio_app@127.0.0.1/ionfolio'
    name = decodeURIComponent(new URL(url).username) || 'ionfolio_app'
  }
  const { rows } = await knex.raw<{ rows: { me: string; found: boolean }[] }>('select current_user as me, exists (select from pg_roles where rolname = ?) as found', [name])
  if (rows[0].me === name) {
    console.warn(`Migrations and the app both use the role ${name}: the app is not limited by grants (see README, Settings)`)
    return null
  }
  if (!rows[0].found) throw new Error(`The app role ${name} does not exist: create it (LOGIN, owning nothing) before migrating`)
  return name
}
