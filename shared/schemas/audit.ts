import { z } from 'zod'
import { ListQuery } from './common'

/** GET /api/audit: the list's paging plus filters, and `format=csv` for the whole filtered trail. */
export const AuditQuery = ListQuery.extend({
  action: z.string().max(60).optional(),
  entityType: z.string().max(40).optional(),
  entityId: z.string().max(100).optional(),
  actor: z.string().max(254).optional(),
  from: z.iso.date().optional(),
  to: z.iso.date().optional(),
  format: z.enum(['json', 'csv']).default('json'),
})
