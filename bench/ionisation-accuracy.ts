/**
 * How close each ionisation-energy method comes to the NIST ASD reference values.
 *
 *   npm run bench:accuracy
 *
 * For every species with a reference ionisation energy (Z ≤ 103, charge 0 … Z − 1) the absolute
 * percentage deviation |estimate − reference| / reference of each method, summarised as mean and
 * median overall and by charge group. Negative ions (reference = electron affinity) are a row
 * group of their own and not part of "all": their references are a few tenths of an eV and the
 * percentages would swamp everything else.
 *
 * Other method providers (the SCF solver's, for one) join by calling addMethodProvider() before
 * runAccuracyBench(), e.g. from a bench file of their own that imports this one.
 */
import { pathToFileURL } from 'node:url'
import { METHODS, describeSpecies, referenceIonisationEv } from '../shared/physics/index'
import type { ScfSpeciesEstimates } from '../shared/physics/scf/types'

export interface MethodProvider {
  /** the method name printed in the table */
  method: string
  /** the estimate in eV for (z, charge), or null where the method does not apply */
  estimate: (z: number, charge: number) => number | null
}

interface Group {
  label: string
  test: (z: number, charge: number) => boolean
}

export const GROUPS: readonly Group[] = [
  { label: 'all (q ≥ 0)', test: (_, q) => q >= 0 },
  { label: 'first IE, Z = 1–54', test: (z, q) => q === 0 && z <= 54 },
  { label: 'all charge states, Z = 1–30', test: (z, q) => q >= 0 && z <= 30 },
  { label: 'first IE, Z = 55–92', test: (z, q) => q === 0 && z >= 55 && z <= 92 },
  { label: 'all charge states, Z = 55–92', test: (z, q) => q >= 0 && z >= 55 && z <= 92 },
  { label: 'neutral (q = 0)', test: (_, q) => q === 0 },
  { label: 'singly charged (q = 1)', test: (_, q) => q === 1 },
  { label: 'q = 2–4', test: (_, q) => q >= 2 && q <= 4 },
  { label: 'highly charged (q ≥ 5)', test: (_, q) => q >= 5 },
  { label: 'heavy highly charged (Z ≥ 36, q ≥ 5)', test: (z, q) => z >= 36 && q >= 5 },
  { label: 'one-electron ions', test: (z, q) => q === z - 1 },
  { label: 'negative ions (EA)', test: (_, q) => q === -1 },
]

const providers: MethodProvider[] = []

/** Adds a method to the comparison (call before runAccuracyBench). */
export function addMethodProvider(provider: MethodProvider): void {
  providers.push(provider)
}

// The engine's own closed-form methods, read from the species record so the bench measures
// exactly what users see.
for (const m of METHODS.filter((x) => !x.scf)) {
  addMethodProvider({
    method: m.name,
    estimate: (z, charge) =>
      describeSpecies({ input: '', z, symbol: '', charge, massNumber: null }, { methods: [m.name] }).ionisationEnergy.estimates[0]?.eV ??
      null,
  })
}

function reference(z: number, charge: number): number | null {
  if (charge >= 0) return referenceIonisationEv(z, charge)
  const r = describeSpecies({ input: '', z, symbol: '', charge, massNumber: null }, { methods: [] }).ionisationEnergy.reference
  return r?.eV ?? null
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b)
  const m = s.length >> 1
  return s.length === 0 ? NaN : s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2
}
const mean = (xs: number[]) => (xs.length === 0 ? NaN : xs.reduce((a, b) => a + b, 0) / xs.length)
const fmt = (x: number) =>
  Number.isNaN(x) ? '—' : x >= 1000 ? x.toExponential(2) : x >= 1 ? x.toFixed(x >= 100 ? 0 : x >= 10 ? 1 : 2) : x.toPrecision(2)

