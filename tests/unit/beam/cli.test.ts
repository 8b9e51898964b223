import { spawnSync } from 'node:child_process'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'
import { beamCli } from '../../../scripts/beam'

const root = fileURLToPath(new URL('../../../', import.meta.url))

// In process, so the suite does not pay for a child per case; one child below checks that
// `npm run beam` itself wires up the same function.
function run(...args: string[]) {
  let stdout = ''
  let stderr = ''
  const status = beamCli(args, (t) => (stdout += t), (t) => (stderr += t))
  return { status, stdout, stderr }
}

describe('the beam command line', () => {
  it('strip --json answers with the contract fields, for a foil and for a gas', () => {
    const foil = run('strip', '--json', '208Pb27+', '--energy', '4.2', '--medium', 'C', '--areal-density', '20')
    expect(foil.status).toBe(0)
    const p = JSON.parse(foil.stdout.trim())
    expect(p).toMatchObject({ ion: '208Pb27+', energyMeVPerU: 4.2, medium: 'C' })
    expect(p.models.map((m: { model: string }) => m.model)).toEqual(['schiwietz-grande-2001', 'schiwietz-grande-2004', 'nikolaev-dmitriev-1968', 'sayer-1977', 'baron-1993'])
    for (const m of p.models) {
      expect(Object.keys(m)).toEqual(expect.arrayContaining(['model', 'source', 'meanCharge', 'width', 'fractions', 'warnings']))
      expect(m.fractions[0]).toEqual({ charge: 0, fraction: expect.any(Number) })
    }
    expect(p.rigidity.find((r: { charge: number }) => r.charge === 54)).toMatchObject({ charge: 54, tm: expect.any(Number), mv: expect.any(Number) })
    expect(p.energyLoss.estimated).toBe(true)

    const gas = run('strip', '--json', '12C1-', '--energy', '0.21', '--medium', 'Ar', '--gas')
    const g = JSON.parse(gas.stdout.trim())
    expect(g).toMatchObject({ ion: '12C-', energyMeVPerU: 0.21, medium: 'Ar' })
    expect(g.energyLoss).toBeUndefined()
    // a solid-only formula gives no number for a gas: it is not among the models, and says why
    expect(g.models.map((m: { model: string }) => m.model)).not.toContain('schiwietz-grande-2004')
    expect(g.notApplicable).toEqual([expect.objectContaining({ model: 'schiwietz-grande-2004', reason: expect.stringMatching(/solid strippers only/) })])
    expect(p.notApplicable).toEqual([])
  })

  it('breed --json answers steps and breeding with the contract fields; a bad ion is an error line and status 1', () => {
    const out = run('breed', '--json', 'Ar', 'Zz', '--electron-energy', '5000', '--current-density', '250')
    expect(out.status).toBe(1)
    const [ar, bad] = out.stdout.trimEnd().split('\n').map((l) => JSON.parse(l))
    expect(ar).toMatchObject({ electronEnergyEv: 5000, currentDensityACm2: 250 })
    expect(ar.steps[0]).toMatchObject({ charge: 0, crossSectionCm2: expect.any(Number), bindingEv: expect.any(Number) })
    expect(ar.breeding[0]).toMatchObject({ charge: 1, jTauACm2: expect.any(Number), timeS: expect.any(Number) })
    expect(Object.keys(bad)).toEqual(['input', 'error'])
  })

  it('prints a readable table without --json', () => {
    const out = run('strip', '48Ca10+', '--energy', '240', '--unit', 'MeV', '--medium', 'C')
    expect(out.status).toBe(0)
    expect(out.stdout).toMatch(/48Ca10\+ at [\d.]+ MeV\/u \(240\.000 MeV total/)
    expect(out.stdout).toContain('Bρ [T·m]')
    expect(out.stdout).toContain('Schiwietz and P. L. Grande')
  })

  it('refuses a bad option with status 2 before printing anything', () => {
    const out = run('strip', '--json', 'Pb', '--energy', 'fast', '--medium', 'C')
    expect(out.status).toBe(2)
    expect(out.stdout).toBe('')
    expect(out.stderr).toMatch(/--energy needs a number/)
  })

  it('runs as npm run beam (scripts/beam.ts as a child process) with the exit status', () => {
    const out = spawnSync('npx', ['tsx', 'scripts/beam.ts', 'breed', '--json', 'He', 'Qq', '--electron-energy', '500', '--current-density', '10'], { cwd: root, encoding: 'utf8', timeout: 60_000 })
    expect(out.status).toBe(1)
    const lines = out.stdout.trimEnd().split('\n').map((l) => JSON.parse(l))
    expect(lines[0].breeding.map((b: { charge: number }) => b.charge)).toEqual([1, 2])
    expect(lines[1].input).toBe('Qq')
  }, 60_000)
})
