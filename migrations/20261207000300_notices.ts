import type { Knex } from 'knex'

// Notices sent by e-mail. The key names what a notice is about (a certificate, a sample and its
// re-certify-by date, a check-out and its due date): the unique (kind, key) lets only one app
// instance claim a notice, so each goes out once however many instances run the daily task.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('notices', (t) => {
    t.bigIncrements('id')
    t.text('kind').notNullable()
    t.text('key').notNullable()
    t.specificType('recipients', 'text[]').notNullable()
    t.text('subject').notNullable()
    t.timestamp('sent_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.unique(['kind', 'key'])
    t.index(['sent_at'])
  })
  await knex.raw(`alter table notices add constraint notices_kind_check check (kind in ('certificate_issued', 'certificate_revoked', 'recertification_due', 'checkout_overdue'))`)
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('notices')
}