/** Computes and prints the table; returns the deviations by method and group label. */
export function runAccuracyBench(out: (line: string) => void = (l) => process.stdout.write(`${l}\n`)) {
  const species: { z: number; charge: number; ref: number }[] = []
  for (let z = 1; z <= 118; z++) {
    for (let charge = -1; charge < z; charge++) {
      const ref = reference(z, charge)
      if (ref !== null) species.push({ z, charge, ref })
    }
  }
  const results = new Map<string, Map<string, number[]>>()
  for (const p of providers) {
    const byGroup = new Map<string, number[]>(GROUPS.map((g) => [g.label, []]))
    for (const s of species) {
      const eV = p.estimate(s.z, s.charge)
      if (eV === null) continue
      const deviation = (100 * Math.abs(eV - s.ref)) / s.ref
      for (const g of GROUPS) if (g.test(s.z, s.charge)) byGroup.get(g.label)?.push(deviation)
    }
    results.set(p.method, byGroup)
  }

  const count = (label: string) => species.filter((s) => GROUPS.find((g) => g.label === label)?.test(s.z, s.charge)).length
  out('Ionisation energy: absolute deviation from NIST ASD, percent (mean / median, n species)')
  out(`reference: ${species.length} species with a NIST ASD value (via pymatgen); groups by charge q of the species ionised`)
  out('')
  const head = ['group', 'species', ...providers.map((p) => p.method)]
  const rows = GROUPS.map((g) => [
    g.label,
    String(count(g.label)),
    ...providers.map((p) => {
      const xs = results.get(p.method)?.get(g.label) ?? []
      return xs.length === 0 ? '—' : `${fmt(mean(xs))} / ${fmt(median(xs))} (${xs.length})`
    }),
  ])
  const widths = head.map((_, i) => Math.max(head[i].length, ...rows.map((r) => r[i].length)))
  const line = (cells: string[]) => cells.map((c, i) => c.padEnd(widths[i])).join('  ').trimEnd()
  out(line(head))
  out(widths.map((w) => '-'.repeat(w)).join('  '))
  for (const r of rows) out(line(r))
  return results
}

/**
 * Solves every species with a reference value in worker threads (about a minute on two cores)
 * and adds the scf-delta, scf-eigenvalue, dirac-scf-delta and dirac-scf-eigenvalue rows.
 */
async function addScfProviders(workers: number): Promise<void> {
  const { Piscina } = await import('piscina')
  const pool = new Piscina({ filename: new URL('../server/workers/scf.ts', import.meta.url).href, execArgv: ['--import', 'tsx'], minThreads: workers, maxThreads: workers })
  const delta = new Map<string, number | null>()
  const eigen = new Map<string, number | null>()
  const diracDelta = new Map<string, number | null>()
  const diracEigen = new Map<string, number | null>()
  const jobs: Promise<void>[] = []
  for (let z = 1; z <= 118; z++) {
    for (let charge = 0; charge < z; charge++) {
      if (referenceIonisationEv(z, charge) === null) continue
      jobs.push(
        pool.run({ z, charge }).then((r: ScfSpeciesEstimates) => {
          delta.set(`${z}:${charge}`, r.deltaEv)
          eigen.set(`${z}:${charge}`, r.eigenvalueEv)
          diracDelta.set(`${z}:${charge}`, r.dirac?.deltaEv ?? null)
          diracEigen.set(`${z}:${charge}`, r.dirac?.eigenvalueEv ?? null)
        }),
      )
    }
  }
  const started = performance.now()
  await Promise.all(jobs)
  await pool.destroy()
  process.stdout.write(`(SCF: ${jobs.length} species solved in ${((performance.now() - started) / 1000).toFixed(0)} s with ${workers} workers)\n\n`)
  addMethodProvider({ method: 'scf-delta', estimate: (z, q) => delta.get(`${z}:${q}`) ?? null })
  addMethodProvider({ method: 'scf-eigenvalue', estimate: (z, q) => eigen.get(`${z}:${q}`) ?? null })
  addMethodProvider({ method: 'dirac-scf-delta', estimate: (z, q) => diracDelta.get(`${z}:${q}`) ?? null })
  addMethodProvider({ method: 'dirac-scf-eigenvalue', estimate: (z, q) => diracEigen.get(`${z}:${q}`) ?? null })
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  // --no-scf leaves out the SCF methods (the closed-form table alone takes a second).
  if (!process.argv.includes('--no-scf')) await addScfProviders(2)
  runAccuracyBench()
}
