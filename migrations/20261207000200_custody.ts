import type { Knex } from 'knex'

// Custody: every move, check-out, check-in, consumption and condition note of a sample, as an
// append-only list of events; and the check-outs themselves, at most one open per sample, so a
// second check-out cannot slip in even when two phones press the button at once.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('custody_events', (t) => {
    t.bigIncrements('id')
    t.uuid('sample_id').notNullable().references('id').inTable('samples').onDelete('RESTRICT')
    t.text('kind').notNullable()
    t.jsonb('details').notNullable()
    t.text('by').references('id').inTable('users')
    t.timestamp('at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.index(['sample_id', 'at'])
  })
  await knex.raw(`
    alter table custody_events
      add constraint custody_events_kind_check check (kind in ('moved', 'checked_out', 'checked_in', 'consumed', 'condition'));
    create function custody_events_refuse_change() returns trigger language plpgsql as $$
    begin
      raise exception 'custody_events is append-only: % is not allowed', tg_op using errcode = 'insufficient_privilege';
    end $$;
    create trigger custody_events_append_only before update or delete on custody_events
      for each row execute function custody_events_refuse_change();
  `)
  await knex.schema.createTable('sample_checkouts', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'))
    t.uuid('sample_id').notNullable().references('id').inTable('samples').onDelete('RESTRICT')
    t.text('holder').notNullable()
    t.text('run').notNullable()
    t.date('due_back').notNullable()
    t.text('checked_out_by').references('id').inTable('users')
    t.timestamp('checked_out_at', { useTz: true }).notNullable().defaultTo(knex.fn.now())
    t.text('checked_in_by').references('id').inTable('users')
    t.timestamp('checked_in_at', { useTz: true })
  })
  await knex.raw(`
    create unique index sample_checkouts_one_open on sample_checkouts (sample_id) where checked_in_at is null;
    create index sample_checkouts_due on sample_checkouts (due_back) where checked_in_at is null;
  `)
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('sample_checkouts')
  await knex.schema.dropTableIfExists('custody_events')
  await knex.raw('drop function if exists custody_events_refuse_change()')
}
