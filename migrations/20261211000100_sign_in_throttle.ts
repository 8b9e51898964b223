import type { Knex } from 'knex'

// Sign-in limits as one row per account and per address, counted with single atomic upserts, so
// parallel attempts cannot slip past the limit. The failure history itself stays in
// sign_in_failures and the audit trail; nothing here is the record, only the counters.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sign_in_throttle', (t) => {
    t.text('key').primary()
    t.integer('attempts').notNullable().defaultTo(0)
    t.timestamp('window_start', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('locked_until', { useTz: true })
    t.integer('lockouts').notNullable().defaultTo(0)
    t.timestamp('last_lockout', { useTz: true })
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('sign_in_throttle')
}
