import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'
import { CustodyBody } from '#shared/schemas/custody'

// One custody action from the bench card: move, check out, check in, consume, condition note.
// The sample, its custody event and the audit row change together or not at all.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.custody)
  const { id } = paramsValid(event, IdParam)
  const action = await readValid(event, CustodyBody)
  const result = await useDb().transaction((trx) => applyCustody(trx, event, user, id, action))
  setResponseStatus(event, 201)
  return result
})
