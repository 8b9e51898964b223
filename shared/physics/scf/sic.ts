/**
 * The self-interaction correction of J. P. Perdew and A. Zunger, Phys. Rev. B 23, 5048 (1981),
 * in their spherical approximation for atoms: every occupied orbital α of spin σ removes its own
 * Hartree and exchange–correlation energy, E_SIC = −Σ_α (U[ρ_α] + E_xc[ρ_α, 0]), and sees the
 * orbital-dependent potential v_KS − V_H[ρ_α] − v_xc↑[ρ_α, 0]. Orbitals of one subshell and spin
 * share a radial function, so their spherically averaged densities coincide.
 */
import type { RadialGrid } from './grid'
import { orbitalPieces } from './channels'
import { hartree, type HartreeWorkspace } from './potential'
import { polarisedOnGrid } from './xc'
import { addRelativisticPolarised } from './xc-relativistic'

export interface SicWorkspace {
  p: Float64Array
  vh: Float64Array
  vxc: Float64Array
}

/** Scratch space for selfInteraction() on this grid. */
export function sicWorkspace(grid: RadialGrid): SicWorkspace {
  return { p: new Float64Array(grid.size), vh: new Float64Array(grid.size), vxc: new Float64Array(grid.size) }
}

/**
 * For one channel with radial charge pChannel (= perSpin·spins·P², any normalisation) and perSpin
 * electrons per spin: writes the occupation-weighted correction potential into vOut (to be
 * subtracted from v_KS) and returns the correction energy of all its orbitals (both spins when
 * spins = 2). relativisticExchange applies the correction of xc-relativistic.ts to the orbital's
 * own exchange too, as the relativistic solver's field does to the total.
 */
export function selfInteraction(
  grid: RadialGrid,
  pChannel: Float64Array,
  perSpin: number,
  spins: number,
  vOut: Float64Array,
  ws: SicWorkspace,
  hws: HartreeWorkspace,
  relativisticExchange = false,
): number {
  const size = grid.size
  const { p, vh, vxc } = ws
  // Far out, where the orbital density is below 1e-20 of its peak, its Hartree potential is 1/r
  // and its exchange–correlation potential below ~1e-7 hartree: the correction stops there.
  let end = 0
  let charge = 0
  let peak = 0
  for (let i = 0; i < size; i++) peak = Math.max(peak, pChannel[i])
  for (let i = 0; i < size; i++) if (pChannel[i] > 1e-20 * peak) end = i + 1
  for (let i = 0; i < end; i++) charge += grid.dr[i] * Math.max(0, pChannel[i])
  const scale = charge > 0 ? 1 / charge : 0
  for (let i = 0; i < end; i++) p[i] = Math.max(0, pChannel[i]) * scale
  for (let i = end; i < size; i++) p[i] = 0
  // a unit orbital density: U[f·ρ] = f²·U[ρ] and V_H[f·ρ] = f·V_H[ρ]
  const u1 = hartree(grid, p, vh, hws, end)
  for (let i = 0; i < size; i++) vOut[i] = 0
  let energy = 0
  for (const { fraction, count } of orbitalPieces(perSpin)) {
    if (fraction !== 1) for (let i = 0; i < end; i++) p[i] *= fraction
    let exc = polarisedOnGrid(grid.r, grid.dr, p, end, vxc)
    if (relativisticExchange) exc += addRelativisticPolarised(grid.r, grid.dr, p, end, vxc)
    if (fraction !== 1) for (let i = 0; i < end; i++) p[i] /= fraction
    const weight = (count * fraction) / perSpin
    for (let i = 0; i < size; i++) vOut[i] += weight * (fraction * vh[i] + (i < end ? vxc[i] : 0))
    energy -= count * (fraction * fraction * u1 + exc)
  }
  return spins * energy
}
