import { describe, expect, it } from 'vitest'
import { getElement } from '../../../shared/physics/index'
import { ISOTOPE_DATA_SOURCES } from '../../../shared/samples/isotope-sources'

const mass = (z: number, a: number) => getElement(z)!.isotopes.find((i) => i.massNumber === a)!.massU
const abundance = (z: number, a: number) => getElement(z)!.isotopes.find((i) => i.massNumber === a)!.abundance

// Which evaluations the carried data follow, decided by values where the evaluations differ, so
// the certificate cites what we actually compute with.
describe('the isotope data follow AME2016 masses and NIST SRD 144 (IUPAC 1997) compositions', () => {
  it('has AME2016 masses, not AME2020', () => {
    // ¹H: AME2016 1.007 825 032 23(9) u (Wang et al., Chin. Phys. C 41, 030003 (2017), from memory);
    // AME2020 1.007 825 031 898(14) u (as openmc-dev/openmc's AME2020 mass table test asserts).
    expect(mass(1, 1)).toBe(1.00782503223)
    expect(mass(1, 1)).not.toBe(1.007825031898)
    // ²H: AME2016 2.014 101 778 12 u; AME2020 2.014 101 777 844 u (same sources).
    expect(mass(1, 2)).toBe(2.01410177812)
    expect(ISOTOPE_DATA_SOURCES.masses).toContain('AME2016')
    expect(ISOTOPE_DATA_SOURCES.masses).toContain('Chin. Phys. C 41, 030003 (2017)')
  })

  it.each([
    // [Z, A, carried (NIST SRD 144 / IUPAC 1997, from memory), CIAAW 2013 representative value
    //  (Meija et al., Pure Appl. Chem. 88, 293 (2016), as transcribed in openmc-dev/openmc openmc/data/data.py)]
    [34, 80, 0.4961, 0.498],
    [48, 106, 0.0125, 0.01245],
    [42, 92, 0.1453, 0.14649],
  ])('Z = %i, A = %i: %f, not the CIAAW 2013 %f', (z, a, carried, ciaaw2013) => {
    expect(abundance(z, a)).toBe(carried)
    expect(abundance(z, a)).not.toBe(ciaaw2013)
  })

  it('names NIST SRD 144 and the IUPAC 1997 report for the compositions, and the package only as the carrier', () => {
    expect(ISOTOPE_DATA_SOURCES.abundances).toContain('NIST Standard Reference Database 144')
    expect(ISOTOPE_DATA_SOURCES.abundances).toContain('Pure Appl. Chem. 70, 217 (1998)')
    expect(ISOTOPE_DATA_SOURCES.carrier).toContain('chemical-elements')
  })
})
