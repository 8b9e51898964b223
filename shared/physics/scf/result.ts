/**
 * From the solver's internal state to the public, JSON-serialisable ScfResult: spin-averaged
 * orbitals with their mean radii, and a coarse radial-density table for plotting.
 */
import { subshellLabel } from './channels'
import type { ScfRun } from './scf'
import type { ScfOrbital, ScfRadialDensity, ScfResult } from './types'

/** The public result of a run; a run that failed carries no orbital numbers, only the reason. */
export function toResult(run: ScfRun, densityPoints: number): ScfResult {
  const head = { method: run.method, z: run.z, charge: run.charge, converged: run.converged, iterations: run.iterations }
  if (!run.converged) {
    return { ...head, totalEnergyHartree: Number.NaN, orbitals: [], failure: run.failure ?? 'did not converge' }
  }
  const { grid } = run
  const groups = new Map<string, { n: number; l: number; occ: number; e: number; r1: number; r2: number; p2: Float64Array }>()
  for (const { channel, energy, p } of run.solutions) {
    const label = subshellLabel(channel.n, channel.l)
    let g = groups.get(label)
    if (!g) {
      g = { n: channel.n, l: channel.l, occ: 0, e: 0, r1: 0, r2: 0, p2: new Float64Array(grid.size) }
      groups.set(label, g)
    }
    let r1 = 0
    let r2 = 0
    for (let i = 0; i < grid.size; i++) {
      const w = grid.dr[i] * p[i] * p[i]
      r1 += w * grid.r[i]
      r2 += w * grid.r[i] * grid.r[i]
      g.p2[i] += channel.occupation * p[i] * p[i]
    }
    g.occ += channel.occupation
    g.e += channel.occupation * energy
    g.r1 += channel.occupation * r1
    g.r2 += channel.occupation * r2
  }
  const orbitals: ScfOrbital[] = []
  for (const g of groups.values()) {
    const rMean = g.r1 / g.occ
    orbitals.push({
      n: g.n,
      l: g.l,
      occupation: g.occ,
      energyHartree: g.e / g.occ,
      rMean,
      r2Mean: g.r2 / g.occ,
      zEffMeanRadius: (3 * g.n * g.n - g.l * (g.l + 1)) / 2 / rMean,
    })
    for (let i = 0; i < grid.size; i++) g.p2[i] /= g.occ
  }
  orbitals.sort((a, b) => a.n - b.n || a.l - b.l)
  const result: ScfResult = { ...head, totalEnergyHartree: run.totalEnergy, orbitals }
  if (densityPoints > 1 && orbitals.length > 0) {
    result.density = densityTable(run, orbitals, groups, densityPoints)
  }
  return result
}

const round = (v: number) => Number(v.toPrecision(4))

/**
 * r²|R(r)|² of each subshell (spin-averaged, normalised to one electron) on a log-spaced table from
 * a twentieth of the innermost ⟨r⟩ to six times the outermost, linearly interpolated in ln r from
 * the solver's grid and rounded to four digits: enough to plot, small enough to cache by the thousand.
 */
function densityTable(
  run: ScfRun,
  orbitals: ScfOrbital[],
  groups: Map<string, { p2: Float64Array }>,
  points: number,
): ScfRadialDensity {
  const { grid } = run
  const radii = orbitals.map((o) => o.rMean)
  const lo = Math.max(grid.r[0], Math.min(...radii) / 20)
  const hi = Math.min(grid.r[grid.size - 1], Math.max(...radii) * 6)
  const x0 = Math.log(grid.r[0])
  const r: number[] = []
  const bySubshell: Record<string, number[]> = {}
  for (const label of groups.keys()) bySubshell[label] = []
  for (let k = 0; k < points; k++) {
    const rk = lo * Math.pow(hi / lo, k / (points - 1))
    const t = Math.min(grid.size - 1.000001, Math.max(0, (Math.log(rk) - x0) / grid.h))
    const i = Math.floor(t)
    const w = t - i
    r.push(round(rk))
    for (const [label, g] of groups) bySubshell[label].push(round((1 - w) * g.p2[i] + w * g.p2[i + 1]))
  }
  return { r, bySubshell }
}
