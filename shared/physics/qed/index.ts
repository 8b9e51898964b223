/**
 * The 1s binding energy of a one-electron ion to the limit of published one-loop theory: the
 * Dirac energy with the reduced mass, minus the finite-nuclear-size shift, the one-loop
 * self-energy and the Uehling vacuum polarisation (each a shift of the level; a positive shift
 * lowers the binding). Not included, and why it may be left out at 0.01 %: the Wichmann–Kroll
 * part of the vacuum polarisation (+4.4 eV of binding at U⁹¹⁺), two-loop QED (about +1.3 eV at
 * U⁹¹⁺), recoil beyond the reduced mass and nuclear polarisation (below 0.5 eV) — values from
 * memory of V. A. Yerokhin and V. M. Shabaev, J. Phys. Chem. Ref. Data 44, 033103 (2015).
 */
import { COMPTON_FM, finiteSizeShift1s, nuclearRadius } from './nucleus'
import { SELF_ENERGY_SOURCE, selfEnergyShift1s } from './self-energy'
import { uehlingShift1s } from './uehling'

export interface QedCorrection {
  /** 'finite nuclear size', 'self-energy', 'vacuum polarisation (Uehling)' */
  readonly name: string
  /** change of the ionisation energy, eV (negative when the correction lowers it) */
  readonly eV: number
  readonly source: string
}

export interface OneElectronEnergy {
  /** Dirac point-nucleus binding with the reduced mass, eV */
  diracEv: number
  corrections: readonly QedCorrection[]
  /** the binding energy with every correction, eV */
  totalEv: number
  rmsRadiusFm: number
  radiusSource: string
}

const ALPHA = 7.2973525693e-3
const cache = new Map<number, OneElectronEnergy>()

/**
 * The 1s ionisation energy of the one-electron ion of nuclide (Z, A) with its corrections, given
 * its Dirac point-nucleus energy (computed by the caller with the reduced mass); Z = 1–118.
 */
export function oneElectronEnergy(z: number, massNumber: number, diracEv: number, electronMassEv: number): OneElectronEnergy {
  const key = z * 1000 + massNumber
  const hit = cache.get(key)
  if (hit && hit.diracEv === diracEv) return hit
  const radius = nuclearRadius(z, massNumber)
  const me = electronMassEv
  const corrections: QedCorrection[] = [
    {
      name: 'finite nuclear size',
      eV: -finiteSizeShift1s(z * ALPHA, radius.rmsFm) * me,
      source: `V. M. Shabaev, J. Phys. B 26, 1103 (1993); R_rms = ${radius.rmsFm.toFixed(4)} fm, ${radius.source}`,
    },
    { name: 'self-energy', eV: -selfEnergyShift1s(z) * me, source: SELF_ENERGY_SOURCE },
    {
      name: 'vacuum polarisation (Uehling)',
      eV: -uehlingShift1s(z, radius.rmsFm, COMPTON_FM) * me,
      source: 'E. A. Uehling, Phys. Rev. 48, 55 (1935): potential of a uniformly charged nucleus, first order, Dirac 1s density',
    },
  ]
  const out: OneElectronEnergy = {
    diracEv,
    corrections: corrections.map((c) => Object.freeze(c)),
    totalEv: diracEv + corrections.reduce((sum, c) => sum + c.eV, 0),
    rmsRadiusFm: radius.rmsFm,
    radiusSource: radius.source,
  }
  cache.set(key, Object.freeze(out))
  return out
}
