import type { Knex } from 'knex'

// Which samples can source which recorded species (many to many), linked from either side.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sample_species', (t) => {
    t.uuid('sample_id').notNullable().references('id').inTable('samples').onDelete('RESTRICT')
    t.uuid('species_id').notNullable().references('id').inTable('species').onDelete('CASCADE')
    t.text('linked_by').references('id').inTable('users')
    t.timestamp('linked_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.primary(['sample_id', 'species_id'])
    t.index(['species_id'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('sample_species')
}
