/**
 * Stripper media: an element (C, Al, Ni, Au …), a diatomic gas (N2, O2, H2) or a compound written
 * as a formula (CH2, Al2O3), with the numbers the charge-state and stopping formulas need.
 *
 * Mean excitation energies I (eV) for the elements: ICRU Report 37 (1984) / ICRU Report 49 (1993)
 * table of recommended values — recalled, **from memory**; each is checked against the
 * proton stopping-power test in tests/unit/beam/stopping.test.ts only through water. Elements
 * not in the table use the Bloch-type rule I ≈ 10 eV · Z (F. Bloch, Z. Phys. 81, 363 (1933)),
 * flagged as a rough estimate. Compounds use the Bragg additivity rule for ln I weighted by
 * electrons (W. H. Bragg & R. Kleeman, Phil. Mag. 10, 318 (1905)), which neglects chemical
 * binding (a few per cent in I).
 */
import { getElement } from '../physics/index'

export const I_VALUES_SOURCE = 'ICRU Report 37 (1984) and ICRU Report 49 (1993), recommended I-values — from memory'

// ICRU 37/49 mean excitation energies, eV (from memory). Gases are the gas-phase values.
const I_EV: Record<number, number> = {
  1: 19.2, 2: 41.8, 4: 63.7, 6: 78.0, 7: 82.0, 8: 95.0, 10: 137.0, 13: 166.0, 14: 173.0, 18: 188.0,
  22: 233.0, 26: 286.0, 28: 311.0, 29: 322.0, 36: 352.0, 47: 470.0, 54: 482.0, 73: 718.0, 74: 727.0, 78: 790.0, 79: 790.0,
}

/** Elements that are gases at room temperature (common practice, no source). */
const GASES = new Set([1, 2, 7, 8, 9, 10, 17, 18, 36, 54, 86])

export interface MediumPart {
  z: number
  symbol: string
  /** atoms per formula unit */
  count: number
  atomicWeight: number
  iEv: number
  iSource: string
}

export interface Medium {
  /** as the caller wrote it, normalised ('C', 'N2', 'Al2O3') */
  label: string
  phase: 'solid' | 'gas'
  parts: MediumPart[]
  /** electron-weighted mean atomic number (what the charge-state formulas call Z_t) */
  zEff: number
  /** Σ nZ / Σ nA, mol electrons per gram */
  zOverA: number
  /** mean excitation energy, eV (Bragg rule for more than one element) */
  iEv: number
  notes: string[]
}

export class MediumError extends Error {}

/** Reads 'C', 'N2', 'CH2', 'Al2O3'; `gas` marks a gas stripper (the default for gaseous elements). */
export function parseMedium(text: string, gas?: boolean): Medium {
  const cleaned = String(text ?? '').replace(/[₀-₉]/g, (c) => String(c.charCodeAt(0) - 0x2080)).trim()
  if (!/^([A-Z][a-z]?\d*){1,6}$/.test(cleaned) || cleaned.length > 24) {
    throw new MediumError('a stripper medium is an element or formula such as C, N2, Ar, CH2 or Al2O3')
  }
  const parts: MediumPart[] = []
  for (const [, sym, n] of cleaned.matchAll(/([A-Z][a-z]?)(\d*)/g)) {
    const element = getElement(sym!)
    if (!element || element.symbol !== sym) throw new MediumError('a stripper medium names an unknown element')
    const count = n ? Number(n) : 1
    if (count < 1 || count > 99) throw new MediumError('atom counts in a stripper formula run from 1 to 99')
    const known = I_EV[element.z]
    parts.push({
      z: element.z,
      symbol: element.symbol,
      count,
      atomicWeight: element.atomicWeight,
      iEv: known ?? 10 * element.z,
      iSource: known ? I_VALUES_SOURCE : 'I ≈ 10 eV · Z (Bloch 1933), rough estimate',
    })
  }
  const electrons = parts.reduce((s, p) => s + p.count * p.z, 0)
  const mass = parts.reduce((s, p) => s + p.count * p.atomicWeight, 0)
  const lnI = parts.reduce((s, p) => s + p.count * p.z * Math.log(p.iEv), 0) / electrons
  const allGas = parts.every((p) => GASES.has(p.z))
  const notes: string[] = []
  if (parts.some((p) => !I_EV[p.z])) notes.push('The mean excitation energy of at least one element is a rough estimate (10 eV · Z).')
  if (parts.length > 1) notes.push('Compound: mean excitation energy from the Bragg additivity rule, chemical binding neglected.')
  return {
    label: cleaned,
    phase: gas ?? allGas ? 'gas' : 'solid',
    parts,
    zEff: electrons / parts.reduce((s, p) => s + p.count, 0),
    zOverA: electrons / mass,
    iEv: Math.exp(lnI),
    notes,
  }
}
