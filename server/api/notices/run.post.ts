import { CAN } from '#shared/auth/roles'

// Runs the daily notices now, as the schedule would: for a manager who wants them out at once,
// and for the tests. Safe to repeat: a notice already sent is not sent again.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.runNotices)
  const { result } = await runTask('notices:daily')
  const counts = result as Awaited<ReturnType<typeof runDailyNotices>>
  await writeAudit(useDb(), event, { action: 'notices.run', entityType: 'notices', after: counts })
  return counts
})
