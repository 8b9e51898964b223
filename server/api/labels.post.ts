import { randomUUID } from 'node:crypto'
import { CAN } from '#shared/auth/roles'
import { LabelsBody } from '#shared/schemas/labels'
import { labelContent } from '#shared/labels/content'
import { isLoopbackUrl } from '#shared/labels/loopback'
import type { SampleForm } from '#shared/samples/vocabulary'
import { labelsDocument } from '../pdf/labels'

// A PDF of container labels, in the order asked (a sample may repeat for several containers).
// Retired samples get none: they have left the stock. Each printed sample gets an audit row
// naming the layout and the print run, so its history shows when its labels were made.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.printLabels)
  const { sampleIds, layout, allowLoopback } = await readValid(event, LabelsBody)
  const db = useDb()
  const distinct = [...new Set(sampleIds)]
  const rows = await db('samples').whereIn('id', distinct)
  if (rows.length !== distinct.length) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'No such sample', data: { missing: distinct.length - rows.length } })
  const retired = rows.filter((r) => r.status === 'retired')
  if (retired.length) throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'Retired samples get no labels', data: { retired: retired.map((r) => r.code) } })
  const base = String(useRuntimeConfig().public.baseUrl)
  // A QR code must never silently point at this machine: the caller confirms first.
  const loopback = isLoopbackUrl(base)
  if (loopback && !allowLoopback) {
    throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'The public address is a loopback one: these QR codes would not open on a phone', data: { reason: 'loopback-address', baseUrl: base } })
  }
  const components = await db('sample_components').whereIn('sample_id', distinct).orderBy('position')
  const byId = new Map(rows.map((r) => [r.id, r]))
  const places = await placesById(db)
  const labels = sampleIds.map((id) => {
    const r = byId.get(id)!
    return labelContent(
      {
        code: r.code,
        name: r.name,
        formula: r.formula,
        form: r.form as SampleForm,
        radioactive: r.radioactive,
        nuclide: r.nuclide,
        hazardStatements: r.hazard_statements,
        place: r.location_id ? (places.get(r.location_id) ?? null) : null,
        components: components.filter((c) => c.sample_id === id).map((c) => ({ z: c.z, massNumber: c.mass_number, fraction: c.fraction, basis: c.fraction_basis, enrichmentPercent: c.enrichment_pct })),
      },
      base,
    )
  })
  const pdf = await renderDocument(labelsDocument(labels, layout, String(useRuntimeConfig().public.labName)))

  const batch = randomUUID()
  await db.transaction(async (trx) => {
    for (const r of rows) {
      await writeAudit(trx, event, { action: 'sample.label-printed', entityType: 'sample', entityId: r.id, after: { code: r.code, layout, copies: sampleIds.filter((id) => id === r.id).length, batch, labelsInBatch: sampleIds.length, ...(loopback ? { loopbackAddress: base } : {}) } })
    }
  })
  setResponseHeaders(event, {
    'Content-Type': 'application/pdf',
    'Content-Disposition': `inline; filename="ionfolio-labels-${layout}-${new Date().toISOString().slice(0, 10)}.pdf"`,
    'Cache-Control': 'private, no-store',
  })
  return pdf
})
