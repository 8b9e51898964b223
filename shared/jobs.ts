// The background jobs' queues (pg-boss, through PostgreSQL). The migration
// 20261215000300_job_queues.ts creates them as the database owner; server/utils/jobs.ts works
// them. A new queue: add it here and in a new migration (the app cannot create queues itself).

export const QUEUE = {
  precompute: 'precompute',
  notices: 'notices-daily',
  reconcile: 'object-store-reconcile',
} as const
export type QueueName = (typeof QUEUE)[keyof typeof QUEUE]

export interface QueueOptions {
  name: QueueName
  policy: 'standard'
  retryLimit: number
  retryDelay: number
  retryBackoff: boolean
  expireInSeconds: number
  retentionMinutes: number
}

export const JOB_QUEUES: QueueOptions[] = [
  // One job per batch of species; a batch that fails is tried again, and a species already in the
  // SCF cache is skipped, so a retry never solves anything twice.
  { name: QUEUE.precompute, policy: 'standard', retryLimit: 3, retryDelay: 10, retryBackoff: true, expireInSeconds: 15 * 60, retentionMinutes: 7 * 24 * 60 },
  { name: QUEUE.notices, policy: 'standard', retryLimit: 2, retryDelay: 60, retryBackoff: true, expireInSeconds: 10 * 60, retentionMinutes: 7 * 24 * 60 },
  { name: QUEUE.reconcile, policy: 'standard', retryLimit: 2, retryDelay: 60, retryBackoff: true, expireInSeconds: 30 * 60, retentionMinutes: 7 * 24 * 60 },
]

/** The state names pg-boss uses, for the jobs page. */
export const JOB_STATES = ['created', 'retry', 'active', 'completed', 'cancelled', 'failed'] as const
export type JobState = (typeof JOB_STATES)[number]
