import { getElement } from '../physics/index'

export interface NuclideRef {
  z: number
  symbol: string
  massNumber: number
}

/**
 * A nuclide as people write it ("U-238", "238U", "U238", "Am 241"),
 * checked against the nuclide data. Null when it names no listed nuclide.
 */
export function parseNuclide(text: string): NuclideRef | null {
  const t = text.trim()
  const m = /^([A-Za-z]{1,2})[\s-]?(\d{1,3})$/.exec(t) ?? /^(\d{1,3})[\s-]?([A-Za-z]{1,2})$/.exec(t)
  if (!m) return null
  const [symbol, mass] = /^\d/.test(m[1]!) ? [m[2]!, m[1]!] : [m[1]!, m[2]!]
  const element = getElement(symbol)
  if (!element || element.symbol.toLowerCase() !== symbol.toLowerCase()) return null
  const massNumber = Number(mass)
  if (!element.isotopes.some((i) => i.massNumber === massNumber)) return null
  return { z: element.z, symbol: element.symbol, massNumber }
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
