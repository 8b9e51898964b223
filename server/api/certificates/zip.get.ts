import { GUARDED_CSV } from '#shared/csv/safe'
import { once } from 'node:events'
import { ZipArchive } from 'archiver'
import { stringify } from 'csv-stringify/sync'
import { CAN } from '#shared/auth/roles'
import { CertificateZipQuery } from '#shared/schemas/certificates'

// The PDFs of the certificates issued in a period (UTC days, both ends included), as one zip
// with a manifest.csv of numbers, statuses and digests. Streamed: each PDF is fetched from the
// object store only when the archive is ready for it, so memory holds one PDF at a time.
export default defineEventHandler(async (event) => {
  requireRole(event, ...CAN.readCertificates)
  const q = queryValid(event, CertificateZipQuery)
  const db = useDb()
  const query = certificatesQuery(db).select('c.id', 'c.number', 'c.version', 'c.status', 'c.subject_type', 'c.subject_label', 'c.issued_at', 'c.sha256', 'c.pdf_sha256', 'c.pdf_bytes', 'c.object_key', 'iu.name as issuer_name')
  if (q.from) query.whereRaw(`c.issued_at >= (?::date)::timestamp at time zone 'UTC'`, [q.from])
  if (q.to) query.whereRaw(`c.issued_at < (?::date + 1)::timestamp at time zone 'UTC'`, [q.to])
  if (q.status) query.where('c.status', q.status)
  const rows = await query.orderBy('c.issued_at').orderBy('c.number')

  // Every PDF is checked against its record before the answer starts, so a forged or missing one
  // is a clear 502 (with its audit row and mail) rather than a broken download. Each is checked
  // again as it goes into the archive, in case the store changed in between: then the download is
  // cut off, and the forged bytes are never added.
  const verify = (r: (typeof rows)[number]) =>
    readVerified(event, { entityType: 'certificate', entityId: r.id, label: `${r.number} v${r.version}`, key: r.object_key, sha256: r.pdf_sha256, maxBytes: r.pdf_bytes })
  for (const r of rows) await verify(r)
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
      const pdf = await verify(r)
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
