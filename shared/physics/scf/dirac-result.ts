/**
 * From a relativistic run to the public DiracResult: nlj orbitals (spins merged) with mean radii of
 * both components, and a coarse table of the large- and small-component radial densities.
 */
import { relativisticLabel } from './dirac-channels'
import type { DiracRun } from './dirac-scf'
import { BOHR_FM } from './nucleus'
import type { DiracOrbital, DiracRadialDensity, DiracResult } from './types'

interface Group {
  orbital: DiracOrbital
  large: Float64Array
  small: Float64Array
}

export function toDiracResult(run: DiracRun, densityPoints: number): DiracResult {
  const head = {
    method: run.method,
    z: run.z,
    charge: run.charge,
    converged: run.converged,
    iterations: run.iterations,
    nucleusRadiusFm: Number((run.nucleusRadius * BOHR_FM).toFixed(4)),
  }
  if (!run.converged) return { ...head, totalEnergyHartree: Number.NaN, orbitals: [], failure: run.failure ?? 'did not converge' }
  const { grid } = run
  const groups = new Map<string, Group>()
  for (const { channel, energy, g, f } of run.solutions) {
    const label = relativisticLabel(channel.n, channel.l, channel.twoJ)
    let grp = groups.get(label)
    if (!grp) {
      const orbital: DiracOrbital = {
        n: channel.n,
        l: channel.l,
        twoJ: channel.twoJ,
        kappa: channel.kappa,
        label,
        occupation: 0,
        energyHartree: 0,
        rMean: 0,
        r2Mean: 0,
        rMeanLarge: 0,
        rMeanSmall: 0,
        smallFraction: 0,
      }
      grp = { orbital, large: new Float64Array(grid.size), small: new Float64Array(grid.size) }
      groups.set(label, grp)
    }
    let r1 = 0
    let r2 = 0
    let nl = 0
    let ns = 0
    let rl = 0
    let rs = 0
    for (let i = 0; i < grid.size; i++) {
      const gl = grid.dr[i] * g[i] * g[i]
      const fs = grid.dr[i] * f[i] * f[i]
      const r = grid.r[i]
      nl += gl
      ns += fs
      rl += gl * r
      rs += fs * r
      r1 += (gl + fs) * r
      r2 += (gl + fs) * r * r
      grp.large[i] += channel.occupation * g[i] * g[i]
      grp.small[i] += channel.occupation * f[i] * f[i]
    }
    const o = grp.orbital
    const q = channel.occupation
    o.occupation += q
    o.energyHartree += q * energy
    o.rMean += q * r1
    o.r2Mean += q * r2
    o.rMeanLarge += q * (rl / nl)
    o.rMeanSmall += q * (ns > 0 ? rs / ns : 0)
    o.smallFraction += q * ns
  }
  const orbitals: DiracOrbital[] = []
  for (const { orbital: o, large, small } of groups.values()) {
    const q = o.occupation
    o.energyHartree /= q
    o.rMean /= q
    o.r2Mean /= q
    o.rMeanLarge /= q
    o.rMeanSmall /= q
    o.smallFraction /= q
    for (let i = 0; i < grid.size; i++) {
      large[i] /= q
      small[i] /= q
    }
    orbitals.push(o)
  }
  orbitals.sort((a, b) => a.n - b.n || a.l - b.l || a.twoJ - b.twoJ)
  const result: DiracResult = { ...head, totalEnergyHartree: run.totalEnergy, orbitals }
  if (densityPoints > 1 && orbitals.length > 0) result.density = densityTable(run, orbitals, groups, densityPoints)
  return result
}

const round = (v: number) => Number(v.toPrecision(4))

/** As result.ts's table: log-spaced from a twentieth of the innermost ⟨r⟩ to six times the outermost. */
function densityTable(run: DiracRun, orbitals: DiracOrbital[], groups: Map<string, Group>, points: number): DiracRadialDensity {
  const { grid } = run
  const radii = orbitals.map((o) => o.rMean)
  const lo = Math.max(grid.r[0], Math.min(...radii) / 20)
  const hi = Math.min(grid.r[grid.size - 1], Math.max(...radii) * 6)
  const x0 = Math.log(grid.r[0])
  const r: number[] = []
  const large: Record<string, number[]> = {}
  const small: Record<string, number[]> = {}
  for (const label of groups.keys()) {
    large[label] = []
    small[label] = []
  }
  for (let k = 0; k < points; k++) {
    const rk = lo * Math.pow(hi / lo, k / (points - 1))
    const t = Math.min(grid.size - 1.000001, Math.max(0, (Math.log(rk) - x0) / grid.h))
    const i = Math.floor(t)
    const w = t - i
    r.push(round(rk))
    for (const [label, g] of groups) {
      large[label].push(round((1 - w) * g.large[i] + w * g.large[i + 1]))
      small[label].push(round((1 - w) * g.small[i] + w * g.small[i + 1]))
    }
  }
  return { r, large, small }
}
