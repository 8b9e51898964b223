import type { Knex } from 'knex'

// Recorded species and their frozen results. A species is an element, a charge state and
// optionally a mass number; each result is the engine's record as it stood, with the engine
// version and methods that produced it, so an answer given today can be read back unchanged.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('species', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.integer('z').notNullable()
    t.integer('charge').notNullable()
    t.integer('mass_number')
    t.text('label').notNullable()
    t.text('spectroscopic').notNullable()
    t.text('symbol').notNullable()
    t.text('element_name').notNullable()
    t.text('isoelectronic')
    t.text('created_by').references('id').inTable('users')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['z', 'charge'])
    t.index(['isoelectronic'])
  })
  await knex.raw(`
    alter table species
      add constraint species_z_check check (z between 1 and 118),
      add constraint species_charge_check check (charge between -1 and z),
      add constraint species_mass_check check (mass_number is null or mass_number >= z);
    create unique index species_identity on species (z, charge, coalesce(mass_number, 0));
  `)
  await knex.schema.createTable('species_results', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('species_id').notNullable().references('id').inTable('species').onDelete('CASCADE')
    t.text('engine_version').notNullable()
    t.specificType('methods', 'text[]').notNullable()
    t.jsonb('result').notNullable()
    t.text('recorded_by').references('id').inTable('users')
    t.timestamp('recorded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.unique(['species_id', 'engine_version'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('species_results')
  await knex.schema.dropTableIfExists('species')
}
