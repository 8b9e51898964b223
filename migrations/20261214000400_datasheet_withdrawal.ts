import type { Knex } from 'knex'

// A datasheet can be withdrawn: hidden from the sample page and from new certificates, but kept
// (the row and the stored file), with who withdrew it, when and why. Nothing is ever deleted.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('datasheets', (t) => {
    t.timestamp('withdrawn_at', { useTz: true })
    t.text('withdrawn_by').references('id').inTable('users')
    t.text('withdrawn_reason')
  })
  await knex.raw(`
    alter table datasheets add constraint datasheets_withdrawn_check
      check ((withdrawn_at is null) = (withdrawn_by is null) and (withdrawn_at is null) = (withdrawn_reason is null))
  `)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('alter table datasheets drop constraint if exists datasheets_withdrawn_check')
  await knex.schema.alterTable('datasheets', (t) => {
    t.dropColumns('withdrawn_at', 'withdrawn_by', 'withdrawn_reason')
  })
}
