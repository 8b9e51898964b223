import { existsSync } from 'node:fs'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { availableParallelism } from 'node:os'
import { Piscina } from 'piscina'
import type { ScfSpeciesEstimates } from '#shared/physics/scf/types'

type Solved = ScfSpeciesEstimates & { seconds: number }

let pool: Piscina | null = null
const inFlight = new Map<string, Promise<ScfSpeciesEstimates>>()

// A solved species never changes for a given engine version (the cache key of the table), so a
// copy in memory is as good as the row; the oldest entries go first once it is full.
const MEMORY_LIMIT = 2_000
const memory = new Map<string, ScfSpeciesEstimates>()
function remember(key: string, value: ScfSpeciesEstimates): void {
  if (memory.size >= MEMORY_LIMIT) memory.delete(memory.keys().next().value!)
  memory.set(key, value)
}

/** The cached SCF estimates of (z, charge): from memory, else from PostgreSQL. */
export async function cachedScf(z: number, charge: number): Promise<ScfSpeciesEstimates | null> {
  const key = `${z}:${charge}`
  const hit = memory.get(key)
  if (hit) return hit
  const row = await readScfCache(useDb(), z, charge)
  if (row) remember(key, row)
  return row
}

function workerFile(): string | null {
  // The worker is bundled next to the built server; look up from this chunk for workers/scf.mjs.
  let dir = path.dirname(fileURLToPath(import.meta.url))
  for (let i = 0; i < 4; i++) {
    const candidate = path.join(dir, 'workers', 'scf.mjs')
    if (existsSync(candidate)) return candidate
    dir = path.dirname(dir)
  }
  return null
}

function usePool(): Piscina {
  if (!pool) {
    const filename = workerFile()
    if (!filename) throw new Error('the SCF worker bundle is missing: build the app with `nuxt build`')
    pool = new Piscina({ filename, minThreads: 0, maxThreads: Math.max(1, Math.min(2, availableParallelism() - 1)), idleTimeout: 30_000 })
  }
  return pool
}

/** Closes the worker pool (Nitro's close hook). */
export async function closeScfPool(): Promise<void> {
  if (pool) {
    const p = pool
    pool = null
    await p.destroy()
  }
}

/** Solves (z, charge) in a worker and stores the result; concurrent asks share one solve. */
export function computeScf(z: number, charge: number): Promise<ScfSpeciesEstimates> {
  const key = `${z}:${charge}`
  let job = inFlight.get(key)
  if (!job) {
    job = (async () => {
      const solved = (await usePool().run({ z, charge })) as Solved
      const { seconds, ...result } = solved
      await writeScfCache(useDb(), z, charge, result, seconds)
      remember(key, result)
      return result
    })().finally(() => inFlight.delete(key))
    inFlight.set(key, job)
  }
  return job
}

/**
 * cached: from PostgreSQL; computed: solved for this request; pending: still solving (ask again);
 * unavailable: the solver failed or is missing, so the record falls back to the other methods.
 */
export type ScfLookup =
  | { status: 'cached' | 'computed'; estimates: ScfSpeciesEstimates }
  | { status: 'pending' | 'unavailable'; estimates: null }

/**
 * The SCF estimates for a look-up: cached ones at once; otherwise a solve that is awaited for at
 * most `waitMs` (it goes on in the background and fills the cache when it takes longer).
 */
export async function scfForLookup(z: number, charge: number, waitMs = 1_500): Promise<ScfLookup> {
  const cached = await cachedScf(z, charge)
  if (cached) return { status: 'cached', estimates: cached }
  let job: Promise<ScfSpeciesEstimates>
  try {
    job = computeScf(z, charge)
  } catch {
    return { status: 'unavailable', estimates: null }
  }
  job.catch(() => {})
  const timeout = new Promise<null>((resolve) => setTimeout(resolve, waitMs, null))
  const done = await Promise.race([job.catch(() => 'failed' as const), timeout])
  if (done === 'failed') return { status: 'unavailable', estimates: null }
  return done ? { status: 'computed', estimates: done } : { status: 'pending', estimates: null }
}
