/**
 * Command line for beam planning (pure: no database needed):
 *
 *   npm run --silent beam -- strip [--json] ION... --energy E [--unit MeV/u|MeV|MeV/nucleon] --medium M [--gas] [--areal-density UG_CM2]
 *   npm run --silent beam -- breed [--json] ION... --electron-energy EV --current-density A_CM2
 *
 * With --json one JSON object per ion and line, in input order; its field names are a contract
 * (issue 12). An ion that cannot be planned gives {"input", "error"} in its place (text mode: a
 * line on stderr) and the exit status is 1 once everything else is printed; a bad option is
 * status 2 before anything is printed.
 */
import { fileURLToPath } from 'node:url'
import { BeamInputError, ENERGY_UNITS, breedPlan, formatBreed, formatStrip, stripPlan, type EnergyUnit } from '../shared/beam/index'

const USAGE = `usage:
  npm run --silent beam -- strip [--json] ION... --energy E [--unit ${ENERGY_UNITS.join('|')}] --medium M [--gas] [--areal-density UG_PER_CM2]
  npm run --silent beam -- breed [--json] ION... --electron-energy EV --current-density A_PER_CM2
  ION       e.g. 208Pb27+, 12C1-, Ar, 48Ca10+
  --energy  beam energy, MeV/u unless --unit says otherwise
  --medium  stripper element or formula: C, Al, Au, N2, Ar, He, CH2 …; --gas for a gas stripper
`

class UsageError extends Error {}
class HelpAsked extends Error {}

function fail(message: string): never {
  throw new UsageError(message)
}

function number(name: string, text: string | undefined): number {
  const v = Number(text)
  if (text === undefined || text.trim() === '' || !Number.isFinite(v)) fail(`${name} needs a number`)
  return v
}

const VALUE_OPTIONS = ['--energy', '--unit', '--medium', '--areal-density', '--electron-energy', '--current-density'] as const

function readArguments(argv: string[]) {
  const [command, ...rest] = argv
  if (command === '--help' || command === '-h') throw new HelpAsked()
  if (command !== 'strip' && command !== 'breed') fail(`first argument must be strip or breed\n${USAGE}`)
  const values: Record<string, string> = {}
  const flags = { json: false, gas: false }
  const ions: string[] = []
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i]!
    const eq = arg.indexOf('=')
    const name = arg.startsWith('--') && eq > 0 ? arg.slice(0, eq) : arg
    if (arg === '--help' || arg === '-h') throw new HelpAsked()
    else if (arg === '--json') flags.json = true
    else if (arg === '--gas') flags.gas = true
    else if ((VALUE_OPTIONS as readonly string[]).includes(name)) {
      const value = eq > 0 && name !== arg ? arg.slice(eq + 1) : rest[++i]
      if (value === undefined) fail(`${name} needs a value`)
      values[name] = value
    } else if (arg.startsWith('--')) fail(`unknown option ${arg.slice(0, 24)}\n${USAGE}`)
    else ions.push(arg)
  }
  if (ions.length === 0) fail(`no ion given\n${USAGE}`)
  return { command, values, flags, ions }
}

/** Runs the command line on `argv`, writing to `out` and `err`; returns the exit status. */
export function beamCli(argv: string[], out: (text: string) => void, err: (text: string) => void): number {
  let run: (ion: string) => unknown
  let text: (plan: never) => string
  let parsed: ReturnType<typeof readArguments>
  try {
    parsed = readArguments(argv)
    const { command, values, flags } = parsed
    if (command === 'strip') {
      const energy = number('--energy', values['--energy'])
      const unit = (values['--unit'] ?? 'MeV/u') as EnergyUnit
      if (!ENERGY_UNITS.includes(unit)) fail(`--unit must be one of ${ENERGY_UNITS.join(', ')}`)
      const medium = values['--medium'] ?? fail('--medium is required for strip (e.g. C, N2, Ar)')
      const areal = values['--areal-density'] === undefined ? undefined : number('--areal-density', values['--areal-density'])
      run = (ion) => stripPlan({ ion, energy, unit, medium, gas: flags.gas || undefined, arealDensityUgCm2: areal })
      text = formatStrip as (plan: never) => string
    } else {
      const electronEnergyEv = number('--electron-energy', values['--electron-energy'])
      const currentDensityACm2 = number('--current-density', values['--current-density'])
      run = (ion) => breedPlan({ ion, electronEnergyEv, currentDensityACm2 })
      text = formatBreed as (plan: never) => string
    }
  } catch (e) {
    if (e instanceof HelpAsked) {
      out(USAGE)
      return 0
    }
    if (e instanceof UsageError) {
      err(`beam: ${e.message}\n`)
      return 2
    }
    throw e
  }
  let failed = false
  let printed = 0
  for (const input of parsed.ions) {
    let plan: unknown
    try {
      plan = run(input)
    } catch (error) {
      if (!(error instanceof BeamInputError)) throw error
      failed = true
      if (parsed.flags.json) out(`${JSON.stringify({ input, error: error.message })}\n`)
      else err(`${input.slice(0, 40)}: ${error.message}\n`)
      continue
    }
    out(parsed.flags.json ? `${JSON.stringify(plan)}\n` : `${printed > 0 ? '\n' : ''}${text(plan as never)}\n`)
    printed++
  }
  return failed ? 1 : 0
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  process.exitCode = beamCli(process.argv.slice(2), (t) => process.stdout.write(t), (t) => process.stderr.write(t))
}
