/**
 * Regenerates the outside reference values the unit tests compare against, so that the tests run
 * on a clean clone without the Debian packages:
 *
 *   tsx scripts/reference/build-fixtures.ts PYMATGEN_PERIODIC_TABLE_JSON ASE_DATA_INIT_PY [ASE_VERSION]
 *
 * - tests/fixtures/reference/pymatgen-elements.json: per element from python3-pymatgen's
 *   periodic_table.json: neutral ground configuration and ground level, the ionisation energies of
 *   the neutral atom and of the one-electron ion (NIST ASD), and the electron affinity.
 * - tests/fixtures/reference/ase-iupac2016-atomic-weights.json: `atomic_masses_iupac2016` from
 *   python3-ase's ase/data/__init__.py (IUPAC 2013 standard atomic weights, published 2016), with
 *   the trailing comment of each line (interval or mass number of the isotope used).
 *
 * Obtain: apt-get download python3-pymatgen python3-ase && dpkg -x python3-pymatgen_*.deb x &&
 * dpkg -x python3-ase_*.deb x; the ASE version is `dpkg-deb -f python3-ase_*.deb Version`.
 */
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs'
import { fileURLToPath } from 'node:url'
import { PYMATGEN_PACKAGE, PYMATGEN_PATH, loadPymatgen, normaliseStructure } from './pymatgen'

const [pymatgenPath, asePath, aseVersion = '3.22.1-3+deb12u1'] = process.argv.slice(2)
if (!asePath) {
  process.stderr.write('usage: tsx scripts/reference/build-fixtures.ts PERIODIC_TABLE_JSON ASE_DATA_INIT_PY [ASE_VERSION]\n')
  process.exit(2)
}
const dir = fileURLToPath(new URL('../../tests/fixtures/reference/', import.meta.url))
mkdirSync(dir, { recursive: true })

const neutral = loadPymatgen(pymatgenPath).map((e) => {
  const s = e.structure ? normaliseStructure(e.structure) : null
  // Only lists with one value per charge state can be indexed by charge (see build-nist-asd.ts).
  const ie = e.ionisationEnergies.length === e.z ? e.ionisationEnergies : []
  return {
    z: e.z,
    symbol: e.symbol,
    configuration: s?.text ?? null,
    tentative: s?.tentative ?? false,
    groundLevel: e.groundLevel,
    firstIonisationEv: ie[0] ?? null,
    hydrogenLikeIonisationEv: ie[e.z - 1] ?? null,
    electronAffinityEv: e.electronAffinity,
  }
})
writeFileSync(
  `${dir}pymatgen-elements.json`,
  JSON.stringify(
    {
      source: 'NIST Atomic Spectra Database, as carried by pymatgen',
      package: PYMATGEN_PACKAGE,
      path: PYMATGEN_PATH,
      fields:
        "'Electronic structure' ('.' separators and <sup> removed), 'Ground level' as given, " +
        "'Ionization energies' [0] and [Z-1] (null where the list is not one value per charge state), " +
        "'Electron affinity' (eV; pymatgen names no source for it)",
      elements: neutral,
    },
    null,
    1,
  ) + '\n',
)

// The array is one value per line, "    1.008,  # H [1.00784, 1.00811]", index 0 being a dummy.
const source = readFileSync(asePath, 'utf8')
const block = /atomic_masses_iupac2016 = np\.array\(\[([\s\S]*?)\]\)/.exec(source)
if (!block) throw new Error('atomic_masses_iupac2016 not found')
const weights = block[1]
  .split('\n')
  .map((line) => /^\s*([0-9.]+),\s*#\s*(.*)$/.exec(line))
  .filter((m): m is RegExpExecArray => m !== null)
  .map((m, z) => ({ z, value: Number(m[1]), comment: m[2].trim() }))
  .slice(1)
if (weights.length !== 118) throw new Error(`expected 118 weights, found ${weights.length}`)
writeFileSync(
  `${dir}ase-iupac2016-atomic-weights.json`,
  JSON.stringify(
    {
      source: 'IUPAC standard atomic weights 2013 (Meija et al., Pure Appl. Chem. 88, 265 (2016)), as carried by ASE',
      package: `python3-ase ${aseVersion} (Debian 12, LGPL-2.1+)`,
      path: 'usr/lib/python3/dist-packages/ase/data/__init__.py, atomic_masses_iupac2016',
      note: 'for elements without stable isotopes ASE gives the mass of the isotope named in the comment (IUPAC 2016 Table 4)',
      weights,
    },
    null,
    1,
  ) + '\n',
)
process.stdout.write(`wrote fixtures to ${dir}\n`)
