import type { Knex } from 'knex'

// Custody by people: a check-out event names its holder as a person of the lab (holder_user_id)
// or as an external user (holder_name + holder_institution), with its due date as a column, so
// "who has what, due when" is a query rather than a look inside JSON. custody_events is
// append-only: the columns are added empty and earlier rows are left as they were (their holder
// stays in details).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('custody_events', (t) => {
    t.text('holder_user_id').references('id').inTable('users')
    t.text('holder_name')
    t.text('holder_institution')
    t.date('due_back')
    t.index(['holder_user_id'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('custody_events', (t) => {
    t.dropIndex(['holder_user_id'])
    t.dropColumns('holder_user_id', 'holder_name', 'holder_institution', 'due_back')
  })
}
