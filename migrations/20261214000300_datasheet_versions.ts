import type { Knex } from 'knex'

// A datasheet can be replaced by a newer one: the new row names the one it replaces and carries
// the next version number; the old row is kept, marked replaced, and still listed and
// downloadable. Existing rows are version 1 of their own line.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('datasheets', (t) => {
    t.integer('version').notNullable().defaultTo(1)
    t.uuid('replaces_id').references('id').inTable('datasheets').onDelete('RESTRICT')
    t.timestamp('replaced_at', { useTz: true })
    t.unique(['replaces_id'])
  })
  await knex.raw('alter table datasheets add constraint datasheets_version_check check (version >= 1 and (version = 1) = (replaces_id is null))')
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('alter table datasheets drop constraint if exists datasheets_version_check')
  await knex.schema.alterTable('datasheets', (t) => {
    t.dropUnique(['replaces_id'])
    t.dropColumns('version', 'replaces_id', 'replaced_at')
  })
}
