/**
 * Command line for the species engine:
 *
 *   npm run --silent species -- [--json] [--methods LIST] SPECIES...
 *
 * Readable text by default; with --json one JSON object per argument and line, in input order
 * (DESIGN §5). A species that cannot be read gives {"input", "error"} in its place (text mode: a
 * line on stderr) and the exit status is 1 once everything else is printed; a bad option is
 * status 2 before anything is printed. --methods takes method names separated by commas, or
 * `all`. The SCF methods come from shared/physics/scf/index.ts and are loaded only when asked for.
 */
import { existsSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
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

// The solver takes its configurations from this engine, so both agree on what is being solved.
type Solver = (z: number, charge: number, options: { configurationOf: typeof groundConfiguration }) => ScfSpeciesEstimates

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

async function loadSolver(): Promise<Solver | null> {
  const url = new URL('../shared/physics/scf/index.ts', import.meta.url)
  if (!existsSync(fileURLToPath(url))) return null
  const mod = (await import(url.href)) as { solveSpeciesScf?: Solver }
  if (typeof mod.solveSpeciesScf !== 'function') fail('shared/physics/scf/index.ts does not export solveSpeciesScf')
  return mod.solveSpeciesScf
}

async function main(): Promise<void> {
  const options = readArguments(process.argv.slice(2))
  const scfNames = METHODS.filter((m) => m.scf).map((m) => m.name)
  const wantsScf = options.all || (options.methods ?? []).some((m) => scfNames.includes(m))
  const solver = wantsScf ? await loadSolver() : null
  let methods: MethodName[]
  if (options.all) {
    methods = METHODS.filter((m) => !m.scf || solver).map((m) => m.name)
    if (!solver) process.stderr.write(`species: ${scfNames.join(', ')} not available yet (no SCF solver in this checkout)\n`)
  } else {
    methods = options.methods ?? METHODS.filter((m) => !m.scf).map((m) => m.name)
    if (wantsScf && !solver) fail(`${scfNames.join(', ')}: not available yet (the SCF solver, shared/physics/scf/index.ts, is not in this checkout)`)
  }

  let failed = false
  let printed = 0
  for (const input of options.species) {
    let record: SpeciesRecord
    try {
      const parsed = parseSpecies(input)
      let scf: ScfSpeciesEstimates | null = null
      let scfFailure: string | null = null
      if (solver && parsed.charge < parsed.z && methods.some((m) => scfNames.includes(m))) {
        // A solver that gives up on one species should not cost the user the rest of its record.
        try {
          scf = solver(parsed.z, parsed.charge, { configurationOf: groundConfiguration })
        } catch (error) {
          scfFailure = `SCF solver failed: ${(error as Error).message}`
        }
      }
      record = describeSpecies(parsed, { methods, scf })
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
  process.exitCode = failed ? 1 : 0
}

await main()
