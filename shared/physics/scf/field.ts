/**
 * The Kohn–Sham field of a set of orbital densities: one potential per channel (nucleus, Hartree,
 * spin-dependent exchange–correlation, minus its own self-interaction terms), and the total energy.
 */
import type { Channel } from './channels'
import type { RadialGrid } from './grid'
import type { ScfFunctional } from './options'
import { hartree, hartreeWorkspace } from './potential'
import { selfInteraction, sicWorkspace } from './sic'
import { lsdOnGrid } from './xc'
import { addRelativisticExchange } from './xc-relativistic'

/** One solved channel: its eigenvalue and radial function P (∫P² dr = 1). */
export interface ChannelSolution {
  channel: Channel
  energy: number
  p: Float64Array
}

export interface Field {
  /** per channel, the potential (hartree) built by the last call of build */
  potentials: Float64Array[]
  /** Potentials from the channel densities x (channel c at x[c·size…], occupation·P²); returns the energy terms. */
  build(x: Float64Array): { hartree: number; xc: number; sic: number }
}

/**
 * A field builder for these channels on this grid, with its scratch arrays; nuclear is the
 * potential of the nucleus (default the point charge −Z/r; the relativistic solver passes a
 * finite one), relativisticExchange adds the correction of xc-relativistic.ts.
 */
export function createField(
  z: number,
  grid: RadialGrid,
  channels: Channel[],
  functional: ScfFunctional,
  nuclear?: Float64Array,
  relativisticExchange = false,
): Field {
  const size = grid.size
  const count = channels.length
  const hws = hartreeWorkspace(grid)
  const sws = sicWorkspace(grid)
  const potentials = Array.from({ length: count }, () => new Float64Array(size))
  const pUp = new Float64Array(size)
  const pDown = new Float64Array(size)
  const total = new Float64Array(size)
  const vH = new Float64Array(size)
  const vxcUp = new Float64Array(size)
  const vxcDown = new Float64Array(size)
  const vSic = new Float64Array(size)

  const build = (x: Float64Array) => {
    pUp.fill(0)
    pDown.fill(0)
    for (let c = 0; c < count; c++) {
      const spin = channels[c].spin
      const o = c * size
      for (let i = 0; i < size; i++) {
        const q = x[o + i]
        if (spin === 'pair') {
          pUp[i] += 0.5 * q
          pDown[i] += 0.5 * q
        } else if (spin === 'up') pUp[i] += q
        else pDown[i] += q
      }
    }
    for (let i = 0; i < size; i++) total[i] = pUp[i] + pDown[i]
    const eH = hartree(grid, total, vH, hws)
    let eXc = lsdOnGrid(grid.r, grid.dr, pUp, pDown, vxcUp, vxcDown)
    if (relativisticExchange) eXc += addRelativisticExchange(grid.r, grid.dr, pUp, pDown, vxcUp, vxcDown)
    let eSic = 0
    for (let c = 0; c < count; c++) {
      const ch = channels[c]
      const v = potentials[c]
      const vxc = ch.spin === 'down' ? vxcDown : vxcUp
      if (nuclear) for (let i = 0; i < size; i++) v[i] = nuclear[i] + vH[i] + vxc[i]
      else for (let i = 0; i < size; i++) v[i] = -z / grid.r[i] + vH[i] + vxc[i]
      if (functional === 'lsd-sic') {
        eSic += selfInteraction(grid, x.subarray(c * size, (c + 1) * size), ch.perSpin, ch.spins, vSic, sws, hws, relativisticExchange)
        for (let i = 0; i < size; i++) v[i] -= vSic[i]
      }
    }
    return { hartree: eH, xc: eXc, sic: eSic }
  }
  return { potentials, build }
}

/**
 * E = T_s + E_nuc + E_H + E_xc + E_SIC of the output orbitals xOut, with the kinetic energy of each
 * orbital from its own eigenvalue, T = ε − ⟨P|v|P⟩ in the potential it was solved in (the field's
 * current potentials, which this call then replaces).
 */
export function totalEnergy(z: number, grid: RadialGrid, field: Field, solutions: ChannelSolution[], xOut: Float64Array): number {
  let kinetic = 0
  let nuclear = 0
  for (let c = 0; c < solutions.length; c++) {
    const { channel, energy, p } = solutions[c]
    const v = field.potentials[c]
    let pot = 0
    let nuc = 0
    for (let i = 0; i < grid.size; i++) {
      const w = grid.dr[i] * p[i] * p[i]
      pot += w * v[i]
      nuc += w / grid.r[i]
    }
    kinetic += channel.occupation * (energy - pot)
    nuclear -= channel.occupation * z * nuc
  }
  const terms = field.build(xOut)
  return kinetic + nuclear + terms.hartree + terms.xc + terms.sic
}
