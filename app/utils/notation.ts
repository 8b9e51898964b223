/** The parts of a term symbol such as `2P°1/2`: multiplicity, L letter, odd parity, J. */
export function termParts(term: string): { multiplicity: string; letter: string; odd: boolean; j: string } | null {
  const m = /^(\d+)([A-Z])(°?)(.*)$/.exec(term)
  return m ? { multiplicity: m[1]!, letter: m[2]!, odd: m[3] === '°', j: m[4] ?? '' } : null
}

/** The charge part of an ionic notation (`Fe13+` → `13+`, `O-` → `−`), for a superscript. */
export function chargeSuperscript(charge: number): string {
  if (charge === 0) return ''
  if (charge === 1) return '+'
  if (charge === -1) return '−'
  return charge > 0 ? `${charge}+` : `${-charge}−`
}

/** A number of eV printed to a precision that suits its size (one rule for pages and certificates). */
export { formatEv } from '#shared/certificates/format'
