/**
 * Reading pymatgen's periodic_table.json, shared by the scripts that write the engine's reference
 * data and the test fixtures. pymatgen carries NIST ASD values; we take only the fields we need.
 */
import { readFileSync } from 'node:fs'

/** The Debian package the file comes from; named in every header that quotes it. */
export const PYMATGEN_PACKAGE = 'python3-pymatgen 2022.11.7+dfsg1-11+deb12u2 (Debian 12, MIT licence)'
export const PYMATGEN_PATH = 'usr/lib/python3/dist-packages/pymatgen/core/periodic_table.json'
export const HOW_TO_OBTAIN =
  'apt-get download python3-pymatgen && dpkg -x python3-pymatgen_*.deb x ' +
  '(then pass x/usr/lib/python3/dist-packages/pymatgen/core/periodic_table.json)'

export interface PymatgenElement {
  z: number
  symbol: string
  /** as stored, e.g. "[Ar].3d<sup>6</sup>.4s<sup>2</sup>", or null */
  structure: string | null
  groundLevel: string | null
  ionisationEnergies: (number | null)[]
  electronAffinity: number | null
}

/** Loads the file at `path` (or exits with how to obtain it) and returns its elements by Z. */
export function loadPymatgen(path: string | undefined): PymatgenElement[] {
  if (!path) {
    process.stderr.write(`usage: tsx ${process.argv[1]} PATH/TO/periodic_table.json\n  get it: ${HOW_TO_OBTAIN}\n`)
    process.exit(2)
  }
  const raw = JSON.parse(readFileSync(path, 'utf8')) as Record<string, Record<string, unknown>>
  const out: PymatgenElement[] = []
  for (const [symbol, d] of Object.entries(raw)) {
    const z = d['Atomic no'] as number
    const level = d['Ground level']
    out.push({
      z,
      symbol,
      structure: typeof d['Electronic structure'] === 'string' ? (d['Electronic structure'] as string) : null,
      groundLevel: typeof level === 'string' && level.length > 0 ? level : null,
      ionisationEnergies: (d['Ionization energies'] as (number | null)[] | undefined) ?? [],
      electronAffinity: typeof d['Electron affinity'] === 'number' ? (d['Electron affinity'] as number) : null,
    })
  }
  out.sort((a, b) => a.z - b.z)
  if (out.length !== 118 || out.some((e, i) => e.z !== i + 1)) throw new Error('expected Z = 1..118 once each')
  return out
}

/** "[Ar].3d<sup>6</sup>.4s<sup>2</sup> (tentative)" → { text: "[Ar] 3d6 4s2", tentative: true }. */
export function normaliseStructure(structure: string): { text: string; tentative: boolean } {
  const tentative = /tentative/i.test(structure)
  const text = structure
    .replace(/\(tentative\)/i, '')
    .replace(/<\/?sup>/g, '')
    .trim()
    .split('.')
    .join(' ')
  return { text, tentative }
}
