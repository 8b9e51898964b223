/**
 * Binding energies of every occupied subshell of an ion, for the Lotz sum: one provider so the
 * source can change without touching the cross-sections.
 *
 * In order of preference per subshell:
 * 1. `recorded`: binding energies carried by a species record (`bindingEnergies: [{ subshell:
 *    '2p3/2', eV, method }]`); j-split entries of one n,l are merged, weighted by 2j + 1.
 * 2. the outermost subshell: the reference ionisation energy (NIST ASD, as carried by the engine).
 * 3. `scf`: −ε of the SCF orbital when the caller (the server) passes eigenvalues in.
 * 4. Slater's rules, 13.6057 eV (Z_eff/n*)² (J. C. Slater, Phys. Rev. 36, 57 (1930)), never below
 *    the outermost energy.
 */
import {
  IONISATION_SOURCE,
  SLATER_RYDBERG_EV,
  groundConfiguration,
  nextElectronSubshell,
  referenceIonisationEv,
  slaterScreening,
  subshellLabel,
} from '../physics/index'

export interface RecordedBinding {
  subshell: string
  eV: number
  method: string
}

export interface SubshellBinding {
  /** '2p' */
  subshell: string
  n: number
  l: number
  electrons: number
  eV: number
  method: string
}

export interface BindingSources {
  /** per charge state, what a species record carries */
  recorded?: Record<number, readonly RecordedBinding[]>
  /** per charge state, SCF orbital eigenvalues as −ε in eV keyed by '2p' */
  scf?: Record<number, Record<string, number>>
}

function mergeRecorded(list: readonly RecordedBinding[]): Map<string, { eV: number; method: string }> {
  const acc = new Map<string, { w: number; sum: number; method: string }>()
  for (const b of list) {
    const m = /^(\d+)([spdfg])(?:(\d+)\/2)?$/.exec(b.subshell.trim())
    if (!m || !(b.eV > 0)) continue
    const key = `${m[1]}${m[2]}`
    const w = m[3] ? Number(m[3]) + 1 : 1
    const a = acc.get(key) ?? { w: 0, sum: 0, method: b.method }
    a.w += w
    a.sum += w * b.eV
    acc.set(key, a)
  }
  return new Map([...acc].map(([k, a]) => [k, { eV: a.sum / a.w, method: a.method }]))
}

/** Binding energy of each occupied subshell of Z with `charge`, outermost first marked by `method`. */
export function subshellBindings(z: number, charge: number, sources: BindingSources = {}): SubshellBinding[] {
  if (charge >= z) return []
  const config = groundConfiguration(z, charge)
  const outer = nextElectronSubshell(z, charge)
  const reference = referenceIonisationEv(z, charge)
  const recorded = sources.recorded?.[charge] ? mergeRecorded(sources.recorded[charge]!) : null
  const scf = sources.scf?.[charge] ?? null
  const screening = slaterScreening(z, config.subshells)
  const outerEv = reference ?? null
  return config.subshells.map((s, i) => {
    const label = subshellLabel(s.n, s.l)
    const base = { subshell: label, n: s.n, l: s.l, electrons: s.electrons }
    const rec = recorded?.get(label)
    if (rec) return { ...base, eV: rec.eV, method: `species record: ${rec.method}` }
    const isOuter = outer !== null && outer.n === s.n && outer.l === s.l
    if (isOuter && outerEv !== null) return { ...base, eV: outerEv, method: `reference ionisation energy (${IONISATION_SOURCE})` }
    const floor = outerEv ?? 0
    if (scf?.[label] && scf[label]! > 0) return { ...base, eV: Math.max(scf[label]!, floor), method: 'SCF orbital eigenvalue −ε (Koopmans)' }
    const row = screening[i]!
    const slater = SLATER_RYDBERG_EV * (row.zEff / row.nStar) ** 2
    return { ...base, eV: Math.max(slater, floor), method: "Slater's rules, 13.6057 eV (Z_eff/n*)² (Slater 1930)" }
  })
}
