// `npm run precompute [-- --all] [--workers N] [--z FROM-TO]`: fill the SCF cache in PostgreSQL for
// every species with a NIST reference ionisation energy (or, with --all, every species from H to
// element 118; --z limits the elements), in worker threads, skipping what is already cached for
// this engine version.
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { availableParallelism } from 'node:os'
import { Piscina } from 'piscina'
import cliProgress from 'cli-progress'
import knexFactory from 'knex'
import config from '../knex.config'
import { ENGINE_VERSION, MAX_Z, referenceIonisationEv } from '../shared/physics'
import type { ScfSpeciesEstimates } from '../shared/physics/scf/types'
import { cachedScfKeys, writeScfCache } from '../server/utils/scf-cache'

const args = process.argv.slice(2)
const all = args.includes('--all')
const workersArg = args.indexOf('--workers')
const workers = workersArg >= 0 ? Number(args[workersArg + 1]) : Math.max(1, Math.min(2, availableParallelism()))
if (!Number.isInteger(workers) || workers < 1) {
  console.error('--workers takes a whole number of threads, e.g. --workers 2')
  process.exit(2)
}
const zArg = args.indexOf('--z')
const zRange = zArg >= 0 ? /^(\d{1,3})(?:-(\d{1,3}))?$/.exec(args[zArg + 1] ?? '') : null
if (zArg >= 0 && (!zRange || Number(zRange[1]) < 1 || Number(zRange[2] ?? zRange[1]) > MAX_Z || Number(zRange[1]) > Number(zRange[2] ?? zRange[1]))) {
  console.error(`--z takes an element number or a range within 1-${MAX_Z}, e.g. --z 26 or --z 1-36`)
  process.exit(2)
}
const zFrom = zRange ? Number(zRange[1]) : 1
const zTo = zRange ? Number(zRange[2] ?? zRange[1]) : MAX_Z

const knex = knexFactory(config)
const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)))

async function main(): Promise<number> {
  try {
    await knex.raw('select 1 from species_scf_cache limit 1')
  } catch {
    console.error('The database is not reachable or not migrated: start Ionfolio first (`npm start`) or set NUXT_DATABASE_URL.')
    return 1
  }
  const wanted: Array<{ z: number; charge: number }> = []
  for (let z = zFrom; z <= zTo; z++) {
    for (let charge = 0; charge < z; charge++) if (all || referenceIonisationEv(z, charge) !== null) wanted.push({ z, charge })
  }
  const done = await cachedScfKeys(knex)
  const todo = wanted.filter((s) => !done.has(`${s.z}:${s.charge}`))
  console.log(`${wanted.length} species wanted, ${wanted.length - todo.length} already cached for engine ${ENGINE_VERSION}; solving ${todo.length} with ${workers} worker thread(s)`)
  if (!todo.length) return 0

  const pool = new Piscina({ filename: path.join(root, 'server', 'workers', 'scf.ts'), execArgv: ['--import', 'tsx'], minThreads: workers, maxThreads: workers })
  const bar = new cliProgress.SingleBar({ format: ' {bar} {percentage}% | {value}/{total} species | ETA {eta_formatted} | {last}', etaBuffer: 200 }, cliProgress.Presets.shades_classic)
  bar.start(todo.length, 0, { last: '' })
  let failed = 0
  const started = Date.now()
  await Promise.all(
    todo.map(async ({ z, charge }) => {
      const solved = (await pool.run({ z, charge })) as ScfSpeciesEstimates & { seconds: number }
      const { seconds, ...result } = solved
      if (!(result.species.converged && (result.next?.converged ?? true))) failed++
      await writeScfCache(knex, z, charge, result, seconds)
      bar.increment(1, { last: `Z=${z} q=${charge}` })
    }),
  )
  bar.stop()
  await pool.destroy()
  console.log(`Done in ${((Date.now() - started) / 1000).toFixed(1)} s; ${failed} species did not converge (their records fall back to the other methods).`)
  return 0
}

main()
  .then(async (code) => {
    await knex.destroy()
    process.exit(code)
  })
  .catch(async (e: unknown) => {
    console.error(e instanceof Error ? e.message : e)
    await knex.destroy()
    process.exit(1)
  })
