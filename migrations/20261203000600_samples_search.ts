import type { Knex } from 'knex'

// The list search matches a term anywhere in code, name, material, formula, supplier or lot.
// One generated column holds them all (lower-cased), and a trigram GIN index on it answers
// `search_text LIKE '%term%'` without reading every row. Locations are matched separately
// (they live in their own table, which a generated column cannot read).
export async function up(knex: Knex): Promise<void> {
  await knex.raw(`
    alter table samples add column search_text text generated always as (
      lower(code || ' ' || name || ' ' || material || ' ' || coalesce(formula, '') || ' ' || coalesce(supplier, '') || ' ' || coalesce(lot, ''))
    ) stored
  `)
  await knex.raw('create index samples_search_trgm on samples using gin (search_text gin_trgm_ops)')
  await knex.raw('create index locations_search_trgm on locations using gin ((lower(code || \' \' || name)) gin_trgm_ops)')
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop index if exists locations_search_trgm')
  await knex.raw('alter table samples drop column if exists search_text')
}
