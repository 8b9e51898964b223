import type { Knex } from 'knex'

// Storage places, nested: rooms hold cabinets, cabinets hold shelves. Codes are unique across the
// lab (ignoring letter case) because labels and people name a place by its code alone.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('locations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('parent_id').references('id').inTable('locations').onDelete('RESTRICT')
    t.text('kind').notNullable()
    t.text('code').notNullable()
    t.text('name').notNullable()
    t.text('created_by').references('id').inTable('users')
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['parent_id'])
  })
  await knex.raw(`alter table locations add constraint locations_kind_check check (kind in ('room', 'cabinet', 'shelf'))`)
  await knex.raw(`alter table locations add constraint locations_room_top check ((kind = 'room') = (parent_id is null))`)
  await knex.raw('create unique index locations_code_unique on locations (lower(code))')
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('locations')
}
