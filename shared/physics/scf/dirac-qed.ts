/**
 * One-loop QED of the s electrons of a two- or three-electron ion, screened by the others, from
 * its Dirac–Kohn–Sham orbitals: the corrections the ionisation energy of a He- or Li-like ion
 * gets on top of the ΔSCF energy (which has the finite nucleus already).
 *
 * Self-energy: the hydrogenic one-loop self-energy of the same n and κ (1s: self-energy.ts's F
 * of Shabaev, Tupitsyn and Yerokhin 2013 with Mohr's low-Z expansion; 2s: the 2s F of the same
 * paper) scaled by how much of the orbital's density lies near the nucleus against the
 * hydrogenic orbital's, measured as ⟨e^(−r/ƛ_C)⟩ (ƛ_C the reduced Compton wavelength). Scaling
 * the hydrogenic self-energy by the near-nucleus density is the screening used for many-electron
 * ions since P. Indelicato and J. P. Desclaux (and Y.-K. Kim et al., Phys. Rev. A 44, 148
 * (1991): from memory, not read); the weight e^(−r/ƛ_C) is that of the local part of the model
 * self-energy operator of V. M. Shabaev, I. I. Tupitsyn and V. A. Yerokhin, Phys. Rev. A 88,
 * 012513 (2013), read in the Jena Atomic Calculator (JAC, S. Fritzsche), module
 * InteractionStrengthQED, selfEnergyVolotka.
 *
 * Vacuum polarisation: the Uehling potential of the finite nucleus (uehling.ts) averaged over
 * each orbital itself, so it needs no scaling.
 *
 * Left out: the two-electron (screened-loop) diagrams beyond this density scaling, the
 * Wichmann–Kroll term and two-loop QED; for He-like U the density scaling reproduces the
 * screening of the one-loop terms to a few eV (tests/unit/scf/dirac-qed.test.ts).
 */
import { selfEnergyShift1s, selfEnergyShift2s } from '../qed/self-energy'
import { uehlingPotential } from '../qed/uehling'
import type { DiracRun } from './dirac-scf'
import { diracWorkspace, solveDiracState } from './dirac-radial'
import { nuclearPotential } from './nucleus'

/** CODATA 2018 fine-structure constant (Tiesinga et al., Rev. Mod. Phys. 93, 025010, 2021). */
const ALPHA = 7.2973525693e-3
/** m c² in hartree */
const MC2_HARTREE = 1 / (ALPHA * ALPHA)

/** The QED energy of every electron of a configuration, hartree (positive: the levels rise). */
export interface QedEnergy {
  selfEnergyHartree: number
  vacuumPolarisationHartree: number
}

/** The ions it is for: two or three electrons, Z ≥ 10 (the 2s self-energy table starts there). */
export function screenedQedDomain(z: number, electrons: number): boolean {
  return (electrons === 2 || electrons === 3) && z >= 10 && z <= 118
}

const dampedWeight = (r: number) => Math.exp(-r / ALPHA)

/** ⟨e^(−r/ƛ_C)⟩ of the bare-nucleus (hydrogenic) ns orbital on the run's grid and nucleus. */
function hydrogenicNearNucleus(run: DiracRun, n: number): number {
  const v = nuclearPotential(run.grid, run.z, run.nucleusRadius)
  const state = solveDiracState(run.grid, v, run.z, n, -1, (-0.5 * run.z * run.z) / (n * n), diracWorkspace(run.grid), 1e-11, run.nucleusRadius)
  if (typeof state === 'string') throw new Error(`hydrogenic ${n}s not found: ${state}`)
  let sum = 0
  for (let i = 0; i < run.grid.size; i++) sum += run.grid.dr[i] * dampedWeight(run.grid.r[i]) * (state.g[i] ** 2 + state.f[i] ** 2)
  return sum
}

/**
 * The screened self-energy and Uehling energy of a converged run whose electrons are all in
 * 1s and 2s (a one-, two- or three-electron ion's ground configuration), hartree; null for any
 * other run.
 */
export function qedEnergy(run: DiracRun): QedEnergy | null {
  if (!run.converged || run.solutions.some((s) => s.channel.kappa !== -1 || s.channel.n > 2)) return null
  const { grid, z } = run
  const hydrogenic = new Map<number, number>()
  const radiusNatural = run.nucleusRadius / ALPHA
  // the Uehling potential on the grid out to where it has died away (range ƛ_C/2: 40 ƛ_C is e^(−80))
  const uehling = new Float64Array(grid.size)
  for (let i = 0; i < grid.size && grid.r[i] < 40 * ALPHA; i++) uehling[i] = uehlingPotential(z, grid.r[i] / ALPHA, radiusNatural) * MC2_HARTREE
  let selfEnergy = 0
  let vacuum = 0
  for (const { channel, g, f } of run.solutions) {
    let near = 0
    let vp = 0
    for (let i = 0; i < grid.size; i++) {
      const density = g[i] * g[i] + f[i] * f[i]
      near += grid.dr[i] * dampedWeight(grid.r[i]) * density
      vp += grid.dr[i] * uehling[i] * density
    }
    let reference = hydrogenic.get(channel.n)
    if (reference === undefined) {
      reference = hydrogenicNearNucleus(run, channel.n)
      hydrogenic.set(channel.n, reference)
    }
    const bare = (channel.n === 1 ? selfEnergyShift1s(z) : selfEnergyShift2s(z)) * MC2_HARTREE
    selfEnergy += channel.occupation * bare * (near / reference)
    vacuum += channel.occupation * vp
  }
  return { selfEnergyHartree: selfEnergy, vacuumPolarisationHartree: vacuum }
}
