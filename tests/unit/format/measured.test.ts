import { describe, expect, it } from 'vitest'
import { csvMeasured, formatMeasured, roundToUncertainty } from '../../../shared/format/measured'

describe('a value rounded to its uncertainty (JCGM 100:2008 §7.2.6: two significant digits of u, y to the same place)', () => {
  it.each([
    // [value, uncertainty, unit, printed]
    [6452, 190, 'nm', '6450 ± 190 nm'], // the example
    [449.8, 22, 'nm', '450 ± 22 nm'], // the example
    [99.3, 0.1, '%', '99.30 ± 0.10 %'],
    [0.5752, 0.0821, '%', '0.575 ± 0.082 %'],
    [500, 15, 'µg/cm²', '500 ± 15 µg/cm²'],
    [1234.5, 0.0996, '', '1234.50 ± 0.10'], // 0.0996 rounds up to 0.10: the place moves up one
    [3.0574e18, 1.234e17, 'atoms/cm²', '(3.06 ± 0.12) × 10¹⁸ atoms/cm²'],
    [4.2e-5, 1.3e-6, '', '(4.20 ± 0.13) × 10⁻⁵'],
    [-12.345, 0.67, 'eV', '-12.35 ± 0.67 eV'],
    [0.0004, 0.0012, '', '0.0004 ± 0.0012'],
    [0.00004, 0.00012, '', '(0.4 ± 1.2) × 10⁻⁴'],
  ])('%s ± %s → %s', (v, u, unit, printed) => {
    expect(formatMeasured(v, u, unit)).toBe(printed)
  })

  // Worked examples of JCGM 100:2008 §7.2.2 and §7.2.4 (a mass standard of nominal value 100 g):
  // m_S = 100.021 47 g with u_c = 0.35 mg, and with U = 0.79 mg (k = 2.26). Values from memory of the guide.
  it('prints the GUM §7.2.2 / §7.2.4 worked example of the 100 g mass standard as the guide does', () => {
    expect(formatMeasured(100.02147, 0.00035, 'g')).toBe('100.02147 ± 0.00035 g')
    expect(formatMeasured(100.02147, 0.00079, 'g')).toBe('100.02147 ± 0.00079 g')
    // A value measured to more digits than the uncertainty supports loses the excess.
    expect(formatMeasured(100.0214739, 0.00035, 'g')).toBe('100.02147 ± 0.00035 g')
  })

  it('prints the value alone, to significant digits, when no uncertainty is known', () => {
    expect(formatMeasured(6452.123, null, 'nm')).toBe('6452 nm')
    expect(formatMeasured(6452.123, 0, 'nm')).toBe('6452 nm')
    expect(formatMeasured(null, 3)).toBe('—')
    expect(roundToUncertainty(5, -1)).toBeNull()
  })

  it('writes CSV cells a spreadsheet reads, rounded the same way', () => {
    expect(csvMeasured(6452, 190)).toEqual(['6450', '190'])
    expect(csvMeasured(3.0574e18, 1.234e17)).toEqual(['3.06e18', '0.12e18'])
    expect(Number(csvMeasured(3.0574e18, 1.234e17)[0])).toBe(3.06e18)
    expect(csvMeasured(12.5, null)).toEqual(['12.5', ''])
  })
})
