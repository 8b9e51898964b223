import { createHash } from 'node:crypto'
import { expect } from 'vitest'
import type { Client } from './api'
import { createSample } from './samples'

/** A calendar day `days` from today, as 'YYYY-MM-DD' (UTC). */
export function dayFromNow(days: number): string {
  return new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10)
}

/** A sample a manager may certify: a re-certify-by date ahead, hazards, an enriched isotope. */
export function certifiableSample(manager: Client, over: Record<string, unknown> = {}) {
  return createSample(manager, {
    name: 'Nickel-58 foil for certification',
    material: 'Nickel metal, enriched in 58Ni',
    arealDensity: 500,
    arealDensityUncertainty: 15,
    massMg: 2.5,
    supplier: 'Quillmoor Isotopes',
    lot: 'QI-TEST-0001',
    recertifyBy: dayFromNow(200),
    hazardStatements: 'H317 H351 H372',
    components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', enrichmentPercent: 99.61, enrichmentUncertainty: 0.05 }],
    ...over,
  })
}

/** Issues a certificate as `manager` and answers it (201 expected). */
export async function issue(manager: Client, subjectType: 'sample' | 'species', subjectId: string) {
  const r = await manager.post('/api/certificates', { subjectType, subjectId })
  expect(r.status, JSON.stringify(r.body)).toBe(201)
  return r.body
}

/**
 * SHA-256 over JSON with object keys sorted at every depth, written here independently of the
 * app's canonicalJson, the way anyone checking a certificate would (RFC 8785 for plain JSON data).
 */
export function independentDigest(payload: unknown): string {
  const sorted = (v: unknown): unknown =>
    Array.isArray(v) ? v.map(sorted) : v && typeof v === 'object' ? Object.fromEntries(Object.keys(v).sort().map((k) => [k, sorted((v as Record<string, unknown>)[k])])) : v
  return createHash('sha256').update(JSON.stringify(sorted(payload))).digest('hex')
}

/** The certificate's PDF as bytes (200 expected). */
export async function pdfOf(client: Client, id: string): Promise<Buffer> {
  const r = await client.get(`/api/certificates/${id}/pdf`)
  expect(r.status).toBe(200)
  expect(r.headers.get('content-type')).toBe('application/pdf')
  return r.body as Buffer
}
