/**
 * Whether a sample can source an ion species: it must contain the species' element, and when the
 * species names an isotope, that isotope. A component recorded as an element (no mass number)
 * holds the element's natural isotopes; an enriched component holds its isotope and, unless
 * enriched to 100 %, the natural ones in the rest (the sample form's meaning of enrichment).
 */
import { getElement } from '../physics/elements'

export interface LinkComponent {
  z: number
  massNumber: number | null
  enrichmentPercent: number | null
}

export type LinkCheck = { ok: true } | { ok: false; reason: 'element' | 'isotope' }

const natural = (z: number, a: number) => (getElement(z)?.naturalIsotopes ?? []).some((i) => i.massNumber === a)

export function sampleCanSource(components: readonly LinkComponent[], species: { z: number; massNumber: number | null }): LinkCheck {
  const same = components.filter((c) => c.z === species.z)
  if (!same.length) return { ok: false, reason: 'element' }
  if (species.massNumber === null) return { ok: true }
  const a = species.massNumber
  const holds = same.some((c) => c.massNumber === a || ((c.massNumber === null || (c.enrichmentPercent ?? 100) < 100) && natural(c.z, a)))
  return holds ? { ok: true } : { ok: false, reason: 'isotope' }
}
