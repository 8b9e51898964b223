import type { Knex } from 'knex'

// Results of the SCF solver, one row per species, method and engine version. Solving takes
// tenths of a second per species, so the look-up reads this table and only computes what is missing.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('species_scf_cache', (t) => {
    t.integer('z').notNullable()
    t.integer('charge').notNullable()
    t.text('method').notNullable()
    t.text('engine_version').notNullable()
    t.boolean('converged').notNullable()
    t.jsonb('result').notNullable()
    t.float('seconds').notNullable()
    t.timestamp('computed_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.primary(['z', 'charge', 'method', 'engine_version'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('species_scf_cache')
}
