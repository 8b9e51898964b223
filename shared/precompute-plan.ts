import { MAX_Z, referenceIonisationEv } from './physics'

// Which species the background precompute solves, cut into fixed batches. The cut depends only
// on the range, the batch size and the engine version, so every app instance computes the same
// batches with the same job ids, and pg-boss's primary key keeps each batch queued once however
// many instances ask at start-up.

export interface Species {
  z: number
  charge: number
}

/** "1-118", "26" or "off": the elements to precompute; null for off. */
export function parseZRange(text: string): { from: number; to: number } | null {
  if (text.trim() === 'off') return null
  const m = /^(\d{1,3})(?:-(\d{1,3}))?$/.exec(text.trim())
  if (!m) throw new Error(`the precompute range must be like 1-118, 26 or off (got ${JSON.stringify(text)})`)
  const from = Number(m[1])
  const to = Number(m[2] ?? m[1])
  if (from < 1 || to > MAX_Z || from > to) throw new Error(`the precompute range must lie within 1-${MAX_Z}`)
  return { from, to }
}

/** The species with a NIST reference ionisation energy (what look-ups compare against), by Z then charge. */
export function wantedSpecies(from: number, to: number): Species[] {
  const out: Species[] = []
  for (let z = from; z <= to; z++) for (let charge = 0; charge < z; charge++) if (referenceIonisationEv(z, charge) !== null) out.push({ z, charge })
  return out
}

/**
 * The batches of `wanted` in order. Heavy species (many electrons) take longer, so batches are
 * dealt round-robin over the list: each batch gets a mix, and two instances finish together.
 */
export function batches(wanted: Species[], size: number): Species[][] {
  const count = Math.max(1, Math.ceil(wanted.length / size))
  const out: Species[][] = Array.from({ length: count }, () => [])
  wanted.forEach((s, i) => out[i % count]!.push(s))
  return out.filter((b) => b.length)
}
