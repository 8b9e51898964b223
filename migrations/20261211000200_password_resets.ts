import type { Knex } from 'knex'

// One-time password reset links: the database keeps only the token's SHA-256, when it expires
// and when it was used. `reactivate` is set when a lab manager sends the link to a deactivated
// person: setting the password then brings the account back.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('password_resets', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.text('user_id').notNullable().references('id').inTable('users')
    t.text('token_hash').notNullable().unique()
    t.timestamp('expires_at', { useTz: true }).notNullable()
    t.timestamp('used_at', { useTz: true })
    t.text('requested_by').references('id').inTable('users')
    t.boolean('reactivate').notNullable().defaultTo(false)
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['user_id', 'created_at'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('password_resets')
}
