/**
 * What every certificate payload holds, whatever it certifies. The payload is the certificate:
 * frozen in the database at issue, printed in the PDF, and hashed (SHA-256 of its canonical
 * JSON) for the verification page. The headings follow the contents ISO Guide 31:2015 lists for
 * a certificate of a reference material (clause 5 — from memory), in our own words.
 */
export const PAYLOAD_SCHEMA = 'ionfolio.certificate/1'

export const SUBJECT_TYPES = ['sample', 'species'] as const
export type SubjectType = (typeof SUBJECT_TYPES)[number]

export const CERTIFICATE_STATUSES = ['issued', 'superseded', 'revoked'] as const
export type CertificateStatus = (typeof CERTIFICATE_STATUSES)[number]

export const STATUS_TEXT: Record<CertificateStatus, string> = {
  issued: 'Issued (current)',
  superseded: 'Superseded',
  revoked: 'Revoked',
}

/** The printed headings, in the order the certificate prints them. */
export const HEADINGS = {
  description: 'Description of the material',
  intendedUse: 'Intended use',
  properties: 'Property values',
  method: 'Method of determination',
  methodComputed: 'Method of computation',
  traceability: 'Metrological traceability',
  validity: 'Period of validity',
  storage: 'Storage and handling',
  hazards: 'Hazards and cautions',
  estimates: 'Computed data are estimates',
  issuedBy: 'Issued by',
  verification: 'Verification',
} as const

export interface IssueContext {
  number: string
  version: number
  labName: string
  /** ISO timestamp of issue */
  issuedAt: string
  issuer: { name: string; role: string }
  /** the certificate this version corrects, and why */
  replaces: { number: string; version: number; reason: string } | null
}

/** The parts of a payload every kind shares. */
export interface PayloadHead {
  schema: typeof PAYLOAD_SCHEMA
  number: string
  version: number
  title: string
  issuer: { laboratory: string; system: string }
  issued: { at: string; by: { name: string; role: string } }
  replaces: IssueContext['replaces']
}

export function payloadHead(ctx: IssueContext, title: string): PayloadHead {
  return {
    schema: PAYLOAD_SCHEMA,
    number: ctx.number,
    version: ctx.version,
    title,
    issuer: { laboratory: ctx.labName, system: 'Ionfolio' },
    issued: { at: ctx.issuedAt, by: ctx.issuer },
    replaces: ctx.replaces,
  }
}

/** The path of the public verification page for a certificate (the QR code links here). */
export function verifyPath(number: string, digest: string): string {
  return `/verify/${encodeURIComponent(number)}?digest=${digest}`
}
