import path from 'node:path'
import { fileURLToPath } from 'node:url'
import type { Knex } from 'knex'

const root = path.dirname(fileURLToPath(import.meta.url))

/** The database settings the command-line tools use; the app reads the same NUXT_DATABASE_URL. */
const config: Knex.Config = {
  client: 'pg',
  connection: process.env.NUXT_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:55432/ionfolio',
  pool: { min: 0, max: 5 },
  migrations: { directory: path.join(root, 'migrations'), tableName: 'knex_migrations', loadExtensions: ['.ts'] },
  seeds: { directory: path.join(root, 'seeds'), loadExtensions: ['.ts'] },
}

export default config
