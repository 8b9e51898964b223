/**
 * A second opinion from outside the local-density approximation: the Hartree–Fock ΔSCF ionisation
 * energy of an ion, computed by NWChem, beside the engine's Dirac–Kohn–Sham ΔSCF and
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
 * ion and the next one, one electron fewer, with the spin of the engine's ground configurations: a
 * closed shell as a restricted Hartree–Fock determinant, an open one as an unrestricted high-spin
 * one (so it compares with the engine's spin-polarised LSD, not with a level). NWChem is told the
 * charge and the spin only and finds its own lowest orbitals: where two configurations of the
 * next ion lie within a few eV (Pt¹⁷⁺: 4f13 5s2 and 4f14 5s), it may land in the other one. Both
 * in the uncontracted universal Gaussian basis (UGBS: E. V. R. de Castro and F. E. Jorge,
 * J. Chem. Phys. 108, 5225, 1998, as NWChem's library carries it), without
 * relativity or, with --dkh, with the scalar second-order Douglas–Kroll–Hess Hamiltonian (no
 * spin–orbit coupling: compare it with the engine's 'statistical' j split, which shares the hole
 * between j = l ∓ ½ by 2j + 1). Each ion takes a few minutes on one core; the test script does not
 * install NWChem or run this (apt-get install nwchem first).
 */
import { execFileSync } from 'node:child_process'
import { existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { getElement, groundConfiguration, parseSpecies, referenceIonisationDetail, referenceIonisationEv, unpairedElectrons } from '../../shared/physics/index'
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

const MULTIPLICITY = ['singlet', 'doublet', 'triplet', 'quartet', 'quintet', 'sextet', 'septet', 'octet']

/** Unpaired electrons of the engine's ground configuration, every open subshell high-spin (the record's own count). */
const unpaired = (z: number, charge: number) => unpairedElectrons(groundConfiguration(z, charge).subshells)

/** NWChem's total energy of (symbol, charge), hartree: closed shells restricted, open ones unrestricted high-spin. */
function hartreeFock(z: number, symbol: string, charge: number, work: string): number {
  const spins = unpaired(z, charge)
  const open = spins > 0
  if (spins >= MULTIPLICITY.length) throw new Error(`${symbol}${charge}+: ${spins} unpaired electrons, more than this script names`)
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
    `  ${MULTIPLICITY[spins]}\n  ${open ? 'uhf' : 'rhf'}`,
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
  mkdirSync(dir, { recursive: true })
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
    const closed = unpaired(z, charge) === 0
    const hf = (hartreeFock(z, symbol, charge + 1, work) - hartreeFock(z, symbol, charge, work)) * HARTREE_EV
    // like with like: spin-restricted LDA for a closed-shell ion, spin-polarised LSD for an open one
    const functional = closed ? 'lda' : 'lsd'
    const engine = dkh
      ? solveSpeciesDirac(z, charge, { functional, jSplit: 'statistical', densityPoints: 0 }).deltaEv
      : solveSpeciesScf(z, charge, { functional, densityPoints: 0 }).deltaEv
    const ref = referenceIonisationEv(z, charge)
    const u = referenceIonisationDetail(z, charge)?.uncertaintyEv
    const pct = (x: number | null) => (x === null || ref === null ? '—' : `${(((x - ref) / ref) * 100).toFixed(2)} %`)
    console.log(
      `${text.padEnd(8)} HF ${hf.toFixed(2)} (${pct(hf)})   engine ${dkh ? 'Dirac ' : ''}${functional.toUpperCase()}${dkh ? ', statistical j split' : ''} ${engine?.toFixed(2) ?? '—'} (${pct(engine)})   NIST ${ref ?? '—'}${u ? ` ± ${u}` : ''}`,
    )
  }
} finally {
  rmSync(work, { recursive: true, force: true })
}
