import { CAN } from '#shared/auth/roles'
import { IdParam } from '#shared/schemas/common'
import { WithdrawDatasheetBody } from '#shared/schemas/datasheets'

// Withdraws a datasheet: hidden from the sample and from new certificates, kept with its file,
// audited with the reason. Never while a certificate in force lists it: that certificate vouches
// for the file, so it must be superseded or revoked first.
export default defineEventHandler(async (event) => {
  const user = requireRole(event, ...CAN.manageSamples)
  const { id } = paramsValid(event, IdParam)
  const { reason } = await readValid(event, WithdrawDatasheetBody)
  return useDb().transaction(async (trx) => {
    const sheet = await trx('datasheets').where({ id }).forUpdate().first()
    if (!sheet) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such datasheet' })
    if (sheet.withdrawn_at) throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'This datasheet is already withdrawn' })
    const listing = await certificatesListing(trx, sheet.sample_id, sheet.sha256)
    if (listing.length) {
      throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'A certificate in force lists this datasheet: supersede or revoke it first', data: { reason: 'listed-on-certificate', certificates: listing } })
    }
    const [row] = await trx('datasheets').where({ id }).update({ withdrawn_at: trx.fn.now(), withdrawn_by: user.id, withdrawn_reason: reason }).returning('*')
    const sample = (await trx('samples').where({ id: sheet.sample_id }).first('code'))!
    await writeAudit(trx, event, { action: 'sample.datasheet-withdrawn', entityType: 'sample', entityId: sheet.sample_id, before: { code: sample.code, datasheet: datasheetRecord(sheet) }, after: { code: sample.code, datasheet: datasheetRecord(row!), reason } })
    return { id, withdrawnAt: row!.withdrawn_at, reason }
  })
})
