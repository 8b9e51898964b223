import type { Knex } from 'knex'

// Supplier datasheets and certificates of analysis, stored in the object store; the row holds
// the key and what was checked on upload (type from the content, size, SHA-256).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('datasheets', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('sample_id').notNullable().references('id').inTable('samples').onDelete('RESTRICT')
    t.text('object_key').notNullable().unique()
    t.text('original_name').notNullable()
    t.text('content_type').notNullable()
    t.bigInteger('size_bytes').notNullable()
    t.text('sha256').notNullable()
    t.text('uploaded_by').references('id').inTable('users')
    t.timestamp('uploaded_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['sample_id'])
  })
  await knex.raw(`
    alter table datasheets
      add constraint datasheets_size_check check (size_bytes > 0),
      add constraint datasheets_sha256_check check (sha256 ~ '^[0-9a-f]{64}$')
  `)
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('datasheets')
}
