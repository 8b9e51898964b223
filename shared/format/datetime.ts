/**
 * The one way Ionfolio writes dates and times, on every page, export and mail: ISO 8601 dates
 * (2026-12-02) and 24-hour times with the laboratory's time zone named (2026-12-02 15:42 UTC).
 * The zone is a setting (NUXT_PUBLIC_LAB_TIME_ZONE); the app sets it once at start-up, on the
 * server and in the browser alike, so both render the same text (no hydration mismatch).
 */

let labZone = 'UTC'

/** Sets the laboratory's IANA time zone (an unknown zone keeps the previous one). */
export function setLabTimeZone(zone: string | null | undefined): void {
  if (!zone) return
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone })
    labZone = zone
  } catch {
    // not a zone this runtime knows: keep the previous one rather than fail every page
  }
}

/** The laboratory's time zone, as set. */
export function labTimeZone(): string {
  return labZone
}

const PLAIN_DAY = /^\d{4}-\d{2}-\d{2}$/

function parts(date: Date, zone: string) {
  const out: Record<string, string> = {}
  const f = new Intl.DateTimeFormat('en-GB', { timeZone: zone, year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit', hourCycle: 'h23' })
  for (const p of f.formatToParts(date)) out[p.type] = p.value
  return out
}

function toDate(v: string | Date | number): Date | null {
  const d = v instanceof Date ? v : new Date(v)
  return Number.isNaN(d.getTime()) ? null : d
}

/** A calendar day, "2026-12-02"; a 'YYYY-MM-DD' day stays as it is, a timestamp gives its day in the lab. */
export function formatDay(v: string | Date | number | null | undefined, zone = labZone): string {
  if (v === null || v === undefined || v === '') return '—'
  if (typeof v === 'string' && PLAIN_DAY.test(v)) return v
  const d = toDate(v)
  if (!d) return '—'
  const p = parts(d, zone)
  return `${p.year}-${p.month}-${p.day}`
}

/** A moment, "2026-12-02 15:42 UTC" (with `seconds`, "2026-12-02 15:42:07 UTC"), in the lab's zone. */
export function formatWhen(v: string | Date | number | null | undefined, opts: { seconds?: boolean; zone?: string } = {}): string {
  if (v === null || v === undefined || v === '') return '—'
  const zone = opts.zone ?? labZone
  if (typeof v === 'string' && PLAIN_DAY.test(v)) return v
  const d = toDate(v)
  if (!d) return '—'
  const p = parts(d, zone)
  return `${p.year}-${p.month}-${p.day} ${p.hour}:${p.minute}${opts.seconds ? `:${p.second}` : ''} ${zone}`
}
