/**
 * Charge breeding in an electron-beam ion source or trap: successive single ionisation by the
 * electron beam only. Populations follow the rate equations
 *   dN_q/dt = (j/e) [σ_{q−1} N_{q−1} − σ_q N_q],
 * (e.g. R. Becker, Rev. Sci. Instrum. 71, 816 (2000) for their use in EBIS design — from memory).
 * Radiative recombination, charge exchange with residual gas, ion heating and escape are left
 * out: no published formula for them is used here, so the populations are an upper bound on how
 * fast charge builds up. The breeding factor to reach q from the injected charge q₀ is
 *   j·τ_q = e Σ_{k=q₀}^{q−1} 1/σ_k  (A·s/cm²),
 * and τ_q = j·τ_q / j.
 */
import { nextElectronSubshell } from '../physics/index'
import { subshellBindings, type BindingSources } from './binding'
import { LOTZ_SOURCE, LOTZ_UNCERTAINTY, lotzCrossSection } from './lotz'

const E_CHARGE = 1.602176634e-19 // C, exact (SI 2019)

export interface BreedStep {
  /** charge before the step q → q + 1 */
  charge: number
  crossSectionCm2: number
  /** binding energy of the electron removed (the outermost subshell), eV */
  bindingEv: number
  /** the subshell it leaves */
  subshell: string
  /** every subshell in the sum with its binding energy and where that came from */
  subshells: { subshell: string; electrons: number; eV: number; method: string }[]
}

export interface BreedTarget {
  /** charge state reached */
  charge: number
  jTauACm2: number
  timeS: number
  /** when the population of this state peaks, s (null if it never does within the run) */
  peakTimeS: number | null
  peakFraction: number | null
}

export interface ShellThreshold {
  /** the charge state whose next ionisation first needs this subshell opened */
  charge: number
  subshell: string
  bindingEv: number
  reachable: boolean
}

export interface BreedResult {
  z: number
  startCharge: number
  electronEnergyEv: number
  currentDensityACm2: number
  steps: BreedStep[]
  breeding: BreedTarget[]
  /** highest charge the beam energy can make */
  maxCharge: number
  thresholds: ShellThreshold[]
  populations: { timesS: number[]; byCharge: { charge: number; fraction: number[] }[] }
  uncertainty: number
  source: string
  warnings: string[]
}

/** The rate equations, integrated implicitly on a logarithmic grid; conserves ion number exactly. */
export function integratePopulations(rates: readonly number[], start: number, tEnd: number, samples: number[]) {
  const n = rates.length + 1
  let pop = new Float64Array(n)
  pop[0] = 1
  const out: number[][] = Array.from({ length: n }, () => [])
  const peak = Array.from({ length: n }, () => ({ t: 0, f: 0 }))
  let t = 0
  let dt = start
  let si = 0
  while (si < samples.length) {
    const tNext = Math.min(t + dt, samples[si]!)
    const h = tNext - t
    const next = new Float64Array(n)
    // Backward Euler: (1 + h k_q) N_q' = N_q + h k_{q−1} N_{q−1}'; the sum over q is unchanged.
    for (let q = 0; q < n; q++) {
      const k = q < rates.length ? rates[q]! : 0
      const feed = q > 0 ? h * rates[q - 1]! * next[q - 1]! : 0
      next[q] = (pop[q]! + feed) / (1 + h * k)
    }
    pop = next
    t = tNext
    for (let q = 0; q < n; q++) if (pop[q]! > peak[q]!.f) peak[q] = { t, f: pop[q]! }
    if (t >= samples[si]!) {
      for (let q = 0; q < n; q++) out[q]!.push(pop[q]!)
      si++
    }
    dt = Math.max(t * 0.01, start)
    if (t >= tEnd && si >= samples.length) break
  }
  return { series: out, peak }
}

/** Lotz cross-sections, breeding factors, thresholds and populations for element z from `startCharge`. */
export function breed(opts: { z: number; startCharge: number; electronEnergyEv: number; currentDensityACm2: number; bindings?: BindingSources }): BreedResult {
  const { z, startCharge, electronEnergyEv: e, currentDensityACm2: j } = opts
  const warnings: string[] = ['Only ionisation by the electron beam is modelled: radiative recombination and charge exchange are left out.']
  const steps: BreedStep[] = []
  const thresholds: ShellThreshold[] = []
  let lastShell = ''
  let maxCharge = startCharge
  for (let q = Math.max(startCharge, 0); q < z; q++) {
    const subs = subshellBindings(z, q, opts.bindings)
    const next = nextElectronSubshell(z, q)
    const outer = subs.find((s) => s.n === next?.n && s.l === next?.l) ?? subs[subs.length - 1]!
    const outerEv = Math.min(...subs.map((s) => s.eV))
    const shellName = `n = ${outer.n}`
    if (shellName !== lastShell) {
      thresholds.push({ charge: q, subshell: outer.subshell, bindingEv: outerEv, reachable: e > outerEv })
      lastShell = shellName
    }
    const sigma = lotzCrossSection(e, subs)
    if (sigma <= 0) break
    maxCharge = q + 1
    steps.push({ charge: q, crossSectionCm2: sigma, bindingEv: outerEv, subshell: outer.subshell, subshells: subs.map(({ subshell, electrons, eV, method }) => ({ subshell, electrons, eV, method })) })
  }
  if (steps.some((s) => s.charge <= 3)) warnings.push('Steps from charge 0–3 use the simplified Lotz constants; Lotz\'s fitted constants for low charges were not used.')
  if (e > 50_000) warnings.push('Above 50 keV the non-relativistic Lotz formula underestimates cross-sections.')
  if (maxCharge < z) warnings.push(`The electron energy does not reach the binding energy of the next electron beyond charge ${maxCharge}+.`)

  const flux = j / E_CHARGE
  const breeding: BreedTarget[] = []
  let sumInv = 0
  for (const s of steps) {
    sumInv += 1 / s.crossSectionCm2
    const jTau = E_CHARGE * sumInv
    breeding.push({ charge: s.charge + 1, jTauACm2: jTau, timeS: jTau / j, peakTimeS: null, peakFraction: null })
  }
  const rates = steps.map((s) => s.crossSectionCm2 * flux)
  const samples: number[] = []
  let populations: BreedResult['populations'] = { timesS: [], byCharge: [] }
  if (rates.length > 0) {
    const tMin = 0.01 / rates[0]!
    const tMax = Math.max(10 * (breeding[breeding.length - 1]!.timeS), tMin * 100)
    const decades = Math.log10(tMax / tMin)
    const count = Math.min(200, Math.ceil(decades * 10))
    for (let i = 0; i <= count; i++) samples.push(tMin * 10 ** ((decades * i) / count))
    const { series, peak } = integratePopulations(rates, tMin / 100, tMax, samples)
    populations = { timesS: samples, byCharge: series.map((fraction, i) => ({ charge: startCharge + i, fraction })) }
    for (const b of breeding) {
      const p = peak[b.charge - startCharge]!
      const last = b.charge === maxCharge
      b.peakTimeS = last ? null : p.t
      b.peakFraction = last ? null : p.f
    }
  }
  return {
    z,
    startCharge,
    electronEnergyEv: e,
    currentDensityACm2: j,
    steps,
    breeding,
    maxCharge,
    thresholds,
    populations,
    uncertainty: LOTZ_UNCERTAINTY,
    source: LOTZ_SOURCE,
    warnings,
  }
}
