/**
 * The ground configuration of a heavy ion chosen by energy: of the configurations that share
 * its electrons among the outer subshells (4f, 5s, 5p, 5d, 5f, 6s, 6p, 6d, 7s, 7p), the one
 * with the lowest Dirac–Kohn–Sham total energy.
 *
 * Why: in ions of the lanthanides and beyond, 4f (or 5f) competes with 5s/5p (6s/6p) and the
 * order flips with the charge. No filling rule gets it right everywhere: the removal rule of
 * configuration.ts empties 4f before 5p (so In-like Yb²¹⁺ comes out 4d10 5s2 5p, NIST ASD gives
 * 4d10 4f3), and tungsten ions lose 4f before 5s from W¹³⁺ on. Comparing the total energies of
 * the competing configurations is how such ground configurations are chosen in systematic
 * relativistic calculations of all ions (G. C. Rodrigues, P. Indelicato, J. P. Santos, P. Patté
 * and F. Parente, At. Data Nucl. Data Tables 86, 117 (2004), from memory: Dirac–Fock energies
 * of the candidate configurations of every ion, the lowest kept).
 *
 * How: a descent over one-electron moves between those subshells, from the removal rule's
 * configuration and from the hydrogenic-order one (the two ends of the competition), keeping
 * the lower end point. Every candidate is solved on one radial grid with the settings of the
 * production solver (jj split, finite nucleus of the principal isotope, self-interaction
 * correction), seeded with the densities of the configuration it moved from. The energy is
 * that of the spherically averaged, spin-polarised configuration, not of a level: where two
 * configurations lie within a few eV the choice can differ from the level order NIST ASD gives
 * (tests/unit/scf/configuration-search.test.ts lists where it agrees and where not).
 *
 * It is slow (tens of solves per ion), so the engine does not run it per look-up:
 * scripts/dks-configurations.ts runs it once over the ions it covers and writes the result to
 * data/dks-configurations.ts, which configuration.ts reads.
 */
import { energySearchDomain, hydrogenicFill, neutralSubshells, removalRuleConfiguration } from '../filling'
import { getElement } from '../elements'
import { type Subshell, canonical, capacity } from '../subshells'
import { defaultJSplit } from './dirac-channels'
import { runDirac, type DiracRun } from './dirac-scf'
import { defaultRMax } from './scf'

/** The subshells whose occupations compete in heavy ions. */
const OUTER: readonly (readonly [number, number])[] = [
  [4, 3],
  [5, 0],
  [5, 1],
  [5, 2],
  [5, 3],
  [6, 0],
  [6, 1],
  [6, 2],
  [7, 0],
  [7, 1],
]

/** The ions the search covers (filling.ts energySearchDomain). */
export const searchDomain = energySearchDomain

export interface ConfigurationChoice {
  z: number
  charge: number
  /** the removal rule's configuration (configuration.ts without the tables) */
  rule: Subshell[]
  /** the configuration of lowest total energy */
  chosen: Subshell[]
  /** its total energy, hartree */
  energyHartree: number
  /** how much lower than the rule's configuration, hartree (0 when the rule's is chosen) */
  gainHartree: number
  /** self-consistent solves run */
  solves: number
}

const keyOf = (c: readonly Subshell[]) => c.map((s) => `${s.n}${s.l}:${s.electrons}`).join(' ')

/** Energy below which two configurations count as equal, hartree: the rule's is then kept. */
const TIE_HARTREE = 1e-6

/** The lowest-energy configuration of (z, charge) by the descent described above. */
export function lowestEnergyConfiguration(z: number, charge: number): ConfigurationChoice {
  const electrons = z - charge
  if (!searchDomain(z, charge)) throw new RangeError('the search covers Z ≥ 57 with 5 ≤ charge < electrons')
  const rule = canonical(removalRuleConfiguration(z, charge))
  const hydrogenic = canonical(hydrogenicFill(electrons))
  const neutral = neutralSubshells(z).subshells
  const occupied = (c: readonly Subshell[], n: number, l: number) => c.some((s) => s.n === n && s.l === l && s.electrons > 0)
  const active = OUTER.filter(([n, l]) => occupied(rule, n, l) || occupied(hydrogenic, n, l) || occupied(neutral, n, l))
  const settings = {
    rMax: defaultRMax(z, rule),
    jSplit: defaultJSplit(z, charge),
    massNumber: getElement(z)?.principalMassNumber,
    densityPoints: 0,
  }
  const runs = new Map<string, DiracRun>()
  const solve = (c: Subshell[], seed?: DiracRun): DiracRun => {
    const key = keyOf(c)
    let run = runs.get(key)
    if (!run) {
      run = runDirac(z, c, settings, seed)
      runs.set(key, run)
    }
    return run
  }
  const moves = (from: Subshell[]): Subshell[][] => {
    const out: Subshell[][] = []
    for (const [na, la] of active) {
      const source = from.find((s) => s.n === na && s.l === la)
      if (!source) continue
      for (const [nb, lb] of active) {
        if (na === nb && la === lb) continue
        const target = from.find((s) => s.n === nb && s.l === lb)
        if (target && target.electrons >= capacity(lb)) continue
        const next = from.map((s) => ({ ...s }))
        next.find((s) => s.n === na && s.l === la)!.electrons--
        const t = next.find((s) => s.n === nb && s.l === lb)
        if (t) t.electrons++
        else next.push({ n: nb, l: lb, electrons: 1 })
        out.push(canonical(next))
      }
    }
    return out
  }
  const descend = (start: Subshell[]): { config: Subshell[]; run: DiracRun } => {
    let config = start
    let run = solve(config)
    for (;;) {
      if (!run.converged) return { config, run }
      let best: { config: Subshell[]; run: DiracRun } | null = null
      for (const candidate of moves(config)) {
        const r = solve(candidate, run)
        if (r.converged && r.totalEnergy < (best?.run.totalEnergy ?? run.totalEnergy) - TIE_HARTREE) best = { config: candidate, run: r }
      }
      if (!best) return { config, run }
      ;({ config, run } = best)
    }
  }
  const fromRule = descend(rule)
  const fromHydrogenic = keyOf(hydrogenic) === keyOf(rule) ? fromRule : descend(hydrogenic)
  const ruleRun = solve(rule)
  const better =
    fromHydrogenic.run.converged && (!fromRule.run.converged || fromHydrogenic.run.totalEnergy < fromRule.run.totalEnergy - TIE_HARTREE)
      ? fromHydrogenic
      : fromRule
  // nothing converged: keep the rule (the solver will say it did not converge)
  const chosen = better.run.converged ? better : { config: rule, run: ruleRun }
  const gain = ruleRun.converged && chosen.run.converged ? ruleRun.totalEnergy - chosen.run.totalEnergy : 0
  return {
    z,
    charge,
    rule,
    chosen: chosen.config,
    energyHartree: chosen.run.totalEnergy,
    gainHartree: Math.max(0, gain),
    solves: runs.size,
  }
}
