import { describe, expect, it } from 'vitest'
import { baseHCode, GHS_STATEMENTS, hazardStatementText, parseHazardStatements } from '../../../shared/samples/ghs'
import { formulaElements, formulaProblem } from '../../../shared/samples/formula'
import { formatNuclide, isotopeLabel, parseNuclide } from '../../../shared/samples/nuclide'

// Statement texts as recalled from UN GHS Rev. 10, Annex 3 (from memory).
describe('GHS hazard statements', () => {
  it.each([
    ['H225', 'Highly flammable liquid and vapour'],
    ['H280', 'Contains gas under pressure; may explode if heated'],
    ['H300', 'Fatal if swallowed'],
    ['H350', 'May cause cancer'],
    ['H410', 'Very toxic to aquatic life with long lasting effects'],
  ])('%s reads "%s"', (code, text) => {
    expect(hazardStatementText(code)).toBe(text)
  })

  it('holds the physical, health and environmental series and nothing else', () => {
    for (const code of Object.keys(GHS_STATEMENTS)) expect(code).toMatch(/^H[234]\d\d$/)
    expect(Object.keys(GHS_STATEMENTS).length).toBeGreaterThan(80)
  })

  it('splits combined statements, ignores letter case and repeats, and names what it does not know', () => {
    expect(parseHazardStatements('H300+H310+H330, h350i; H300 EUH066 H1234')).toEqual({ codes: ['H300', 'H310', 'H330', 'H350i'], unknown: ['EUH066', 'H1234'] })
    expect(parseHazardStatements(['H360FD', 'h361fd', 'H360Fd'])).toEqual({ codes: ['H360FD', 'H361fd', 'H360Fd'], unknown: [] })
    // the case of a CLP suffix says category 1 (capital) or 2: all lower case cannot be told apart
    expect(parseHazardStatements('h360fd')).toEqual({ codes: [], unknown: ['h360fd'] })
    expect(baseHCode('H360Df')).toBe('H360')
    expect(baseHCode('H999')).toBeNull()
  })
})

describe('formulas', () => {
  it.each([['CaCO3'], ['Ni'], ['Ca(OH)2'], ['CuSO4·5H2O'], ['UO2.5'], ['[Fe(CN)6]']])('%s reads well', (f) => {
    expect(formulaProblem(f)).toBeNull()
  })
  it.each([['Xq2', 'not an element symbol'], ['ni', 'capital'], ['Ca(OH2', 'pair'], ['Ca;DROP', 'may contain']])('%s is refused (%s)', (f, words) => {
    expect(formulaProblem(f)).toContain(words)
  })
  it('lists the elements it names', () => {
    expect(formulaElements('Ca(OH)2')).toEqual([20, 8, 1])
  })
})

describe('nuclides', () => {
  it.each([['U-238'], ['238U'], ['u238'], ['Am 241']])('%s is read', (t) => {
    expect(parseNuclide(t)).not.toBeNull()
  })
  it.each([['U-999'], ['Xx-12'], ['Gold-197'], ['238']])('%s is refused', (t) => {
    expect(parseNuclide(t)).toBeNull()
  })
  it('writes the stored and the superscript forms', () => {
    expect(formatNuclide(parseNuclide('241am')!)).toBe('Am-241')
    expect(isotopeLabel(20, 48)).toBe('⁴⁸Ca')
    expect(isotopeLabel(28, null)).toBe('Ni')
  })
})
