import { describe, expect, it } from 'vitest'
import { SpeciesParseError, formatSpecies, fromRoman, parseIsotopeToken, parseSpecies, toRoman } from '../../../shared/physics/notation'

// The notations of DESIGN §5 and issue 3, and the friendlier variants notation.ts documents.
describe('accepted notations', () => {
  it.each([
    ['Fe13+', 26, 13, null],
    ['Fe 13+', 26, 13, null],
    ['Fe+13', 26, 13, null],
    ['Fe^13+', 26, 13, null],
    ['Fe XIV', 26, 13, null],
    ['Fe', 26, 0, null],
    ['Fe0', 26, 0, null],
    ['Fe I', 26, 0, null],
    ['56Fe13+', 26, 13, 56],
    ['56Fe XIV', 26, 13, 56],
    ['O-', 8, -1, null],
    ['C-', 6, -1, null],
    ['Au-', 79, -1, null],
    ['Au1-', 79, -1, null],
    ['O-1', 8, -1, null],
    ['Fe+', 26, 1, null],
    ['Fe XXVII', 26, 26, null],
    ['U XCII', 92, 91, null],
    ['Og CXIX', 118, 118, null],
    ['H', 1, 0, null],
    ['2H+', 1, 1, 2],
    ['238U92+', 92, 92, 238],
    ['fe13+', 26, 13, null],
    ['Fe xiv', 26, 13, null],
    ['  Fe   XIV  ', 26, 13, null],
    ['Fe¹³⁺', 26, 13, null],
    ['O−', 8, -1, null],
  ])('%j → Z = %i, charge %i, A = %s', (input, z, charge, massNumber) => {
    expect(parseSpecies(input)).toEqual({ input, z, symbol: z === 26 ? 'Fe' : expect.any(String), charge, massNumber })
  })
})

describe('rejected input', () => {
  it.each([
    ['', /no species given/],
    ['   ', /no species given/],
    ['Xx', /unknown element symbol 'Xx'/],
    ['Qu13+', /unknown element symbol 'Qu'/],
    ['FE', /write the element symbol as Fe/],
    ['CO', /write the element symbol as Co/],
    ['13+', /no element symbol found/],
    ['FeXIV', /Roman numeral needs a space/],
    ['Fe27+', /beyond the bare nucleus/],
    ['Fe+27', /beyond the bare nucleus/],
    ['Fe XXVIII', /Fe XXVIII is beyond the bare nucleus, Fe XXVII/],
    ['Fe XIIII', /not a valid Roman numeral/],
    ['Fe IC', /not a valid Roman numeral/],
    ['O2-', /only singly charged negative ions/],
    ['O-2', /only singly charged negative ions/],
    ['Fe 13', /could not read the charge/],
    ['Fe++', /could not read the charge/],
    ['Fe 13+ x', /could not read the charge/],
    ['Fe013+', /a charge cannot start with 0/],
    ['12Fe', /mass number 12 is below Z = 26/],
    ['99Fe', /99Fe is not a known isotope \(known: 45–74Fe\)/],
    ['056Fe', /a mass number cannot start with 0/],
    ['1234Fe', /mass number too large/],
    ['x'.repeat(100), /input too long/],
  ])('%j: %s', (input, message) => {
    let error: unknown
    try {
      parseSpecies(input)
    } catch (e) {
      error = e
    }
    expect(error).toBeInstanceOf(SpeciesParseError)
    const text = (error as SpeciesParseError).message
    expect(text).toMatch(message)
    expect(text).toContain('Accepted notations: Fe13+, Fe 13+, Fe+13, Fe^13+, Fe XIV, Fe, Fe0, Fe I, 56Fe13+')
    if (input.length > 10) expect(text).not.toContain(input.trim())
  })

  it('refuses a value that is not text', () => {
    expect(() => parseSpecies(42 as unknown as string)).toThrow(SpeciesParseError)
  })
})

