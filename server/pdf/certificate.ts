/**
 * The certificate PDF, drawn from the frozen payload alone: what is printed is what was hashed.
 * A4, one column, the ISO Guide 31 headings in the order of PAYLOAD HEADINGS, the QR code and
 * the SHA-256 on the first page, and "page x of y" with the number on every page.
 */
import { HEADINGS } from '../../shared/certificates/payload'
import type { SamplePayload } from '../../shared/certificates/sample-payload'
import type { SpeciesPayload } from '../../shared/certificates/species-payload'
import { formatDay, formatInstant } from '../../shared/certificates/format'
import { runs } from './fonts'
import { mm } from './layout'
import { qrPathVector } from './qr'
import { heading, para, INK, MUTED } from './certificate-parts'
import { sampleSections } from './certificate-sample'
import { speciesSections } from './certificate-species'

export type CertificatePayload = SamplePayload | SpeciesPayload

const MARGIN = { side: 18, top: 16, bottom: 16 }
const QR_MM = 32
const A4_WIDTH_MM = 210

function titleBlock(p: CertificatePayload, verifyUrl: string, digest: string) {
  const subject = p.subject.type === 'sample' ? `Sample ${p.subject.code} — ${p.subject.name}` : `Species ${p.subject.label} (${p.subject.spectroscopic})`
  return {
    columns: [
      {
        width: '*',
        stack: [
          { text: runs(p.issuer.laboratory), fontSize: 13, bold: true, color: INK },
          { text: 'Certificate issued through Ionfolio', fontSize: 8, color: MUTED, margin: [0, 0, 0, 8] },
          { text: runs(p.title), fontSize: 17, bold: true },
          { text: [{ text: runs(p.number, 'Mono'), bold: true }, `   version ${p.version}   ·   issued ${formatDay(p.issued.at)}`], fontSize: 10, margin: [0, 3, 0, 6] },
          { text: runs(subject), fontSize: 10, bold: true },
          { text: [{ text: 'SHA-256 ', bold: true }, { text: digest, font: 'Mono' }], fontSize: 6.6, color: MUTED, margin: [0, 3, 0, 0] },
        ],
      },
      // The QR code is drawn at a fixed place on page 1 (below); this column keeps its room.
      {
        width: mm(QR_MM),
        stack: [
          { canvas: [qrPathVector(verifyUrl, mm(A4_WIDTH_MM - MARGIN.side - QR_MM), mm(MARGIN.top), mm(QR_MM))], absolutePosition: { x: 0, y: 0 } },
          { text: 'Scan to verify', fontSize: 7, color: MUTED, alignment: 'center', margin: [0, mm(QR_MM), 0, 0] },
        ],
      },
    ],
    columnGap: mm(6),
    margin: [0, 0, 0, 6],
  }
}

function replacesNotice(p: CertificatePayload) {
  if (!p.replaces) return []
  return [
    {
      table: {
        widths: ['*'],
        body: [[{ text: runs(`This version replaces certificate ${p.replaces.number} version ${p.replaces.version}, which is superseded. Reason: ${p.replaces.reason}`), fontSize: 8.5 }]],
      },
      layout: { hLineWidth: () => 0.8, vLineWidth: () => 0.8, hLineColor: () => INK, vLineColor: () => INK, paddingTop: () => 4, paddingBottom: () => 4, paddingLeft: () => 6, paddingRight: () => 6 },
      margin: [0, 0, 0, 6],
    },
  ]
}

function closing(p: CertificatePayload, digest: string, verifyPage: string) {
  return [
    heading(HEADINGS.issuedBy),
    para(`${p.issued.by.name}, ${p.issued.by.role}, for ${p.issuer.laboratory}, on ${formatInstant(p.issued.at)}. Issued electronically; the record in Ionfolio stands in place of a handwritten signature.`),
    heading(HEADINGS.verification),
    para(`Check this certificate at ${verifyPage} or by scanning the QR code: the page answers genuine, superseded, revoked or unknown. The SHA-256 below is computed over the certificate's content (its canonical JSON, keys sorted) as frozen at issue.`),
    { text: [{ text: 'SHA-256  ', bold: true }, { text: digest, font: 'Mono' }], fontSize: 7.4, margin: [0, 1, 0, 0] },
  ]
}

/** The pdfmake document of a certificate: `verifyUrl` is what the QR code carries, `verifyPage` the address printed. */
export function certificateDocument(p: CertificatePayload, digest: string, verifyUrl: string, verifyPage: string): Record<string, unknown> {
  const body = p.subject.type === 'sample' ? sampleSections(p as SamplePayload) : speciesSections(p as SpeciesPayload)
  return {
    pageSize: 'A4',
    pageMargins: [mm(MARGIN.side), mm(MARGIN.top), mm(MARGIN.side), mm(MARGIN.bottom)],
    info: { title: `${p.number} version ${p.version}: ${p.title}`, author: p.issuer.laboratory, subject: p.subject.type === 'sample' ? p.subject.code : p.subject.label, creator: 'Ionfolio', producer: 'Ionfolio', creationDate: new Date(p.issued.at) },
    defaultStyle: { font: 'Inter', fontSize: 8.5, lineHeight: 1.18, color: '#1b1f20' },
    styles: {
      heading: { fontSize: 9.5, bold: true, color: INK, margin: [0, 5, 0, 2] },
      th: { bold: true, fontSize: 7.5, color: '#33413f' },
      small: { fontSize: 7.5, color: MUTED },
    },
    // A heading never ends a page: it moves over to the section it heads.
    pageBreakBefore: (node: { headlineLevel?: number }, following: unknown[]) => node.headlineLevel === 1 && following.length === 0,
    footer: (page: number, pages: number) => ({
      columns: [
        { text: [{ text: runs(p.number, 'Mono') }, ` · version ${p.version} · `, { text: runs(p.issuer.laboratory) }], alignment: 'left' },
        { text: `Page ${page} of ${pages}`, alignment: 'right', width: 'auto' },
      ],
      fontSize: 7.5,
      color: MUTED,
      margin: [mm(MARGIN.side), mm(6), mm(MARGIN.side), 0],
    }),
    content: [titleBlock(p, verifyUrl, digest), ...replacesNotice(p), ...body, ...closing(p, digest, verifyPage)],
  }
}
