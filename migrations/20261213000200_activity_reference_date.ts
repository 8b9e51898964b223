import type { Knex } from 'knex'

// The date a radioactive sample's recorded activity refers to, so the inventory can correct it for decay.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('samples', (t) => {
    t.date('activity_reference_on')
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('samples', (t) => {
    t.dropColumn('activity_reference_on')
  })
}
