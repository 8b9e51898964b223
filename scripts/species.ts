/**
 * Command line for the species engine:
 *
 *   npm run --silent species -- [--json] [--methods LIST] SPECIES...
 *
 * Readable text by default; with --json one JSON object per argument and line, in input order
 * (DESIGN §5). A species that cannot be read gives {"input", "error"} in its place (text mode: a
 * line on stderr) and the exit status is 1 once everything else is printed; a bad option is
 * status 2 before anything is printed. --methods takes method names separated by commas, or
 * `all`; naming an SCF method solves it here. Without --methods the record has the fast methods
 * and whatever SCF results the database cache holds (NUXT_DATABASE_URL), when it is reachable.
 */
import knexFactory, { type Knex } from 'knex'
import knexConfig from '../knex.config'
import { readScfCache } from '../server/utils/scf-cache'
import { solveSpeciesAll } from '../shared/physics/scf/index'
import type { ScfSpeciesEstimates } from '../shared/physics/scf/types'
import {
  ACCEPTED_NOTATIONS,
  METHODS,
  type MethodName,
  type SpeciesRecord,
  SpeciesParseError,
  describeSpecies,
  groundConfiguration,
  parseSpecies,
} from '../shared/physics/index'
import { formatRecord } from '../shared/physics/record-text'

const USAGE = `usage: npm run --silent species -- [--json] [--methods LIST] SPECIES...
  SPECIES   e.g. ${ACCEPTED_NOTATIONS.join(', ')}
  --json    one JSON object per species and line
  --methods comma-separated list or 'all'; known: ${METHODS.map((m) => m.name).join(', ')}
`

function fail(message: string): never {
  process.stderr.write(`species: ${message}\n`)
  process.exit(2)
}

interface Options {
  json: boolean
  methods: MethodName[] | null
  all: boolean
  species: string[]
}

function readArguments(argv: string[]): Options {
  const options: Options = { json: false, methods: null, all: false, species: [] }
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]
    if (arg === '--') {
      options.species.push(...argv.slice(i + 1))
      break
    }
    if (arg === '--help' || arg === '-h') {
      process.stdout.write(USAGE)
      process.exit(0)
    } else if (arg === '--json') options.json = true
    else if (arg === '--methods' || arg.startsWith('--methods=')) {
      const list = arg === '--methods' ? argv[++i] : arg.slice('--methods='.length)
      if (!list) fail('--methods needs a list of method names or all')
      const names = list.split(',').map((s) => s.trim()).filter(Boolean)
      if (names.length === 1 && names[0] === 'all') options.all = true
      else {
        const known = METHODS.map((m) => m.name as string)
        const unknown = names.filter((n) => !known.includes(n))
        if (unknown.length > 0) fail(`unknown method ${unknown.map((n) => `'${n.slice(0, 24)}'`).join(', ')}; known: ${known.join(', ')}`)
        options.methods = names as MethodName[]
      }
    } else if (arg.startsWith('--')) fail(`unknown option ${arg.slice(0, 24)}\n${USAGE}`)
    else options.species.push(arg)
  }
  if (options.species.length === 0) fail(`no species given\n${USAGE}`)
  return options
}

/** The cache, when a database answers within a moment; the command works without one. */
async function openCache(): Promise<Knex | null> {
  const quiet = () => {}
  const db = knexFactory({ ...knexConfig, pool: { min: 0, max: 1 }, acquireConnectionTimeout: 1500, log: { warn: quiet, error: quiet, debug: quiet, deprecate: quiet } })
  try {
    await db.raw('select 1 from species_scf_cache limit 1')
    return db
  } catch {
    await db.destroy()
    return null
  }
}

async function main(): Promise<void> {
  const options = readArguments(process.argv.slice(2))
  const scfNames = METHODS.filter((m) => m.scf).map((m) => m.name)
  const solveHere = options.all || (options.methods ?? []).some((m) => scfNames.includes(m))
  const methods: MethodName[] = options.all ? METHODS.map((m) => m.name) : (options.methods ?? METHODS.map((m) => m.name))
  const cache = options.methods === null && !options.all ? await openCache() : null

  let failed = false
  let printed = 0
  for (const input of options.species) {
    let record: SpeciesRecord & { scfStatus: 'computed' | 'cached' | 'none' }
    try {
      const parsed = parseSpecies(input)
      let scf: ScfSpeciesEstimates | null = null
      let scfFailure: string | null = null
      let scfStatus: 'computed' | 'cached' | 'none' = 'none'
      if (solveHere && parsed.charge < parsed.z && methods.some((m) => scfNames.includes(m))) {
        // A solver that gives up on one species should not cost the user the rest of its record.
        try {
          scf = solveSpeciesAll(parsed.z, parsed.charge, { configurationOf: groundConfiguration })
          scfStatus = 'computed'
        } catch (error) {
          scfFailure = `SCF solver failed: ${(error as Error).message}`
        }
      } else if (cache && parsed.charge < parsed.z) {
        scf = await readScfCache(cache, parsed.z, parsed.charge)
        if (scf) scfStatus = 'cached'
      }
      record = { ...describeSpecies(parsed, { methods, scf }), scfStatus }
      if (scfFailure) record.ionisationEnergy.notes.push(scfFailure)
    } catch (error) {
      failed = true
      const message = error instanceof SpeciesParseError ? error.message : `could not describe this species: ${(error as Error).message}`
      if (options.json) process.stdout.write(`${JSON.stringify({ input, error: message })}\n`)
      else process.stderr.write(`${input.slice(0, 40)}: ${message}\n`)
      continue
    }
    // Text records are blocks of lines: a blank line between them keeps them apart.
    process.stdout.write(options.json ? `${JSON.stringify(record)}\n` : `${printed > 0 ? '\n' : ''}${formatRecord(record)}\n`)
    printed++
  }
  await cache?.destroy()
  process.exitCode = failed ? 1 : 0
}

await main()
