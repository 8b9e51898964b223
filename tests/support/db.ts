import knexFactory, { type Knex } from 'knex'

let knex: Knex | null = null

/** Direct superuser access to the throwaway test database, for fixtures and checks the API cannot make. */
export function testDb(): Knex {
  if (!process.env.IONFOLIO_TEST_ADMIN_DATABASE_URL || !process.env.IONFOLIO_TEST_BASE_URL) throw new Error('run through `npm test`: the test database is not set up')
  knex ??= knexFactory({ client: 'pg', connection: process.env.IONFOLIO_TEST_ADMIN_DATABASE_URL, pool: { min: 0, max: 2 } })
  return knex
}

/** Closes the pool (call in afterAll). */
export async function closeTestDb(): Promise<void> {
  await knex?.destroy()
  knex = null
}
