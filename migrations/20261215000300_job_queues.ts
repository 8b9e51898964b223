import type { Knex } from 'knex'

// The queues, created by the owner: pg-boss makes a partition table per queue, which the app's
// least-privileged role could not. Names and options live in shared/jobs.ts (the app's workers read
// the same list); `__pgboss__send-it` is pg-boss's own queue for cron schedules.
import { JOB_QUEUES } from '../shared/jobs'

export async function up(knex: Knex): Promise<void> {
  for (const q of [...JOB_QUEUES, { name: '__pgboss__send-it', policy: 'standard' }]) {
    await knex.raw('select pgboss.create_queue(?, ?::json)', [q.name, JSON.stringify(q)])
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const q of [...JOB_QUEUES, { name: '__pgboss__send-it' }]) await knex.raw('select pgboss.delete_queue(?)', [q.name])
}
