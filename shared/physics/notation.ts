/**
 * Species notation: reading 'Fe13+', 'Fe XIV', '56Fe13+', 'O-' … and writing both forms.
 *
 * Decisions (ours):
 * - The symbol is read as the trade writes it (Fe) or in lower case (fe), which is unambiguous
 *   because no two symbols differ only in case. Other capitalisations (FE, CO, NO) are refused
 *   with the right spelling, since CO or NO would more likely mean a molecule than cobalt or nobelium.
 * - A mass number must be one of the element's nuclides in the nuclide table (chemical-elements);
 *   anything else — and any number below Z — is refused, so a typo cannot silently pick an isotope.
 * - Roman numerals must be written canonically (XIV, not XIIII) and stop at the bare nucleus
 *   (Fe XXVII); a space separates them from the symbol. Lower-case numerals are accepted.
 * - Negative ions only with charge −1. The typographic minus (−), superscript digits and signs
 *   (Fe¹³⁺) are read as their ASCII forms so that copied text works.
 * - Messages never repeat the input beyond a validated symbol or number.
 */
import { getElement, getIsotope, symbolOf } from './elements'

export interface ParsedSpecies {
  input: string
  z: number
  symbol: string
  charge: number
  massNumber: number | null
}

export const ACCEPTED_NOTATIONS = [
  'Fe13+',
  'Fe 13+',
  'Fe+13',
  'Fe^13+',
  'Fe XIV',
  'Fe',
  'Fe0',
  'Fe I',
  '56Fe13+',
  '56Fe XIV',
  'Ca-48 10+',
  'Ca48 XI',
  'O-',
  'Au1-',
] as const

const MAX_INPUT = 32

/** A species that cannot be read; `message` says why and lists the accepted notations. */
export class SpeciesParseError extends Error {
  /** the short reason, without the list of notations */
  readonly reason: string
  constructor(reason: string) {
    super(`${reason}. Accepted notations: ${ACCEPTED_NOTATIONS.join(', ')}`)
    this.name = 'SpeciesParseError'
    this.reason = reason
  }
}

const ROMAN: readonly [number, string][] = [
  [100, 'C'], [90, 'XC'], [50, 'L'], [40, 'XL'], [10, 'X'], [9, 'IX'], [5, 'V'], [4, 'IV'], [1, 'I'],
]

/** 14 → 'XIV' (1 ≤ n < 400, enough for element 118's bare nucleus, CXIX). */
export function toRoman(n: number): string {
  let out = ''
  let left = n
  for (const [value, letters] of ROMAN) {
    while (left >= value) {
      out += letters
      left -= value
    }
  }
  return out
}

/** 'XIV' → 14, or null when not a canonically written numeral. */
export function fromRoman(text: string): number | null {
  const upper = text.toUpperCase()
  if (!/^[IVXLC]+$/.test(upper)) return null
  const value: Record<string, number> = { I: 1, V: 5, X: 10, L: 50, C: 100 }
  let total = 0
  for (let i = 0; i < upper.length; i++) {
    const here = value[upper[i]]
    const next = value[upper[i + 1]] ?? 0
    total += here < next ? -here : here
  }
  return total > 0 && toRoman(total) === upper ? total : null
}

/** Both ways of writing a species: ionic 'Fe13+', 'Fe+', 'Fe', 'O-' and spectroscopic 'Fe XIV'. */
export function formatSpecies(z: number, charge: number, massNumber: number | null = null): { ionic: string; spectroscopic: string } {
  const symbol = `${massNumber ?? ''}${symbolOf(z)}`
  const ionic = charge === 0 ? symbol : charge === 1 ? `${symbol}+` : charge === -1 ? `${symbol}-` : `${symbol}${Math.abs(charge)}${charge > 0 ? '+' : '-'}`
  // Spectroscopic numerals count from the neutral atom (I); an anion has none, so it keeps its ionic form.
  const spectroscopic = charge >= 0 ? `${symbol} ${toRoman(charge + 1)}` : ionic
  return { ionic, spectroscopic }
}

const SUPERSCRIPTS: Record<string, string> = {
  '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9',
  '⁺': '+', '⁻': '-', '−': '-', '–': '-',
}

function readSymbol(letters: string): { z: number; symbol: string } {
  const element = getElement(letters)
  if (!element || letters.length > 3) {
    throw new SpeciesParseError(letters.length <= 3 ? `unknown element symbol '${letters}'` : 'no element symbol found (a Roman numeral needs a space before it)')
  }
  if (letters !== element.symbol && letters !== letters.toLowerCase()) {
    throw new SpeciesParseError(`write the element symbol as ${element.symbol}`)
  }
  return { z: element.z, symbol: element.symbol }
}

function readCharge(rest: string, z: number, symbol: string): number {
  if (rest === '' || /^ ?0\+?$/.test(rest)) return 0
  const roman = /^ ([A-Za-z]+)$/.exec(rest)
  if (roman) {
    const value = fromRoman(roman[1])
    if (value === null) throw new SpeciesParseError('not a valid Roman numeral after the symbol')
    if (value > z + 1) throw new SpeciesParseError(`${symbol} ${toRoman(value)} is beyond the bare nucleus, ${symbol} ${toRoman(z + 1)}`)
    return value - 1
  }
  let digits: string
  let sign: string
  const suffix = /^ ?(\d*)([+-])$/.exec(rest) ?? /^\^(\d*)([+-])$/.exec(rest)
  const prefix = /^([+-])(\d+)$/.exec(rest)
  if (suffix) [, digits, sign] = suffix
  else if (prefix) [, sign, digits] = prefix
  else throw new SpeciesParseError('could not read the charge')
  if (/^0/.test(digits)) throw new SpeciesParseError('a charge cannot start with 0')
  const size = digits === '' ? 1 : Number(digits)
  if (sign === '-') {
    if (size !== 1) throw new SpeciesParseError('only singly charged negative ions (charge 1-) are supported')
    return -1
  }
  if (size > z) throw new SpeciesParseError(`${symbol} has Z = ${z}: a charge above ${z}+ is beyond the bare nucleus`)
  return size
}

