/**
 * The outside reference values the physics tests compare against, read from
 * tests/fixtures/reference/ (extracted by scripts/reference/build-fixtures.ts from Debian packages;
 * each file's header names the package, its version and the path inside it).
 */
import { readFileSync } from 'node:fs'

function load<T>(name: string): T {
  return JSON.parse(readFileSync(new URL(`../../fixtures/reference/${name}`, import.meta.url), 'utf8')) as T
}

export interface PymatgenElement {
  z: number
  symbol: string
  configuration: string | null
  tentative: boolean
  groundLevel: string | null
  firstIonisationEv: number | null
  hydrogenLikeIonisationEv: number | null
  electronAffinityEv: number | null
}

/** NIST ASD values as carried by python3-pymatgen 2022.11.7 (periodic_table.json), index Z − 1. */
export const PYMATGEN = load<{ elements: PymatgenElement[] }>('pymatgen-elements.json').elements

/** IUPAC 2013 atomic weights as carried by python3-ase 3.22.1 (atomic_masses_iupac2016), index Z − 1. */
export const ASE_WEIGHTS = load<{ weights: { z: number; value: number; comment: string }[] }>('ase-iupac2016-atomic-weights.json').weights

const L = 'spdfghik'

/**
 * The test's own reading of a pymatgen configuration ('[Ar] 3d6 4s2'), cores expanded from the
 * fixture's own noble-gas entries, written in canonical order — independent of the engine's parser.
 */
export function expandFixtureConfiguration(text: string): string {
  const counts = new Map<string, number>()
  const add = (t: string) => {
    for (const token of t.split(' ').filter(Boolean)) {
      const core = /^\[(\w+)\]$/.exec(token)
      if (core) {
        const gas = PYMATGEN.find((e) => e.symbol === core[1])
        if (!gas?.configuration) throw new Error(`no core ${core[1]}`)
        add(gas.configuration)
        continue
      }
      const m = /^(\d+)([a-z])(\d+)$/.exec(token)
      if (!m) throw new Error(`bad token ${token}`)
      counts.set(`${m[1]}${m[2]}`, (counts.get(`${m[1]}${m[2]}`) ?? 0) + Number(m[3]))
    }
  }
  add(text)
  return [...counts]
    .sort(([a], [b]) => Number(a.slice(0, -1)) - Number(b.slice(0, -1)) || L.indexOf(a.slice(-1)) - L.indexOf(b.slice(-1)))
    .map(([k, v]) => `${k}${v}`)
    .join(' ')
}
