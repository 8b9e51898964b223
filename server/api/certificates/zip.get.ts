import { GUARDED_CSV } from '#shared/csv/safe'
import { once } from 'node:events'
import { ZipArchive } from 'archiver'
import { stringify } from 'csv-stringify/sync'
import { CAN } from '#shared/auth/roles'
import { CertificateZipQuery } from '#shared/schemas/certificates'

// The PDFs of the certificates issued in a period (UTC days, both ends included), as one zip
// with a manifest.csv of numbers, statuses and digests. Streamed: each PDF is fetched from the
// object store only when the archive is ready for it, so memory stays flat however many there are.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readCertificates)
  const q = queryValid(event, CertificateZipQuery)
  const db = useDb()
  const query = certificatesQuery(db).select('c.id', 'c.number', 'c.version', 'c.status', 'c.subject_type', 'c.subject_label', 'c.issued_at', 'c.sha256', 'c.pdf_sha256', 'c.object_key', 'iu.name as issuer_name')
  if (q.from) query.whereRaw(`c.issued_at >= (?::date)::timestamp at time zone 'UTC'`, [q.from])
  if (q.to) query.whereRaw(`c.issued_at < (?::date + 1)::timestamp at time zone 'UTC'`, [q.to])
  if (q.status) query.where('c.status', q.status)
  const rows = await query.orderBy('c.issued_at').orderBy('c.number')

  const bucket = await useBucket()
  const store = useObjectStore()
  // Stored, not deflated: PDFs are compressed already.
  const archive = new ZipArchive({ store: true })
  const period = `${q.from ?? 'start'}_to_${q.to ?? 'now'}`
  setResponseHeaders(event, {
    'Content-Type': 'application/zip',
    'Content-Disposition': `attachment; filename="ionfolio-certificates-${period}.zip"`,
    'Cache-Control': 'private, no-store',
  })
  const fill = async () => {
    for (const r of rows) {
      const pdf = await store.getObject(bucket, r.object_key)
      archive.append(pdf, { name: `${r.number}-v${r.version}.pdf`, date: new Date(r.issued_at) })
      await once(archive, 'entry')
    }
    const manifest = stringify(
      rows.map((r) => [r.number, r.version, r.status, r.subject_type, r.subject_label, new Date(r.issued_at).toISOString(), r.issuer_name ?? '', r.sha256, r.pdf_sha256, `${r.number}-v${r.version}.pdf`]),
      { ...GUARDED_CSV, header: true, columns: ['number', 'version', 'status', 'subject_type', 'subject', 'issued_at', 'issued_by', 'content_sha256', 'pdf_sha256', 'file'] },
    )
    archive.append(manifest, { name: 'manifest.csv' })
    await archive.finalize()
  }
  fill().catch((e) => {
    console.error('Certificate zip stopped:', e instanceof Error ? e.message : e)
    archive.abort()
    event.node.res.destroy()
  })
  return sendStream(event, archive as unknown as ReadableStream)
})
