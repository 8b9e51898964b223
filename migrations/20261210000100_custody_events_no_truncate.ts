import type { Knex } from 'knex'
import { appendOnlyTriggers } from './lib/append-only'

// custody_events refused UPDATE and DELETE but not TRUNCATE, which emptied it in one statement.
// audit_log and certificates refuse TRUNCATE already.
export async function up(knex: Knex): Promise<void> {
  await appendOnlyTriggers(knex, 'custody_events', { rows: false })
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('drop trigger if exists custody_events_refuse_truncate on custody_events')
}
