import type { Knex } from 'knex'

// The activity the laboratory's licence allows per nuclide, for one room or (room null) the whole laboratory.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('licence_limits', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.text('nuclide').notNullable()
    t.uuid('location_id').references('id').inTable('locations').onDelete('CASCADE')
    t.double('limit_bq').notNullable()
    t.text('set_by').references('id').inTable('users').onDelete('SET NULL')
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.raw(`
    alter table licence_limits
      add constraint licence_limits_positive check (limit_bq > 0),
      add constraint licence_limits_unique unique nulls not distinct (nuclide, location_id)
  `)
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('licence_limits')
}
