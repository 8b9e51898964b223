import type { Knex } from 'knex'
import { ENGINE_VERSION } from '../../shared/physics'
import { SCF_METHOD } from '../../shared/physics/scf'
import type { ScfSpeciesEstimates } from '../../shared/physics/scf/types'

// Plain Knex functions (no Nitro imports), so the server, `npm run precompute` and the command
// line read and write the one cache the same way. Rows are keyed by species, method and engine
// version: a new engine version starts a fresh set and never reuses an older solve.

/** The cached SCF estimates of (z, charge) for this engine version, or null. */
export async function readScfCache(db: Knex, z: number, charge: number): Promise<ScfSpeciesEstimates | null> {
  const row = await db('species_scf_cache').where({ z, charge, method: SCF_METHOD, engine_version: ENGINE_VERSION }).first('result')
  return row ? (row.result as ScfSpeciesEstimates) : null
}

/** The species already cached for this engine version, as "z:charge" keys. */
export async function cachedScfKeys(db: Knex): Promise<Set<string>> {
  const rows = await db('species_scf_cache').where({ method: SCF_METHOD, engine_version: ENGINE_VERSION }).select('z', 'charge')
  return new Set(rows.map((r: { z: number; charge: number }) => `${r.z}:${r.charge}`))
}

/** Stores one solve; a concurrent solve of the same species that stored first wins. */
export async function writeScfCache(db: Knex, z: number, charge: number, result: ScfSpeciesEstimates, seconds: number): Promise<void> {
  const converged = result.species.converged && (result.next?.converged ?? true)
  await db('species_scf_cache')
    .insert({ z, charge, method: SCF_METHOD, engine_version: ENGINE_VERSION, converged, result: JSON.stringify(result) as never, seconds })
    .onConflict(['z', 'charge', 'method', 'engine_version'])
    .ignore()
}

/** Every cached charge state of element z for this engine version, by charge. */
export async function readScfCacheForElement(db: Knex, z: number): Promise<Map<number, ScfSpeciesEstimates>> {
  const rows = await db('species_scf_cache').where({ z, method: SCF_METHOD, engine_version: ENGINE_VERSION }).select('charge', 'result')
  return new Map(rows.map((r: { charge: number; result: unknown }) => [r.charge, r.result as ScfSpeciesEstimates]))
}
