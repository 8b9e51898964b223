import path from 'node:path'
import { existsSync, readFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import type { Knex } from 'knex'

const root = path.dirname(fileURLToPath(import.meta.url))

/**
 * The local demo cluster's logins, written by `npm start` (scripts/lib/services.mjs) with the
 * passwords made for this cluster; used when the environment names no database.
 */
function localLogins(): { app?: string; owner?: string } {
  const file = path.join(root, 'storage', 'database-logins.json')
  return existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : {}
}
const local = process.env.NUXT_DATABASE_URL && process.env.IONFOLIO_MIGRATION_DATABASE_URL ? {} : localLogins()

/** The app's login (the app reads the same NUXT_DATABASE_URL): owns nothing, reads and writes rows. */
export const APP_DATABASE_URL = process.env.NUXT_DATABASE_URL ?? local.app ?? 'postgres://ionfolio_app@127.0.0.1:55432/ionfolio'
/** The owner's login, for migrations and seeds only (scripts/db.ts). */
export const MIGRATION_DATABASE_URL = process.env.IONFOLIO_MIGRATION_DATABASE_URL ?? local.owner ?? 'postgres://ionfolio_owner@127.0.0.1:55432/ionfolio'

/** The database settings the command-line tools use (as the app); scripts/db.ts swaps in the owner. */
const config: Knex.Config = {
  client: 'pg',
  connection: APP_DATABASE_URL,
  pool: { min: 0, max: 5 },
  migrations: { directory: path.join(root, 'migrations'), tableName: 'knex_migrations', loadExtensions: ['.ts'] },
  seeds: { directory: path.join(root, 'seeds'), loadExtensions: ['.ts'] },
}

export default config
