// Number and date formatting for certificates, labels and notices: the same text everywhere a
// value is printed, on the server (PDF, mail) and in the pages.
import { formatWhen } from '../format/datetime'

const SUP: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' }

/** A number with up to `digits` significant digits, trailing zeros dropped; very large or small in scientific notation. */
export function formatValue(v: number | null | undefined, digits = 4): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—'
  if (v !== 0 && (Math.abs(v) >= 1e6 || Math.abs(v) < 1e-3)) {
    const [mantissa, exponent] = v.toExponential(digits - 1).split('e')
    return `${Number(mantissa)} × 10${String(Number(exponent)).replace(/./g, (c) => SUP[c] ?? c)}`
  }
  return String(Number(v.toPrecision(digits)))
}

/** "500 ± 15 µg/cm²", or the value alone when no uncertainty was recorded. */
export function formatQuantity(v: number | null | undefined, u: number | null | undefined, unit: string, digits = 4): string {
  if (v === null || v === undefined) return '—'
  const value = u ? `${formatValue(v, digits)} ± ${formatValue(u, 2)}` : formatValue(v, digits)
  return unit ? `${value} ${unit}` : value
}

/** An energy in eV to a precision that suits its size. */
export function formatEv(eV: number | null | undefined): string {
  if (eV === null || eV === undefined || !Number.isFinite(eV)) return '—'
  const abs = Math.abs(eV)
  if (abs >= 10_000) return eV.toFixed(0)
  if (abs >= 100) return eV.toFixed(1)
  if (abs >= 1) return eV.toFixed(3)
  return eV.toPrecision(3)
}

/** "2026-12-01" (ISO 8601) from 'YYYY-MM-DD' or a timestamp (read in UTC, so every server prints the same day). */
export function formatDay(d: string | Date | null | undefined): string {
  if (!d) return '—'
  const iso = typeof d === 'string' ? d : d.toISOString()
  const m = /^(\d{4})-(\d{2})-(\d{2})/.exec(iso)
  if (!m) return '—'
  return `${m[1]}-${m[2]}-${m[3]}`
}

/** "2026-12-01 14:05 UTC": the product's one date-and-time format (shared/format/datetime.ts), in UTC. */
export function formatInstant(d: string | Date): string {
  return formatWhen(d, { zone: 'UTC' })
}

/** The calendar day `days` after `from` ('YYYY-MM-DD', UTC). */
export function addDays(from: string | Date, days: number): string {
  const t = typeof from === 'string' ? Date.parse(`${from.slice(0, 10)}T00:00:00Z`) : Date.UTC(from.getUTCFullYear(), from.getUTCMonth(), from.getUTCDate())
  return new Date(t + days * 86_400_000).toISOString().slice(0, 10)
}
