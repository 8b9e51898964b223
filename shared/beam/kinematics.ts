/**
 * Energies, velocities and rigidities of an ion, relativistic throughout.
 *
 * The ion's rest mass is the isotope's atomic mass (npm chemical-elements, NIST) less q electron
 * masses; the electrons' binding energy (under 1 MeV even for U, a few parts in 10⁶ of the mass)
 * is ignored, and the report says so.
 */
import { CODATA_2018, getElement, getIsotope } from '../physics/index'

/** CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)). */
export const U_MEV = CODATA_2018.atomicMassUnitEv / 1e6
export const ELECTRON_MASS_MEV = CODATA_2018.electronMassEv / 1e6
export const ELECTRON_MASS_U = CODATA_2018.electronMassEv / CODATA_2018.atomicMassUnitEv
/** speed of light, m/s (exact, SI) */
export const C_M_S = 299_792_458
/** speed of light in units of the Bohr velocity: 1/α */
export const C_IN_BOHR = 1 / CODATA_2018.fineStructure

export const ENERGY_UNITS = ['MeV/u', 'MeV', 'MeV/nucleon'] as const
export type EnergyUnit = (typeof ENERGY_UNITS)[number]

export interface IonMass {
  z: number
  massNumber: number
  charge: number
  /** atomic mass of the neutral atom, u */
  atomicMassU: number
  /** rest mass of the ion: atomic mass less `charge` electron masses, u */
  ionMassU: number
  ionMassMeV: number
  note: string
}

/** Rest mass of the ion (Z, A, q): the atomic mass less q electrons, binding ignored. */
export function ionMass(z: number, massNumber: number, charge: number): IonMass {
  const isotope = getIsotope(z, massNumber)
  if (!isotope) throw new RangeError(`no nuclide A = ${massNumber} for Z = ${z}`)
  const ionMassU = isotope.massU - charge * ELECTRON_MASS_U
  return {
    z,
    massNumber,
    charge,
    atomicMassU: isotope.massU,
    ionMassU,
    ionMassMeV: ionMassU * U_MEV,
    note: 'atomic mass of the isotope less the removed electrons; electron binding energies ignored',
  }
}

export interface EnergyForms {
  /** kinetic energy per atomic mass unit of the ion's rest mass, MeV/u */
  mevPerU: number
  /** total kinetic energy, MeV */
  totalMeV: number
  /** kinetic energy per nucleon (divided by the mass number A), MeV */
  mevPerNucleon: number
}

/**
 * The three ways the trade writes a beam energy, from any one of them. MeV/u divides by the ion's
 * rest mass in u, MeV/nucleon by the mass number A (common practice, no source; they differ by
 * the mass excess, under 0.1 % for most nuclides).
 */
export function energyForms(value: number, unit: EnergyUnit, mass: IonMass): EnergyForms {
  const totalMeV = unit === 'MeV' ? value : unit === 'MeV/u' ? value * mass.ionMassU : value * mass.massNumber
  return { totalMeV, mevPerU: totalMeV / mass.ionMassU, mevPerNucleon: totalMeV / mass.massNumber }
}

export interface Motion {
  beta: number
  gamma: number
  /** momentum × c, MeV */
  pcMeV: number
  /** velocity in atomic units (Bohr velocity v₀ = αc) */
  vOverV0: number
}

/** β, γ and p·c of a particle of rest energy `massMeV` and kinetic energy `kineticMeV`. */
export function motion(kineticMeV: number, massMeV: number): Motion {
  const gamma = 1 + kineticMeV / massMeV
  // β² = 1 − 1/γ² written as (γ² − 1)/γ² keeps its digits at low energy.
  const beta = Math.sqrt((gamma - 1) * (gamma + 1)) / gamma
  const pcMeV = Math.sqrt(kineticMeV * (kineticMeV + 2 * massMeV))
  return { beta, gamma, pcMeV, vOverV0: beta * C_IN_BOHR }
}

export interface Rigidity {
  charge: number
  /** magnetic rigidity Bρ = p/(q e), T·m */
  tm: number
  /** electric rigidity Eρ = p v/(q e), MV */
  mv: number
  beta: number
  gamma: number
}

/**
 * Magnetic rigidity Bρ = p/(qe) and electric rigidity Eρ = pv/(qe) of charge state q at total
 * kinetic energy T (standard relativistic kinematics): with p·c in MeV, Bρ [T·m] = p·c / (299.792458 · q)
 * and Eρ [MV] = p·c · β / q. The rest mass is that of the ion in charge state q.
 */
export function rigidity(z: number, massNumber: number, charge: number, totalMeV: number): Rigidity {
  if (charge <= 0) throw new RangeError('rigidity needs a positive charge state')
  const mass = ionMass(z, massNumber, charge)
  const m = motion(totalMeV, mass.ionMassMeV)
  return { charge, tm: m.pcMeV / ((C_M_S / 1e6) * charge), mv: (m.pcMeV * m.beta) / charge, beta: m.beta, gamma: m.gamma }
}

/** The element's principal isotope when none is named (what a magnet selects from natural stock). */
export function defaultMassNumber(z: number): number {
  const element = getElement(z)
  if (!element) throw new RangeError(`no element with Z = ${z}`)
  return element.principalMassNumber
}
