// The three local services together: PostgreSQL, the object-store stand-in and a mail fake,
// and the NUXT_* environment that points the app at them (`migrationEnv` adds the owner's
// connection for migrations and seeds).
import path from 'node:path'
import { writeFileSync, chmodSync } from 'node:fs'
import { startPostgres, clusterDir } from './postgres.mjs'
import { startObjectStore } from './objectstore.mjs'
import { startMailInbox, startMailSpool } from './mail.mjs'
import { ensureSigningKey } from './signing.mjs'

/** Starts all three; `mail` is 'inbox' (demo, web UI) or 'spool' (tests, JSON files). */
export async function startServices({ storage, ports, database, mail }) {
  const started = []
  const stopAll = async () => {
    for (const s of started.reverse()) await s.stop()
  }
  try {
    const pg = startPostgres({ dir: clusterDir(path.join(storage, 'postgres')), port: ports.postgres })
    started.push(pg)
    pg.ensureDatabase(database)
    pg.ensureRoles(database)
    const store = await startObjectStore({ port: ports.s3, directory: path.join(storage, 'objects') })
    started.push(store)
    const mailer =
      mail === 'inbox'
        ? await startMailInbox({ smtpPort: ports.smtp, webPort: ports.mailWeb, directory: path.join(storage, 'mail') })
        : await startMailSpool({ port: ports.smtp, spool: path.join(storage, 'mail') })
    started.push(mailer)
    const env = {
      NUXT_DATABASE_URL: pg.roleUrl('app', database),
      NUXT_S3_END_POINT: '127.0.0.1',
      NUXT_S3_PORT: String(ports.s3),
      NUXT_S3_USE_SSL: 'false',
      NUXT_S3_ACCESS_KEY: 'S3RVER',
      NUXT_S3_SECRET_KEY: 'S3RVER',
      NUXT_S3_BUCKET: 'ionfolio',
      NUXT_SMTP_HOST: '127.0.0.1',
      NUXT_SMTP_PORT: String(ports.smtp),
      // The local, self-signed certificate-signing key, made on first start (scripts/lib/signing.mjs).
      ...ensureSigningKey(path.join(storage, 'signing')),
    }
    // Migrations and seeds run as the owner; the app gets only `env` and never the owner's login.
    const migrationEnv = { ...env, IONFOLIO_MIGRATION_DATABASE_URL: pg.roleUrl('owner', database) }
    // The command-line tools (precompute, reconcile, audit-verify, db) find this cluster's logins
    // here when no NUXT_DATABASE_URL is set (knex.config.ts); readable by this user only.
    const logins = path.join(storage, 'database-logins.json')
    writeFileSync(logins, JSON.stringify({ app: env.NUXT_DATABASE_URL, owner: migrationEnv.IONFOLIO_MIGRATION_DATABASE_URL }, null, 2) + '\n', { mode: 0o600 })
    chmodSync(logins, 0o600)
    return { pg, store, mailer, env, migrationEnv, adminDatabaseUrl: pg.url(database), stop: stopAll }
  } catch (e) {
    await stopAll()
    throw e
  }
}
