import type { Knex } from 'knex'

// The open check-out names its holder the same way as its custody event: a person of the lab
// (holder_user_id) or an external user with their institution. `holder` keeps the display name
// (the person's name at check-out time), so older rows and the notices read as before.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sample_checkouts', (t) => {
    t.text('holder_user_id').references('id').inTable('users')
    t.text('holder_institution')
    t.index(['holder_user_id'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('sample_checkouts', (t) => {
    t.dropIndex(['holder_user_id'])
    t.dropColumns('holder_user_id', 'holder_institution')
  })
}
