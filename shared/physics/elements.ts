/**
 * Elements Z = 1–118: symbol, name, atomic weight and nuclides.
 */
import { ATOMIC_WEIGHT_ROWS } from './data/atomic-weights'
import { NUCLIDE_ROWS, NUCLIDES_SOURCE } from './data/nuclides'

// IUPAC symbols and English names (IUPAC spelling: aluminium, caesium, sulfur).
const SYMBOLS = (
  'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
  'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb ' +
  'Lu Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No Lr ' +
  'Rf Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og'
).split(' ')

const NAMES = (
  'Hydrogen Helium Lithium Beryllium Boron Carbon Nitrogen Oxygen Fluorine Neon Sodium Magnesium ' +
  'Aluminium Silicon Phosphorus Sulfur Chlorine Argon Potassium Calcium Scandium Titanium Vanadium ' +
  'Chromium Manganese Iron Cobalt Nickel Copper Zinc Gallium Germanium Arsenic Selenium Bromine Krypton ' +
  'Rubidium Strontium Yttrium Zirconium Niobium Molybdenum Technetium Ruthenium Rhodium Palladium Silver ' +
  'Cadmium Indium Tin Antimony Tellurium Iodine Xenon Caesium Barium Lanthanum Cerium Praseodymium ' +
  'Neodymium Promethium Samarium Europium Gadolinium Terbium Dysprosium Holmium Erbium Thulium Ytterbium ' +
  'Lutetium Hafnium Tantalum Tungsten Rhenium Osmium Iridium Platinum Gold Mercury Thallium Lead Bismuth ' +
  'Polonium Astatine Radon Francium Radium Actinium Thorium Protactinium Uranium Neptunium Plutonium ' +
  'Americium Curium Berkelium Californium Einsteinium Fermium Mendelevium Nobelium Lawrencium ' +
  'Rutherfordium Dubnium Seaborgium Bohrium Hassium Meitnerium Darmstadtium Roentgenium Copernicium ' +
  'Nihonium Flerovium Moscovium Livermorium Tennessine Oganesson'
).split(' ')

export const MAX_Z = 118

export interface Isotope {
  massNumber: number
  /** atomic mass of the neutral atom, u */
  massU: number
  /** natural abundance as a mole fraction, null for nuclides not found in nature */
  abundance: number | null
}

export interface Element {
  z: number
  symbol: string
  name: string
  /** the number to compute with, u: the standard (or conventional) atomic weight, or for elements
   * with no standard atomic weight the mass of the bracketed reference isotope */
  atomicWeight: number
  /** as printed: '55.845', '1.008' or '[98]' */
  atomicWeightText: string
  /** 'standard' (IUPAC value), 'conventional' (IUPAC gives an interval), 'mass-number' ([98]) */
  atomicWeightKind: 'standard' | 'conventional' | 'mass-number'
  /** the IUPAC interval for 'conventional' values */
  atomicWeightInterval: readonly [number, number] | null
  /** the isotope behind a bracketed value; otherwise null */
  referenceMassNumber: number | null
  /** every nuclide listed in the nuclide data, lightest first */
  isotopes: readonly Isotope[]
  /** the isotopes found in nature, lightest first (empty for purely synthetic elements) */
  naturalIsotopes: readonly Isotope[]
  /** the natural isotope of largest abundance, or the reference isotope when none is natural */
  principalMassNumber: number
}

export const ISOTOPE_SOURCE = NUCLIDES_SOURCE

function buildElement(z: number): Element {
  const [first, masses, natural] = NUCLIDE_ROWS[z - 1]
  const abundance = new Map(natural.map(([a, x]) => [a, x]))
  const isotopes = masses.map((massU, i) => ({
    massNumber: first + i,
    massU,
    abundance: abundance.get(first + i) ?? null,
  }))
  const [text, interval] = ATOMIC_WEIGHT_ROWS[z - 1]
  const bracket = /^\[(\d+)\]$/.exec(text)
  const referenceMassNumber = bracket ? Number(bracket[1]) : null
  const naturalIsotopes = isotopes.filter((i) => i.abundance !== null)
  const principal = naturalIsotopes.reduce<Isotope | null>(
    (best, i) => (best === null || (i.abundance ?? 0) > (best.abundance ?? 0) ? i : best),
    null,
  )
  const principalMassNumber = principal?.massNumber ?? (referenceMassNumber as number)
  const reference = isotopes.find((i) => i.massNumber === referenceMassNumber)
  return {
    z,
    symbol: SYMBOLS[z - 1],
    name: NAMES[z - 1],
    atomicWeight: bracket ? (reference?.massU ?? (referenceMassNumber as number)) : Number(text),
    atomicWeightText: text,
    atomicWeightKind: bracket ? 'mass-number' : interval ? 'conventional' : 'standard',
    atomicWeightInterval: interval ?? null,
    referenceMassNumber,
    isotopes,
    naturalIsotopes,
    principalMassNumber,
  }
}

const ELEMENTS: readonly Element[] = Array.from({ length: MAX_Z }, (_, i) => buildElement(i + 1))
const BY_KEY = new Map<string, Element>()
for (const e of ELEMENTS) {
  BY_KEY.set(e.symbol.toLowerCase(), e)
  BY_KEY.set(e.name.toLowerCase(), e)
}

/** The element with atomic number z, or with that symbol or English name (any letter case). */
export function getElement(zOrSymbol: number | string): Element | undefined {
  if (typeof zOrSymbol === 'number') return Number.isInteger(zOrSymbol) ? ELEMENTS[zOrSymbol - 1] : undefined
  return BY_KEY.get(zOrSymbol.trim().toLowerCase())
}

/** All 118 elements in order of Z. */
export function allElements(): readonly Element[] {
  return ELEMENTS
}

/** The element symbol for Z (1–118); throws for anything else. */
export function symbolOf(z: number): string {
  const e = ELEMENTS[z - 1]
  if (!e) throw new RangeError(`no element with Z = ${z}`)
  return e.symbol
}

/** The listed nuclide (z, massNumber), or undefined. */
export function getIsotope(z: number, massNumber: number): Isotope | undefined {
  const e = ELEMENTS[z - 1]
  return e?.isotopes[massNumber - (e.isotopes[0]?.massNumber ?? 0)]
}
