import { execFileSync } from 'node:child_process'
import { existsSync, mkdtempSync, rmSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
import { runDirac } from '../../../shared/physics/scf/index'
import { parseConfiguration } from '../../../shared/physics/subshells'

// The relativistic solver against an independent one: ld1.x of Quantum ESPRESSO (Debian package
// quantum-espresso; P. Giannozzi et al., J. Phys.: Condens. Matter 21, 395502, 2009), which solves
// the Dirac equation for the all-electron LDA atom with iswitch=1, rel=2. Like with like: Slater
// exchange with VWN correlation (dft='SLA-VWN', the functional of xc.ts, without its relativistic
// correction, which ld1.x does not apply), spin-restricted, no
// self-interaction correction, point nucleus (ld1.x's −2Z/r in Ry), and open subshells filled
// j = l − ½ first, as ld1.x does with a configuration written in nl ('jj' split). Compared: every
// nlj orbital eigenvalue, within 1e-4 relative (ld1.x prints eV with four decimals; its grid differs).
// Our grid step is halved to 0.02 here: the production step 0.04 leaves 5e-4 on uranium's shallow 5f
// (measured against the same run at 0.02, which agrees with ld1.x to 3e-5).

const LD1 = '/usr/bin/ld1.x'
const present = existsSync(LD1)
if (!present && process.env.CI) throw new Error(`${LD1} is missing: the test script installs the Debian package quantum-espresso`)
const RY_EV = 13.605693122994 // Rydberg energy in eV, CODATA 2018; only the ratio matters to 1e-7
const work = present ? mkdtempSync(path.join(os.tmpdir(), 'ionfolio-ld1-')) : ''
afterAll(() => {
  if (work) rmSync(work, { recursive: true, force: true })
})

/** ld1.x's printed output for one all-electron Dirac LDA atom or ion. */
function runLd1(title: string, z: number, configuration: string): string {
  const input = `&input\n title='${title}', zed=${z}., config='${configuration}', iswitch=1, rel=2, dft='SLA-VWN', beta=0.2, tr2=1e-12\n/\n`
  return execFileSync(LD1, [], { input, cwd: work, encoding: 'utf8', timeout: 60_000 })
}

function ld1(title: string, z: number, configuration: string): Map<string, number> {
  const out = runLd1(title, z, configuration)
  const block = out.split('Spin orbit split results')[1]?.split('Averaged results')[0] ?? ''
  const levels = new Map<string, number>()
  for (const m of block.matchAll(/^\s*(\d+)\s+(\d+)\s+(\d\.5)\s+\S+\s+\d\(\s*([\d.]+)\)\s+(-?[\d.]+)\s+(-?[\d.]+)\s+(-?[\d.]+)/gm)) {
    if (Number(m[4]) === 0) continue
    levels.set(`${m[1]},${m[2]},${Math.round(2 * Number(m[3]))}`, Number(m[7]) / (2 * RY_EV))
  }
  return levels
}

/** The engine's solver set up as ld1.x solves (see the header). */
const LIKE_LD1 = { functional: 'lda', nucleus: 'point', jSplit: 'jj', relativisticExchange: false, gridStep: 0.02, densityPoints: 0 } as const

const CASES: Array<[string, number, string, string]> = [
  ['Ar', 18, '[Ne] 3s2 3p6', '[Ne] 3s2 3p6'],
  ['Kr', 36, '[Ar] 3d10 4s2 4p6', '[Ar] 3d10 4s2 4p6'],
  ['Xe', 54, '[Kr] 4d10 5s2 5p6', '[Kr] 4d10 5s2 5p6'],
  ['Au', 79, '[Xe] 4f14 5d10 6s1', '[Xe] 4f14 5d10 6s1'],
  ['U', 92, '[Rn] 5f3 6d1 7s2', '[Rn] 5f3 6d1 7s2'],
  ['U80+', 92, '1s2 2s2 2p6 3s2', '1s2 2s2 2p6 3s2'],
]
const NOBLE: Record<string, string> = {
  '[Ne]': '1s2 2s2 2p6',
  '[Ar]': '1s2 2s2 2p6 3s2 3p6',
  '[Kr]': '1s2 2s2 2p6 3s2 3p6 3d10 4s2 4p6',
  '[Xe]': '1s2 2s2 2p6 3s2 3p6 3d10 4s2 4p6 4d10 5s2 5p6',
  '[Rn]': '1s2 2s2 2p6 3s2 3p6 3d10 4s2 4p6 4d10 5s2 5p6 4f14 5d10 6s2 6p6',
}
const expand = (c: string) => c.replace(/\[\w+\]/, (core) => NOBLE[core])

describe.skipIf(!present)('Dirac LDA eigenvalues against ld1.x (Quantum ESPRESSO), 1e-4 relative', () => {
  it.each(CASES)('%s', (title, z, ours, theirs) => {
    const reference = ld1(title, z, expand(theirs))
    const run = runDirac(z, parseConfiguration(expand(ours)), LIKE_LD1)
    expect(run.converged).toBe(true)
    const mine = new Map(run.solutions.map((s) => [`${s.channel.n},${s.channel.l},${s.channel.twoJ}`, s.energy]))
    expect([...mine.keys()].sort()).toEqual([...reference.keys()].sort())
    for (const [key, theirsHa] of reference) expect(Math.abs(mine.get(key)! / theirsHa - 1), key).toBeLessThan(1e-4)
  })
})

function ld1TotalEv(title: string, z: number, configuration: string): number {
  const m = /Etot\s*=\s*(-?[\d.]+)\s*Ry/.exec(runLd1(title, z, configuration))
  if (!m) throw new Error(`ld1.x printed no total energy for ${title}`)
  return Number(m[1]) * RY_EV
}

// ΔSCF: the ionisation energy as a difference of two total energies, both codes with the settings
// above. These three are where the engine's estimate and NIST ASD disagree most: the 4f removals of
// the 60-electron ions U³²⁺ and Fm⁴⁰⁺ (ASD 5.12: 1210 ± 60 eV and 1770 ± 90 eV, theoretical
// estimates) and the 5d removal of Hg⁵⁺ (ASD 5.12: 76.6 ± 0.5 eV, measured). The two solvers agree
// to better than 1e-5 here, so those gaps belong to the local-density approximation itself (or to
// the reference), not to how the engine solves it.
const DELTA_CASES: Array<[string, number, string, string]> = [
  ['U32+ (4f removal)', 92, '[Kr] 4d10 4f14', '[Kr] 4d10 4f13'],
  ['Fm40+ (4f removal)', 100, '[Kr] 4d10 4f14', '[Kr] 4d10 4f13'],
  ['Hg5+ (5d removal)', 80, '[Xe] 4f14 5d7', '[Xe] 4f14 5d6'],
]

describe.skipIf(!present)('Dirac LDA ΔSCF ionisation energies against ld1.x total energies, 1e-5 relative', () => {
  it.each(DELTA_CASES)('%s', (title, z, before, after) => {
    const total = (configuration: string) => {
      const run = runDirac(z, parseConfiguration(expand(configuration)), LIKE_LD1)
      expect(run.converged).toBe(true)
      return run.totalEnergy * 2 * RY_EV
    }
    const ours = total(after) - total(before)
    const theirs = ld1TotalEv(title, z, expand(after)) - ld1TotalEv(title, z, expand(before))
    expect(Math.abs(ours / theirs - 1)).toBeLessThan(1e-5)
  })
})

if (!present) {
  describe('ld1.x comparison', () => {
    it.skip(`skipped: ${LD1} is not installed (apt-get install quantum-espresso; npm test installs it)`, () => {})
  })
}
