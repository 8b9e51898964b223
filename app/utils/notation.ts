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

/** A number of eV printed to a precision that suits its size. */
export function formatEv(eV: number | null | undefined): string {
  if (eV === null || eV === undefined || !Number.isFinite(eV)) return '—'
  const abs = Math.abs(eV)
  if (abs >= 10_000) return eV.toFixed(0)
  if (abs >= 100) return eV.toFixed(1)
  if (abs >= 1) return eV.toFixed(3)
  return eV.toPrecision(3)
}
