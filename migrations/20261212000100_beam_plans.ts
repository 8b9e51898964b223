import type { Knex } from 'knex'

// Saved beam plans: the inputs as given, every result the beam engine returned (frozen with its
// version, like a recorded species), the choice made (charge state, its fraction, the magnet
// setting) and the stock it uses — the stripper foil and the sample that sources the element.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('beam_plans', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.text('title').notNullable()
    t.integer('z').notNullable()
    t.integer('mass_number').notNullable()
    t.text('ion_label').notNullable()
    t.double('energy_mev_u').notNullable()
    t.text('medium').notNullable()
    t.integer('charge_state')
    t.double('charge_fraction')
    t.double('rigidity_tm')
    t.uuid('stripper_sample_id').references('id').inTable('samples').onDelete('RESTRICT')
    t.uuid('source_sample_id').references('id').inTable('samples').onDelete('RESTRICT')
    t.text('engine_version').notNullable()
    t.jsonb('inputs').notNullable()
    t.jsonb('result').notNullable()
    t.text('note')
    t.text('created_by').references('id').inTable('users')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['z', 'mass_number'])
    t.index(['stripper_sample_id'])
    t.index(['source_sample_id'])
    t.index(['created_at'])
  })
  await knex.raw(`
    alter table beam_plans
      add constraint beam_plans_z_check check (z between 1 and 118),
      add constraint beam_plans_energy_check check (energy_mev_u > 0),
      add constraint beam_plans_fraction_check check (charge_fraction is null or (charge_fraction >= 0 and charge_fraction <= 1))
  `)
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('beam_plans')
}
