import { getElement, parseIsotopeToken } from '../physics/index'

export interface NuclideRef {
  z: number
  symbol: string
  massNumber: number
}

/**
 * A nuclide as people write it ("U-238", "238U", "U238", "Am 241"), checked against the nuclide
 * data; null when it names no listed nuclide. The grammar is the species engine's own
 * (parseIsotopeToken), so the sample filter and the species look-up read isotopes alike.
 */
export function parseNuclide(text: string): NuclideRef | null {
  const hit = parseIsotopeToken(text)
  return hit ? { z: hit.z, symbol: getElement(hit.z)!.symbol, massNumber: hit.massNumber } : null
}

/** The stored spelling of a nuclide: symbol, hyphen, mass number ("U-238"). */
export function formatNuclide(n: { symbol: string; massNumber: number }): string {
  return `${n.symbol}-${n.massNumber}`
}

const SUPERSCRIPT = '⁰¹²³⁴⁵⁶⁷⁸⁹'

/** An isotope in the trade's notation with a superscript mass number ("⁴⁸Ca"); natural gives the symbol. */
export function isotopeLabel(z: number, massNumber: number | null): string {
  const symbol = getElement(z)?.symbol ?? `Z${z}`
  if (massNumber === null) return symbol
  return `${String(massNumber).replace(/\d/g, (d) => SUPERSCRIPT[Number(d)]!)}${symbol}`
}
