/**
 * A second opinion from outside the local-density approximation: the Hartree–Fock ΔSCF ionisation
 * energy of closed-shell ions, computed by NWChem, beside the engine's Dirac–Kohn–Sham ΔSCF and
 * NIST ASD's value.
 *
 *   tsx scripts/reference/hartree-fock-oracle.ts [--dkh] [Fm40+ Th30+ …]
 *
 * Why: where the engine and NIST ASD disagree by more than 3 % and NIST states its value only as a
 * theoretical estimate (±5 %), a second method with a different treatment of exchange tells
 * whether the gap is the local-density approximation's. ld1.x (tests/unit/scf/ld1x.test.ts) checks
 * the engine's solve of the same physics; this checks the physics.
 *
 * How: NWChem (Debian package nwchem; E. Aprà et al., J. Chem. Phys. 152, 184102, 2020) solves the
 * ion as a closed-shell restricted Hartree–Fock determinant and the next ion, one electron fewer,
 * as an unrestricted one, both in the uncontracted universal Gaussian basis (UGBS: E. V. R. de
 * Castro and F. E. Jorge, J. Chem. Phys. 108, 5225, 1998, as NWChem's library carries it), without
 * relativity or, with --dkh, with the scalar second-order Douglas–Kroll–Hess Hamiltonian (no
 * spin–orbit coupling: compare it with the engine's 'statistical' j split, which shares the hole
 * between j = l ∓ ½ by 2j + 1). Each ion takes a few minutes on one core; the test script does not
 * install NWChem or run this (apt-get install nwchem first).
 */
import { execFileSync } from 'node:child_process'
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { getElement, groundConfiguration, parseSpecies, referenceIonisationDetail, referenceIonisationEv } from '../../shared/physics/index'
import { capacity } from '../../shared/physics/subshells'
import { HARTREE_EV, solveSpeciesDirac, solveSpeciesScf } from '../../shared/physics/scf/index'

const NWCHEM = '/usr/bin/nwchem'
if (!existsSync(NWCHEM)) {
  console.error(`${NWCHEM} is missing: apt-get install nwchem`)
  process.exit(2)
}
const args = process.argv.slice(2)
const dkh = args.includes('--dkh')
const inputs = args.filter((a) => !a.startsWith('--'))
const ions = inputs.length ? inputs : ['Fm40+']

function hartreeFock(symbol: string, charge: number, open: boolean, work: string): number {
  const name = `${symbol}${charge}`
  const dir = path.join(work, name)
  const input = [
    `start ${name}`,
    `permanent_dir ${dir}`,
    `scratch_dir ${dir}`,
    `charge ${charge}`,
    'geometry noautosym nocenter noautoz',
    `  ${symbol} 0 0 0`,
    'end',
    'basis spherical',
    `  ${symbol} library ugbs`,
    'end',
    'scf',
    open ? '  doublet\n  uhf' : '  singlet\n  rhf',
    '  maxiter 60',
    // NWChem's unrestricted solve of a heavy one-hole ion stalls near an orbital gradient of 1e-3,
    // where the energy has settled to about 1e-6 hartree (it is quadratic in the gradient)
    `  thresh ${open ? '2e-3' : '1e-6'}`,
    'end',
    dkh ? 'relativistic\n  douglas-kroll dkh\nend' : '',
    'task scf energy',
    '',
  ].join('\n')
  const file = path.join(work, `${name}.nw`)
  writeFileSync(file, input)
  execFileSync('mkdir', ['-p', dir])
  let out = ''
  try {
    out = execFileSync(NWCHEM, [file], {
      cwd: work,
      encoding: 'utf8',
      maxBuffer: 64 * 1024 * 1024,
      stdio: ['pipe', 'pipe', 'pipe'],
      env: { ...process.env, OMPI_ALLOW_RUN_AS_ROOT: '1', OMPI_ALLOW_RUN_AS_ROOT_CONFIRM: '1' },
    })
  } catch (e) {
    // NWChem exits non-zero when an open-shell solve stagnates at a gradient it still prints
    out = String((e as { stdout?: string }).stdout ?? '')
  }
  const total = /Total SCF energy\s*=\s*(-?[\d.]+)/.exec(out)
  if (total) return Number(total[1])
  // the last iteration's energy once the solve stalls at a small gradient (it is then converged in the energy)
  const iterations = [...out.matchAll(/^\s+\d+\s+(-\d+\.\d+)\s+([\d.]+D[-+]\d+)/gm)]
  const last = iterations.at(-1)
  if (last && Number(last[2].replace('D', 'e')) < 5e-3) return Number(last[1])
  throw new Error(`NWChem gave no total energy for ${name}`)
}

const work = mkdtempSync(path.join(os.tmpdir(), 'ionfolio-hf-'))
try {
  console.log(`Hartree–Fock ΔSCF (NWChem, UGBS${dkh ? ', scalar DKH2' : ', non-relativistic'}) against the engine and NIST ASD, eV`)
  for (const text of ions) {
    const { z, charge } = parseSpecies(text)
    const symbol = getElement(z)!.symbol
    const configuration = groundConfiguration(z, charge)
    if (configuration.subshells.some((s) => s.electrons !== capacity(s.l))) {
      throw new Error(`${text}: only closed-shell ions (the next ion then has one hole), not ${configuration.core}`)
    }
    const hf = (hartreeFock(symbol, charge + 1, true, work) - hartreeFock(symbol, charge, false, work)) * HARTREE_EV
    const engine = dkh
      ? solveSpeciesDirac(z, charge, { functional: 'lda', jSplit: 'statistical', densityPoints: 0 }).deltaEv
      : solveSpeciesScf(z, charge, { functional: 'lda', densityPoints: 0 }).deltaEv
    const ref = referenceIonisationEv(z, charge)
    const u = referenceIonisationDetail(z, charge)?.uncertaintyEv
    const pct = (x: number | null) => (x === null || ref === null ? '—' : `${(((x - ref) / ref) * 100).toFixed(2)} %`)
    console.log(
      `${text.padEnd(8)} HF ${hf.toFixed(2)} (${pct(hf)})   engine ${dkh ? 'Dirac LDA, statistical j split' : 'LDA'} ${engine?.toFixed(2) ?? '—'} (${pct(engine)})   NIST ${ref ?? '—'}${u ? ` ± ${u}` : ''}`,
    )
  }
} finally {
  rmSync(work, { recursive: true, force: true })
}
