import { formatDay } from '#shared/format/datetime'
import { isotopeLabel } from '#shared/samples/nuclide'

/** A number with up to `digits` significant digits, trailing zeros dropped (1200, 0.0125). */
export function formatNumber(v: number | null | undefined, digits = 4): string {
  if (v === null || v === undefined || Number.isNaN(v)) return '—'
  if (v !== 0 && (Math.abs(v) >= 1e6 || Math.abs(v) < 1e-3)) return formatScientific(v, digits)
  return String(Number(v.toPrecision(digits)))
}

const SUP: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' }

/** Scientific notation the way a paper prints it: 5.907 × 10¹⁷. */
export function formatScientific(v: number, digits = 4): string {
  const [mantissa, exponent] = v.toExponential(digits - 1).split('e')
  return `${Number(mantissa)} × 10${String(Number(exponent)).replace(/./g, (c) => SUP[c] ?? c)}`
}

/** A value with its uncertainty, if any: "500 ± 15". */
export function withUncertainty(v: number | null | undefined, u: number | null | undefined, digits = 4): string {
  if (v === null || v === undefined) return '—'
  return u ? `${formatNumber(v, digits)} ± ${formatNumber(u, 2)}` : formatNumber(v, digits)
}

/** File sizes in the units people read: 812 B, 14.2 kB, 3.1 MB. */
export function formatBytes(n: number): string {
  if (n < 1000) return `${n} B`
  if (n < 1e6) return `${(n / 1e3).toFixed(1)} kB`
  return `${(n / 1e6).toFixed(1)} MB`
}

/** The composition in one line for lists: "⁴⁸Ca 100 %" or "Ca 20 %, C 20 %, O 60 %". */
export function compositionSummary(components: readonly { z: number; massNumber: number | null; fraction: number }[]): string {
  if (!components.length) return '—'
  if (components.length === 1) return isotopeLabel(components[0]!.z, components[0]!.massNumber)
  return components.map((c) => `${isotopeLabel(c.z, c.massNumber)} ${Number((c.fraction * 100).toPrecision(3))} %`).join(', ')
}

/** A day as the whole product writes it (ISO 8601, 2026-12-01), from 'YYYY-MM-DD' or a timestamp. */
export function formatDate(d: string | Date | null | undefined): string {
  return formatDay(d)
}

/** Days from today to a 'YYYY-MM-DD' date (negative when past). */
export function daysUntil(day: string | null | undefined): number | null {
  if (!day) return null
  const today = new Date()
  const t = Date.UTC(today.getFullYear(), today.getMonth(), today.getDate())
  return Math.round((Date.parse(`${day}T00:00:00Z`) - t) / 86_400_000)
}
