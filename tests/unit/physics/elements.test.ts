import { createRequire } from 'node:module'
import { describe, expect, it } from 'vitest'
import { allElements, getElement, getIsotope } from '../../../shared/physics/elements'
import { ASE_WEIGHTS, PYMATGEN } from './fixtures'

interface PackageElement {
  number: number
  symbol: string
  name: string
  isotopes: { nominal: number; mass: number; abundance?: number }[]
}
// npm chemical-elements 2.3.3 (MIT), the source of the engine's nuclide copy.
const { elementsAndIsotopes } = createRequire(import.meta.url)('chemical-elements') as { elementsAndIsotopes: PackageElement[] }

describe('symbols and names', () => {
  it.each(PYMATGEN.map((e) => [e.z, e.symbol]))('Z = %i is %s (pymatgen periodic_table.json)', (z, symbol) => {
    expect(getElement(z)?.symbol).toBe(symbol)
  })

  it.each(elementsAndIsotopes.map((e) => [e.number, e.name]))('Z = %i is named %s (npm chemical-elements)', (z, name) => {
    expect(getElement(z)?.name).toBe(name)
  })

  it('finds elements by symbol or name in any case, and nothing else', () => {
    expect(getElement('fe')?.z).toBe(26)
    expect(getElement('Tungsten')?.z).toBe(74)
    expect(getElement('Xx')).toBeUndefined()
    expect(getElement(0)).toBeUndefined()
    expect(getElement(119)).toBeUndefined()
    expect(getElement(2.5)).toBeUndefined()
  })
})

// Values changed by CIAAW after the 2013 table that ASE carries; the new values are from memory.
const REVISED_SINCE_2013: Record<number, string> = {
  9: 'single-isotope element, revised mass (from memory)',
  13: 'single-isotope element, revised mass (from memory)',
  18: 'interval since CIAAW 2017, conventional 39.95 (from memory)',
  21: 'single-isotope element, revised mass (from memory)',
  25: 'single-isotope element, revised mass (from memory)',
  39: 'single-isotope element, revised mass (from memory)',
  40: 'CIAAW 2021 (from memory)',
  45: 'single-isotope element, revised mass (from memory)',
  64: 'CIAAW 2021 (from memory)',
  65: 'single-isotope element, revised mass (from memory)',
  67: 'single-isotope element, revised mass (from memory)',
  69: 'single-isotope element, revised mass (from memory)',
  70: 'CIAAW 2015 (from memory)',
  71: 'CIAAW 2021 (from memory)',
  72: 'CIAAW 2019 (from memory)',
  79: 'single-isotope element, revised mass (from memory)',
}

describe('atomic weights against IUPAC 2013 (python3-ase 3.22.1, atomic_masses_iupac2016)', () => {
  const stable = ASE_WEIGHTS.filter((w) => !/^\d+[A-Z]/.test(w.comment.split(' ')[0]) && !(w.z in REVISED_SINCE_2013))
  it.each(stable.map((w) => [w.z, w.value]))('Z = %i: %f', (z, value) => {
    expect(getElement(z)?.atomicWeight).toBe(value)
  })

  it.each(Object.entries(REVISED_SINCE_2013).map(([z, why]) => [Number(z), why]))(
    'Z = %i differs from 2013 by less than 0.01 u: %s',
    (z) => {
      const ase = ASE_WEIGHTS[z - 1].value
      const ours = getElement(z)?.atomicWeight ?? NaN
      expect(ours).not.toBe(ase)
      expect(Math.abs(ours - ase)).toBeLessThan(0.01)
    },
  )

  // ASE's comment names the isotope for elements with no standard atomic weight ("98Tc").
  const bracketed = ASE_WEIGHTS.map((w) => ({ ...w, a: /^(\d+)[A-Z]/.exec(w.comment)?.[1] })).filter((w) => w.a)
  it.each(bracketed.map((w) => [w.z, Number(w.a), w.value]))('Z = %i is written [%i], mass near ASE\'s %f', (z, a, value) => {
    const e = getElement(z)
    expect(e?.atomicWeightText).toBe(`[${a}]`)
    expect(e?.atomicWeightKind).toBe('mass-number')
    expect(Math.abs((e?.atomicWeight ?? 0) - value)).toBeLessThan(0.002)
  })

  it('marks IUPAC intervals as conventional values (ASE comments give the interval)', () => {
    for (const w of ASE_WEIGHTS.filter((x) => x.comment.includes('['))) {
      expect(getElement(w.z)?.atomicWeightKind).toBe('conventional')
    }
  })
})

describe('single-isotope elements: standard atomic weight equals the nuclide mass (chemical-elements)', () => {
  // Th's IUPAC value (232.0377) sits below the 232Th mass because natural thorium can carry 230Th
  // (from memory); it is not a single-nuclide weight in IUPAC's sense.
  const mononuclidic = elementsAndIsotopes.filter((e) => {
    const natural = e.isotopes.filter((i) => i.abundance !== undefined)
    return natural.length === 1 && natural[0].abundance === 1 && e.symbol !== 'Th'
  })
  it.each(mononuclidic.map((e) => [e.symbol, e.number, e.isotopes.find((i) => i.abundance === 1)?.mass ?? 0]))(
    '%s (Z = %i): %f u within 1e-7',
    (_, z, mass) => {
      const w = getElement(z)?.atomicWeight ?? 0
      expect(Math.abs(w - mass) / mass).toBeLessThan(1e-7)
    },
  )
})

describe('nuclide copy equals npm chemical-elements 2.3.3', () => {
  it.each(elementsAndIsotopes.map((e) => [e.symbol, e]))('%s', (_, source) => {
    const element = getElement(source.number)
    const expected = [...source.isotopes]
      .sort((a, b) => a.nominal - b.nominal)
      .map((i) => ({ massNumber: i.nominal, massU: i.mass, abundance: i.abundance ?? null }))
    expect(element?.isotopes).toEqual(expected)
    expect(element?.naturalIsotopes).toEqual(expected.filter((i) => i.abundance !== null))
  })

  it.each([
    // most abundant natural isotope (NIST isotopic compositions via chemical-elements), or the bracketed one
    [26, 56],
    [92, 238],
    [1, 1],
    [43, 98],
    [94, 244],
  ])('Z = %i: principal isotope %i', (z, a) => {
    expect(getElement(z)?.principalMassNumber).toBe(a)
  })

  it('looks up single nuclides', () => {
    expect(getIsotope(26, 56)?.massU).toBe(55.93493633) // chemical-elements 2.3.3, 56Fe
    expect(getIsotope(26, 10)).toBeUndefined()
    expect(getIsotope(26, 500)).toBeUndefined()
  })

  it('has 118 elements', () => {
    expect(allElements().map((e) => e.z)).toEqual(Array.from({ length: 118 }, (_, i) => i + 1))
  })
})
