import { CAN } from '#shared/auth/roles'
import { CheckoutListQuery } from '#shared/schemas/custody'

// "My check-outs" and "Overdue": the open check-outs a technician or manager works from.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.custody)
  const { scope } = queryValid(event, CheckoutListQuery)
  const items = await openCheckouts(useDb(), scope, user.id)
  return { scope, items }
})
