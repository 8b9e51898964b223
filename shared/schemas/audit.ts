import { z } from 'zod'
import { ListQuery } from './common'
import { ACTION_KIND_NAMES } from '../audit/actions'

/** A record whose whole story the audit page shows: "sample:<uuid>", "certificate:<uuid>", "user:<id>". */
export const RECORD_TYPES = ['sample', 'certificate', 'species', 'user', 'invitation', 'location'] as const
export const AuditRecord = z
  .string()
  .max(140)
  .regex(new RegExp(`^(${RECORD_TYPES.join('|')}):[A-Za-z0-9-]{1,100}$`), 'Give a record as type:id, e.g. sample:<id>')

const Flag = z.enum(['true', 'false', '1', '0', '']).transform((v) => v === 'true' || v === '1')

export const AuditQuery = ListQuery.extend({
  action: z.string().max(60).optional(),
  kind: z.enum(ACTION_KIND_NAMES, { message: `Kind must be one of: ${ACTION_KIND_NAMES.join(', ')}` }).or(z.literal('')).optional(),
  record: AuditRecord.or(z.literal('')).optional(),
  entityType: z.string().max(40).optional(),
  entityId: z.string().max(100).optional(),
  actor: z.string().trim().max(254).optional(),
  signIns: Flag.optional(),
  from: z.iso.date().or(z.literal('')).optional(),
  to: z.iso.date().or(z.literal('')).optional(),
  format: z.enum(['json', 'csv']).default('json'),
})
export type AuditQueryInput = z.infer<typeof AuditQuery>