describe('writing species', () => {
  it.each([
    [26, 13, null, 'Fe13+', 'Fe XIV'],
    [26, 0, null, 'Fe', 'Fe I'],
    [26, 1, null, 'Fe+', 'Fe II'],
    [8, -1, null, 'O-', 'O-'],
    [118, 118, null, 'Og118+', 'Og CXIX'],
    [26, 13, 56, '56Fe13+', '56Fe XIV'],
  ])('Z = %i, charge %i, A = %s → %s, %s', (z, charge, a, ionic, spectroscopic) => {
    expect(formatSpecies(z, charge, a)).toEqual({ ionic, spectroscopic })
  })

  it('reads back everything it writes, for every element and charge', () => {
    for (let z = 1; z <= 118; z++) {
      for (let charge = -1; charge <= z; charge++) {
        const { ionic, spectroscopic } = formatSpecies(z, charge)
        expect(parseSpecies(ionic)).toMatchObject({ z, charge })
        expect(parseSpecies(spectroscopic)).toMatchObject({ z, charge })
      }
    }
  })

  it.each([
    [1, 'I'],
    [4, 'IV'],
    [9, 'IX'],
    [14, 'XIV'],
    [27, 'XXVII'],
    [40, 'XL'],
    [90, 'XC'],
    [119, 'CXIX'],
  ])('%i is %s in Roman numerals', (n, roman) => {
    expect(toRoman(n)).toBe(roman)
    expect(fromRoman(roman)).toBe(n)
  })

  it.each(['IIII', 'VX', 'IC', 'XIIII', 'ABC', ''])('%j is not a canonical numeral', (text) => {
    expect(fromRoman(text)).toBeNull()
  })
})

// Issue 11 item 5: the isotope forms labs write, all one species; one grammar with the sample filter.
describe('isotope notations', () => {
  it.each(['Ca-48 10+', 'Ca-48 XI', '48Ca10+', '48Ca 10+', 'Ca48 10+', 'Ca 48 10+', '48-Ca XI', 'Ca48 XI'])('%j is ⁴⁸Ca¹⁰⁺', (input) => {
    expect(parseSpecies(input)).toEqual({ input, z: 20, symbol: 'Ca', charge: 10, massNumber: 48 })
  })
  it.each([
    ['Ca-48', 20, 0, 48],
    ['U-238 89+', 92, 89, 238],
    ['H-1', 1, 0, 1],
    ['Fe-56 XIV', 26, 13, 56],
  ])('%j → Z = %i, charge %i, A = %i', (input, z, charge, massNumber) => {
    expect(parseSpecies(input)).toMatchObject({ z, charge, massNumber })
  })
  it('keeps a charge that is not a nuclide for the charge grammar', () => {
    expect(parseSpecies('O-1')).toMatchObject({ z: 8, charge: -1, massNumber: null })
    expect(() => parseSpecies('Fe 13')).toThrow(/could not read the charge/)
  })
  it('refuses the isotope form with a bad charge or symbol case', () => {
    expect(() => parseSpecies('Ca-48 21+')).toThrow(/beyond the bare nucleus/)
    expect(() => parseSpecies('CA-48 10+')).toThrow(/write the element symbol as Ca/)
  })
  it.each([
    ['Ca-48', { z: 20, massNumber: 48 }],
    ['48Ca', { z: 20, massNumber: 48 }],
    ['Ca48', { z: 20, massNumber: 48 }],
    ['ni 58', { z: 28, massNumber: 58 }],
    ['58-Ni', { z: 28, massNumber: 58 }],
    ['Ca-480', null],
    ['Ca-048', null],
    ['Xx-12', null],
    ['Ca', null],
    ['48', null],
    ['Ca-48 10+', null],
  ])('parseIsotopeToken(%j)', (text, expected) => {
    expect(parseIsotopeToken(text)).toEqual(expected)
  })
})
