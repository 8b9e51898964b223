import type { Knex } from 'knex'

// Personal API tokens. Only the SHA-256 of the secret is kept (the secret is 256 random bits, so
// a fast hash is enough: nothing to guess); `prefix` is the secret's first characters, shown in
// lists so a person can tell their tokens apart. `api_token_addresses` remembers every address a
// token was used from, so the first use from a new one is audited exactly once.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('api_tokens', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.text('user_id').notNullable().references('id').inTable('users').onDelete('CASCADE')
    t.text('name').notNullable()
    t.text('scope').notNullable()
    t.text('secret_hash').notNullable().unique()
    t.text('prefix').notNullable()
    t.date('expires_on').notNullable()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('last_used_at', { useTz: true })
    t.text('last_used_address')
    t.timestamp('revoked_at', { useTz: true })
    t.text('revoked_by').references('id').inTable('users')
    t.index(['user_id'])
  })
  await knex.raw(`alter table api_tokens add constraint api_tokens_scope_check check (scope in ('read', 'read-write'))`)
  await knex.schema.createTable('api_token_addresses', (t) => {
    t.uuid('token_id').notNullable().references('id').inTable('api_tokens').onDelete('CASCADE')
    t.text('address').notNullable()
    t.timestamp('first_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.primary(['token_id', 'address'])
  })
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('api_token_addresses')
  await knex.schema.dropTableIfExists('api_tokens')
}
