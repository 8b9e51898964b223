import { stringify } from 'csv-stringify/sync'
import { CAN } from '#shared/auth/roles'
import { InventoryQuery } from '#shared/schemas/samples'
import { HALF_LIFE_SOURCE } from '#shared/radioactivity/decay'

// The radioactive-source inventory: every source's activity today (decay-corrected, daughters
// grown in), per room and for the laboratory, against the licence limits; or the same as CSV.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readInventory)
  const query = queryValid(event, InventoryQuery)
  const inventory = await loadInventory(useDb())
  if (query.format === 'csv') {
    const rows = inventory.sources.flatMap((s) => [
      [s.code, s.name, s.room?.code ?? '', s.nuclide, s.referenceBq, s.referenceDate, inventory.on, Number(s.activityTodayBq.toPrecision(4)), s.halfLifeKnown ? 'decay-corrected' : 'half-life not in the table: as recorded'],
      ...s.daughters.map((d) => [s.code, s.name, s.room?.code ?? '', d.nuclide, '', '', inventory.on, Number(d.activityBq.toPrecision(4)), `daughter of ${s.nuclide}, grown in since the reference date`]),
    ])
    setResponseHeader(event, 'Content-Type', 'text/csv; charset=utf-8')
    setResponseHeader(event, 'Content-Disposition', 'attachment; filename="ionfolio-radioactive-inventory.csv"')
    return stringify(rows, { header: true, columns: ['code', 'name', 'room', 'nuclide', 'reference_activity_bq', 'reference_date', 'on', 'activity_bq', 'basis'] })
  }
  return { ...inventory, halfLifeSource: HALF_LIFE_SOURCE }
})
