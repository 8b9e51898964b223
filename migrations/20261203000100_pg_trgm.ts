import type { Knex } from 'knex'

// Trigram matching for the sample search: `ILIKE '%term%'` served by a GIN index instead of a
// scan. The extension ships with Debian's PostgreSQL server package.
export async function up(knex: Knex): Promise<void> {
  await knex.raw('create extension if not exists pg_trgm')
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop extension if exists pg_trgm')
}
