import { spawnSync } from 'node:child_process'
import { existsSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { PYMATGEN } from './fixtures'

const root = fileURLToPath(new URL('../../../', import.meta.url))

function run(...args: string[]) {
  const out = spawnSync('npx', ['tsx', 'scripts/species.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 })
  return { status: out.status, stdout: out.stdout, stderr: out.stderr }
}

describe('npm run species (scripts/species.ts as a child process)', () => {
  it('prints one JSON line per argument in input order, an error line for a bad one, and exits 1', () => {
    const { status, stdout } = run('--json', 'Fe XIV', 'Fe99+', 'O-', 'U91+')
    const lines = stdout.trimEnd().split('\n')
    expect(lines).toHaveLength(4)
    const [fe, bad, o, u] = lines.map((l) => JSON.parse(l))
    expect(fe).toMatchObject({ input: 'Fe XIV', z: 26, charge: 13, configuration: '1s2 2s2 2p6 3s2 3p1', term: '2P°1/2' })
    expect(Object.keys(bad)).toEqual(['input', 'error'])
    expect(bad.input).toBe('Fe99+')
    expect(bad.error).toMatch(/beyond the bare nucleus.*Accepted notations/)
    expect(o).toMatchObject({ input: 'O-', charge: -1 })
    expect(u.ionisationEnergy.estimates.map((e: { method: string }) => e.method)).toContain('dirac-hydrogen-like')
    expect(status).toBe(1)
  }, 60_000)

  it('exits 0 when every argument is good, and keeps to the methods asked for', () => {
    const { status, stdout } = run('--json', '--methods', 'slater-hydrogenic', 'Fe', '56Fe25+')
    expect(status).toBe(0)
    for (const line of stdout.trimEnd().split('\n')) {
      expect(JSON.parse(line).ionisationEnergy.estimates.map((e: { method: string }) => e.method)).toEqual(['slater-hydrogenic'])
    }
  }, 60_000)

  it('refuses an unknown method before printing anything, naming the known ones', () => {
    const { status, stdout, stderr } = run('--json', '--methods', 'slater-hydrogenic,guesswork', 'Fe')
    expect(status).toBe(2)
    expect(stdout).toBe('')
    expect(stderr).toMatch(/unknown method 'guesswork'; known: slater-hydrogenic, slater-total-energy, dirac-hydrogen-like, scf-delta, scf-eigenvalue, dirac-scf-delta, dirac-scf-eigenvalue/)
  }, 60_000)

  it('prints readable text by default', () => {
    const { status, stdout } = run('Fe XIV')
    expect(status).toBe(0)
    expect(stdout).toMatch(/^Fe XIV = Fe13\+/)
    expect(stdout).toMatch(/\[Ne\] 3s2 3p1/)
    expect(stdout).toMatch(/2P°1\/2/)
    expect(stdout).toMatch(/production threshold\s+361/)
  }, 60_000)
})

// The SCF methods come from shared/physics/scf when it is in the checkout (another engineer's
// work); the test only checks the wiring, using hydrogen, whose NIST ASD ionisation energy the
// pymatgen fixture carries.
describe.skipIf(!existsSync(new URL('../../../shared/physics/scf/index.ts', import.meta.url)))('SCF methods on the command line', () => {
  it('adds scf-delta and scf-eigenvalue when asked for', () => {
    const { status, stdout } = run('--json', '--methods', 'scf-delta,scf-eigenvalue', 'H')
    expect(status).toBe(0)
    const record = JSON.parse(stdout)
    expect(record.ionisationEnergy.estimates.map((e: { method: string }) => e.method)).toEqual(['scf-delta', 'scf-eigenvalue'])
    const delta = record.ionisationEnergy.estimates[0].eV
    expect(Math.abs(delta - (PYMATGEN[0].firstIonisationEv as number)) / 13.6).toBeLessThan(0.05)
    expect(record.screening[0].zEffMeanRadius).toBeGreaterThan(0)
  }, 60_000)

  it('prints the relativistic estimates and the binding energy of every nlj subshell in --json', () => {
    // NIST ASD ionisation energy of Ar7+ (Na-like, 3s): 143.4567 eV (pymatgen's periodic_table.json)
    const { status, stdout } = run('--json', '--methods', 'dirac-scf-delta,dirac-scf-eigenvalue', 'Ar 7+')
    expect(status).toBe(0)
    const record = JSON.parse(stdout)
    expect(record.ionisationEnergy.estimates.map((e: { method: string }) => e.method)).toEqual(['dirac-scf-delta', 'dirac-scf-eigenvalue'])
    expect(Math.abs(record.ionisationEnergy.estimates[0].deviationPercent)).toBeLessThan(2)
    const labels = record.bindingEnergies.map((b: { subshell: string }) => b.subshell)
    expect(labels).toEqual(['1s1/2', '2s1/2', '2p1/2', '2p3/2', '3s1/2'])
    for (const b of record.bindingEnergies) expect(Object.keys(b).sort()).toEqual(['eV', 'method', 'subshell'])
    // the outermost subshell is tied to the NIST value, the inner ones are eigenvalues, deepest first
    expect(record.bindingEnergies[4]).toEqual({ subshell: '3s1/2', eV: record.ionisationEnergy.reference.eV, method: 'nist-asd' })
    expect(record.bindingEnergies[0].method).toBe('dirac-scf-eigenvalue')
    expect(record.bindingEnergies[0].eV).toBeGreaterThan(record.bindingEnergies[1].eV)
    expect(record.dirac.orbitals).toHaveLength(5)
    expect(record.dirac.density.large['1s1/2'].length).toBe(record.dirac.density.r.length)
  }, 60_000)
})