/**
 * The isotope grammar every part of the product shares (species look-up, sample filter, nuclide
 * fields): a symbol and a mass number in either order, joined by nothing, a hyphen or a space —
 * 'Ca-48', 'Ca48', 'Ca 48', '48Ca', '48-Ca', '48 Ca'. Only the split into letters and digits; the
 * callers decide how strict to be about the symbol's case.
 */
const ISOTOPE_SYMBOL_FIRST = /^([A-Za-z]{1,3})[- ]?(\d{1,3})$/
const ISOTOPE_MASS_FIRST = /^(\d{1,3})[- ]?([A-Za-z]{1,3})$/

function splitIsotope(text: string): { letters: string; massText: string } | null {
  const first = ISOTOPE_SYMBOL_FIRST.exec(text)
  if (first) return { letters: first[1], massText: first[2] }
  const mass = ISOTOPE_MASS_FIRST.exec(text)
  return mass ? { letters: mass[2], massText: mass[1] } : null
}

/**
 * A nuclide as a lab writes it ('Ca-48', '48Ca', 'Ca48', 'ni 58'), or null when the text is not
 * one or names no listed nuclide. The symbol may be in any case here (a search box, not a formula).
 */
export function parseIsotopeToken(text: string): { z: number; massNumber: number } | null {
  if (typeof text !== 'string' || text.length > 16) return null
  // superscript mass numbers as pasted from a formula ('⁵⁸Ni')
  const plain = text.replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹]/g, (c) => String('⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c)))
  const parts = splitIsotope(plain.replace(/\s+/g, ' ').trim())
  if (!parts || /^0/.test(parts.massText)) return null
  const element = getElement(parts.letters)
  if (!element) return null
  const massNumber = Number(parts.massText)
  return getIsotope(element.z, massNumber) ? { z: element.z, massNumber } : null
}

/** Checks a mass number read from the input and returns it; throws with the reason otherwise. */
function readMassNumber(massText: string, z: number, symbol: string): number {
  if (/^0/.test(massText)) throw new SpeciesParseError('a mass number cannot start with 0')
  if (massText.length > 3) throw new SpeciesParseError('mass number too large')
  const massNumber = Number(massText)
  if (massNumber < z) throw new SpeciesParseError(`mass number ${massNumber} is below Z = ${z} of ${symbol}`)
  if (!getIsotope(z, massNumber)) {
    const isotopes = getElement(z)?.isotopes ?? []
    const range = `${isotopes[0]?.massNumber}–${isotopes[isotopes.length - 1]?.massNumber}`
    throw new SpeciesParseError(`${massNumber}${symbol} is not a known isotope (known: ${range}${symbol})`)
  }
  return massNumber
}

/**
 * The isotope written symbol first ('Ca-48 10+', 'Ca48 XI', 'Ca-48'): the isotope token, then
 * nothing or a space and the charge. 'Fe 13' or 'O-1' name no nuclide (¹³Fe, ¹O do not exist) and
 * are left to the charge grammar; 'H-1' is hydrogen-1, as a nuclide list writes it, not H⁻.
 */
function symbolFirstIsotope(text: string): { token: string; rest: string } | null {
  const m = /^([A-Za-z]{1,3}(?:-| ?)\d{1,3})((?: .*)?)$/.exec(text)
  if (!m) return null
  const parts = splitIsotope(m[1])
  const element = parts && getElement(parts.letters)
  if (!parts || !element || /^0/.test(parts.massText) || !getIsotope(element.z, Number(parts.massText))) return null
  return { token: m[1], rest: m[2] }
}

/** Reads a species in any accepted notation; throws SpeciesParseError otherwise. */
export function parseSpecies(input: string): ParsedSpecies {
  if (typeof input !== 'string') throw new SpeciesParseError('a species must be given as text')
  const text = input
    .replace(/[⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻−–]/g, (c) => SUPERSCRIPTS[c])
    .replace(/\s+/g, ' ')
    .trim()
  if (text === '') throw new SpeciesParseError('no species given')
  if (text.length > MAX_INPUT) throw new SpeciesParseError(`input too long (at most ${MAX_INPUT} characters)`)
  const isotope = symbolFirstIsotope(text)
  if (isotope) {
    const parts = splitIsotope(isotope.token)!
    const { z, symbol } = readSymbol(parts.letters)
    const charge = readCharge(isotope.rest, z, symbol)
    return { input, z, symbol, charge, massNumber: readMassNumber(parts.massText, z, symbol) }
  }
  const m = /^(\d+)?[- ]?([A-Za-z]+)(.*)$/.exec(text)
  if (!m) throw new SpeciesParseError('no element symbol found')
  const [, massText, letters, rest] = m
  if (massText === undefined && /^[- ]/.test(text)) throw new SpeciesParseError('no element symbol found')
  const { z, symbol } = readSymbol(letters)
  const charge = readCharge(rest, z, symbol)
  const massNumber = massText === undefined ? null : readMassNumber(massText, z, symbol)
  return { input, z, symbol, charge, massNumber }
}
