import { z } from 'zod'

/** POST /api/datasheets/:id/withdraw: why the datasheet is withdrawn (kept in the audit trail). */
export const WithdrawDatasheetBody = z.strictObject({
  reason: z.string({ error: 'Say why the datasheet is withdrawn' }).trim().min(3, 'Say why the datasheet is withdrawn (at least 3 characters)').max(500, 'Use at most 500 characters'),
})
