/**
 * A measured value with its uncertainty, rounded the way a metrologist writes it: the uncertainty
 * to two significant digits, the value to the same decimal place. JCGM 100:2008 (GUM) §7.2.6:
 * "the numerical values of the estimate y and its standard uncertainty u_c(y) … should not be given
 * with an excessive number of digits. It usually suffices to quote u_c(y) … to at most two
 * significant digits … the estimate y should be rounded to be consistent with the uncertainty".
 * The uncertainty is rounded to the nearest digit (the GUM allows rounding up; we do not).
 *
 * One formatter for pages, CSV exports, labels and certificates, so a value prints the same
 * everywhere. Pure: no Vue, Nitro or database.
 */

const SUP: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' }
const superscript = (n: number) => String(n).replace(/./g, (c) => SUP[c] ?? c)

/** Significant digits kept of an uncertainty (GUM §7.2.6: at most two). */
export const UNCERTAINTY_DIGITS = 2

/** Values at or beyond these magnitudes print in scientific notation. */
const SCI_HIGH = 1e6
const SCI_LOW = 1e-3

export interface Rounded {
  /** the value rounded to the uncertainty's last digit, as text ("6450", "0.5750") */
  value: string
  /** the uncertainty to two significant digits, as text ("190", "0.082") */
  uncertainty: string
  /** power of ten shared by both when printed in scientific notation, else 0 */
  exponent: number
  /** the decimal place of the last digit kept (10^place) */
  place: number
}

function decimalPlaceOf(u: number, digits: number): number {
  return Math.floor(Math.log10(u)) - (digits - 1)
}

// Rounds x to a multiple of 10^place, half away from zero, without the drift of x * 10^-place.
function roundAt(x: number, place: number): number {
  const r = Number((Math.abs(x) / 10 ** place).toPrecision(15))
  return Math.sign(x) * Math.round(r) * 10 ** place
}

function fixed(x: number, decimals: number): string {
  const s = x.toFixed(Math.max(0, Math.min(20, decimals)))
  return s === '-0' || /^-0\.0*$/.test(s) ? s.slice(1) : s
}

/**
 * The value and its uncertainty rounded together, or null when there is no usable uncertainty
 * (null, zero, negative or not finite): then print the value on its own.
 */
export function roundToUncertainty(value: number, uncertainty: number | null | undefined, digits = UNCERTAINTY_DIGITS): Rounded | null {
  if (!Number.isFinite(value) || uncertainty === null || uncertainty === undefined || !Number.isFinite(uncertainty) || uncertainty <= 0) return null
  let place = decimalPlaceOf(uncertainty, digits)
  let u = roundAt(uncertainty, place)
  // 0.0996 rounds to 0.10: one more digit in front, so the place moves up by one.
  const again = decimalPlaceOf(u, digits)
  if (again > place) {
    place = again
    u = roundAt(uncertainty, place)
  }
  const v = roundAt(value, place)
  const magnitude = Math.max(Math.abs(v), u)
  if (magnitude >= SCI_HIGH || magnitude < SCI_LOW) {
    const exponent = Math.floor(Math.log10(magnitude))
    const decimals = exponent - place
    const scale = 10 ** exponent
    return { value: fixed(v / scale, decimals), uncertainty: fixed(u / scale, decimals), exponent, place }
  }
  return { value: fixed(v, -place), uncertainty: fixed(u, -place), exponent: 0, place }
}

/** A number alone, to `digits` significant digits, trailing zeros dropped; large or small in scientific notation. */
export function formatPlain(v: number | null | undefined, digits = 4): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—'
  if (v !== 0 && (Math.abs(v) >= SCI_HIGH || Math.abs(v) < SCI_LOW)) {
    const [mantissa, exponent] = v.toExponential(digits - 1).split('e')
    return `${Number(mantissa)} × 10${superscript(Number(exponent))}`
  }
  return String(Number(v.toPrecision(digits)))
}

/**
 * "6450 ± 190 nm", "(3.06 ± 0.12) × 10¹⁸ atoms/cm²", "99.30 ± 0.10 %"; the value alone (to
 * `digits` significant digits) when no uncertainty is known; "—" when there is no value.
 */
export function formatMeasured(v: number | null | undefined, u: number | null | undefined, unit = '', digits = 4): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—'
  const r = roundToUncertainty(v, u)
  const tail = unit ? ` ${unit}` : ''
  if (!r) return `${formatPlain(v, digits)}${tail}`
  if (r.exponent === 0) return `${r.value} ± ${r.uncertainty}${tail}`
  return `(${r.value} ± ${r.uncertainty}) × 10${superscript(r.exponent)}${tail}`
}

/** The pair as two plain CSV cells ("6450", "190"), in plain decimal or e-notation a spreadsheet reads. */
export function csvMeasured(v: number | null | undefined, u: number | null | undefined): [string, string] {
  if (v === null || v === undefined || !Number.isFinite(v)) return ['', '']
  const r = roundToUncertainty(v, u)
  if (!r) return [String(Number(v.toPrecision(10))), '']
  if (r.exponent === 0) return [r.value, r.uncertainty]
  return [`${r.value}e${r.exponent}`, `${r.uncertainty}e${r.exponent}`]
}
