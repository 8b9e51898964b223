import { createHash } from 'node:crypto'
import { ENGINE_VERSION } from '../../shared/physics'
import { QUEUE } from '../../shared/jobs'
import { batches, parseZRange, wantedSpecies, type Species } from '../../shared/precompute-plan'

// Plain imports (no Nitro), so bench/precompute.ts queues exactly what the app queues.

export interface PrecomputeData {
  engineVersion: string
  species: Species[]
}

/** A stable UUID-shaped job id for one batch of this engine version. */
export function precomputeBatchId(batch: Species[]): string {
  const h = createHash('sha256').update(`precompute|${ENGINE_VERSION}|${batch.map((s) => `${s.z}:${s.charge}`).join(',')}`).digest('hex')
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-4${h.slice(13, 16)}-8${h.slice(17, 20)}-${h.slice(20, 32)}`
}

/** The precompute jobs still needed for `range` ("1-118", "off"), given the cached "z:charge" keys. */
export function precomputeJobs(done: Set<string>, range: string, size: number): Array<{ id: string; name: string; data: PrecomputeData }> {
  const z = parseZRange(range)
  if (!z) return []
  return batches(wantedSpecies(z.from, z.to), size)
    .filter((batch) => batch.some((s) => !done.has(`${s.z}:${s.charge}`)))
    .map((batch) => ({ id: precomputeBatchId(batch), name: QUEUE.precompute, data: { engineVersion: ENGINE_VERSION, species: batch } }))
}
