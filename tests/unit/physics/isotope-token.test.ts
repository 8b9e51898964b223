import { describe, expect, it } from 'vitest'
import { parseIsotopeToken } from '../../../shared/physics/notation'

describe('an isotope as one search token', () => {
  it.each(['Ni-58', '58Ni', 'Ni58', '58-Ni', 'ni-58', '⁵⁸Ni'])('reads %s as Z 28, A 58', (t) => {
    expect(parseIsotopeToken(t)).toEqual({ z: 28, massNumber: 58 })
  })
  it.each(['Ni', '58', 'LOT-58', 'Xx-12', 'Ni-5', 'C1', 'Ni 58x', 'S-2026-000042'])('leaves %s alone', (t) => {
    expect(parseIsotopeToken(t)).toBeNull()
  })
})
