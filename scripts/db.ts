// Database chores for the start/test scripts and for contributors (as the owner role):
//   tsx scripts/db.ts migrate | rollback | status | seed | make NAME
import knexFactory from 'knex'
import config, { MIGRATION_DATABASE_URL } from '../knex.config'

// Migrations and seeds run as the owner role (IONFOLIO_MIGRATION_DATABASE_URL), never as the app.
const [command, ...rest] = process.argv.slice(2)
const knex = knexFactory({ ...config, connection: MIGRATION_DATABASE_URL })

async function main(): Promise<void> {
  switch (command) {
    case 'migrate': {
      const [, done] = await knex.migrate.latest()
      if (done.length) console.log(`Applied ${done.length} migration(s)`)
      break
    }
    case 'rollback': {
      const [, undone] = await knex.migrate.rollback()
      console.log(`Rolled back ${undone.length} migration(s)`)
      break
    }
    case 'status': {
      const [completed, pending] = await knex.migrate.list()
      console.log(`${completed.length} applied, ${pending.length} pending`)
      for (const p of pending) console.log(`  pending: ${p.file}`)
      break
    }
    case 'seed': {
      // Every seed file adds its part of the demo only where that part is still missing (people
      // by e-mail, the stock while there are no samples), so running them again keeps the data of
      // the last run and a database made before a seed existed still gets that seed's part.
      const [files] = await knex.seed.run()
      console.log(`Ran ${files.length} seed file(s)`)
      break
    }
    case 'make': {
      const name = rest[0]
      if (!name || !/^[a-z0-9_]+$/.test(name)) throw new Error('Give the migration a snake_case name: tsx scripts/db.ts make add_x')
      const file = await knex.migrate.make(name, { extension: 'ts' })
      console.log(`Created ${file}`)
      break
    }
    default:
      throw new Error('Usage: tsx scripts/db.ts migrate | rollback | status | seed | make NAME')
  }
}

main()
  .then(() => knex.destroy())
  .catch(async (e: unknown) => {
    console.error(e instanceof Error ? e.message : e)
    await knex.destroy()
    process.exit(1)
  })
