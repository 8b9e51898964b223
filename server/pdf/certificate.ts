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

const MARGIN = { side: 18, top: 14, bottom: 15 }
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
          { text: [{ text: runs(p.number, 'Mono') }, `   version ${p.version}   ·   issued ${formatDay(p.issued.at)}`], fontSize: 10.5, margin: [0, 3, 0, 5] },
          { text: runs(subject), fontSize: 10, bold: true },
          { text: [{ text: 'SHA-256 ', bold: true }, { text: digest, font: 'Mono' }], fontSize: 7, color: '#33413f', margin: [0, 3, 0, 0] },
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

function closing(p: CertificatePayload, verifyPage: string) {
  return [
    {
      columns: [
        { width: '*', stack: [heading(HEADINGS.issuedBy), para(`${p.issued.by.name}, ${p.issued.by.role}, for ${p.issuer.laboratory}, ${formatInstant(p.issued.at)}. Issued electronically; the Ionfolio record stands in for a signature.`)] },
        {
          width: '*',
          stack: [
            heading(HEADINGS.verification),
            para(`Scan the QR code, or open ${verifyPage} and enter the SHA-256 printed under the title (of the content as canonical JSON). It answers genuine, superseded, revoked or unknown.`),
          ],
        },
      ],
      columnGap: mm(6),
      unbreakable: true,
    },
  ]
}

/** The pdfmake document of a certificate: `verifyUrl` is what the QR code carries, `verifyPage` the address printed. */
export function certificateDocument(p: CertificatePayload, digest: string, verifyUrl: string, verifyPage: string): Record<string, unknown> {
  const body = p.subject.type === 'sample' ? sampleSections(p as SamplePayload) : speciesSections(p as SpeciesPayload)
  return {
    pageSize: 'A4',
    pageMargins: [mm(MARGIN.side), mm(MARGIN.top), mm(MARGIN.side), mm(MARGIN.bottom)],
    info: { title: `${p.number} version ${p.version}: ${p.title}`, author: p.issuer.laboratory, subject: p.subject.type === 'sample' ? p.subject.code : p.subject.label, creator: 'Ionfolio', producer: 'Ionfolio', creationDate: new Date(p.issued.at) },
    defaultStyle: { font: 'Inter', fontSize: 8.3, lineHeight: 1.14, color: '#1b1f20' },
    styles: {
      heading: { fontSize: 9.3, bold: true, color: INK, margin: [0, 4, 0, 1.5] },
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
    content: [titleBlock(p, verifyUrl, digest), ...replacesNotice(p), ...body, ...closing(p, verifyPage)],
  }
}
