import type { Knex } from 'knex'

// People, their sessions (Lucia's tables), invitations, failed sign-ins for rate limiting, and
// the append-only audit trail that every later write records itself in.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('users', (t) => {
    t.text('id').primary()
    t.text('email').notNullable()
    t.text('name').notNullable()
    t.text('role').notNullable()
    t.text('password_hash').notNullable()
    t.boolean('active').notNullable().defaultTo(true)
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.timestamp('deactivated_at', { useTz: true })
  })
  await knex.raw(`alter table users add constraint users_role_check check (role in ('manager', 'scientist', 'technician', 'auditor'))`)
  await knex.raw('create unique index users_email_unique on users (lower(email))')

  await knex.schema.createTable('sessions', (t) => {
    t.text('id').primary()
    t.text('user_id').notNullable().references('id').inTable('users').onDelete('CASCADE')
    t.timestamp('expires_at', { useTz: true }).notNullable()
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['user_id'])
  })

  await knex.schema.createTable('invitations', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.text('email').notNullable()
    t.text('name').notNullable()
    t.text('role').notNullable()
    t.text('token_hash').notNullable().unique()
    t.text('invited_by').notNullable().references('id').inTable('users')
    t.timestamp('expires_at', { useTz: true }).notNullable()
    t.timestamp('accepted_at', { useTz: true })
    t.timestamp('revoked_at', { useTz: true })
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
  })
  await knex.raw(`alter table invitations add constraint invitations_role_check check (role in ('manager', 'scientist', 'technician', 'auditor'))`)

  await knex.schema.createTable('sign_in_failures', (t) => {
    t.bigIncrements('id')
    t.text('email').notNullable()
    t.text('address').notNullable()
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['email', 'at'])
    t.index(['address', 'at'])
  })

  await knex.schema.createTable('audit_log', (t) => {
    t.bigIncrements('id')
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.text('actor_id').references('id').inTable('users')
    t.text('actor_email')
    t.text('action').notNullable()
    t.text('entity_type').notNullable()
    t.text('entity_id')
    t.jsonb('before')
    t.jsonb('after')
    t.text('address')
    t.index(['entity_type', 'entity_id'])
    t.index(['at'])
    t.index(['actor_id'])
  })
  // Append-only in the database itself, so no code path (or person with psql) can rewrite it.
  await knex.raw(`
    create function audit_log_refuse_change() returns trigger language plpgsql as $$
    begin
      raise exception 'audit_log is append-only: % is not allowed', tg_op using errcode = 'insufficient_privilege';
    end $$;
    create trigger audit_log_no_update_delete before update or delete on audit_log
      for each row execute function audit_log_refuse_change();
    create trigger audit_log_no_truncate before truncate on audit_log
      for each statement execute function audit_log_refuse_change();
  `)
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop table if exists audit_log')
  await knex.raw('drop function if exists audit_log_refuse_change()')
  await knex.schema.dropTableIfExists('sign_in_failures')
  await knex.schema.dropTableIfExists('invitations')
  await knex.schema.dropTableIfExists('sessions')
  await knex.schema.dropTableIfExists('users')
}
