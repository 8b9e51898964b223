import { describe, expect, it } from 'vitest'
import { sampleCanSource } from '../../../shared/samples/species-link'

// Natural nickel holds ⁵⁸Ni, ⁶⁰Ni, ⁶¹Ni, ⁶²Ni and ⁶⁴Ni; ⁶³Ni is not found in nature (the
// nuclide table carried in shared/physics/data, from chemical-elements).
const natNi = [{ z: 28, massNumber: null, enrichmentPercent: null }]
describe('which samples can source a species', () => {
  it('needs the element', () => {
    expect(sampleCanSource([{ z: 20, massNumber: 48, enrichmentPercent: 97.8 }], { z: 28, massNumber: null })).toEqual({ ok: false, reason: 'element' })
    expect(sampleCanSource(natNi, { z: 28, massNumber: null })).toEqual({ ok: true })
  })
  it('needs the isotope when one is named: natural ones from the natural element', () => {
    expect(sampleCanSource(natNi, { z: 28, massNumber: 60 })).toEqual({ ok: true })
    expect(sampleCanSource(natNi, { z: 28, massNumber: 63 })).toEqual({ ok: false, reason: 'isotope' })
  })
  it('takes the rest of an enrichment below 100 % as natural, and nothing else at 100 %', () => {
    expect(sampleCanSource([{ z: 28, massNumber: 58, enrichmentPercent: 99.3 }], { z: 28, massNumber: 60 })).toEqual({ ok: true })
    expect(sampleCanSource([{ z: 28, massNumber: 58, enrichmentPercent: 100 }], { z: 28, massNumber: 60 })).toEqual({ ok: false, reason: 'isotope' })
    expect(sampleCanSource([{ z: 28, massNumber: 58, enrichmentPercent: 100 }], { z: 28, massNumber: 58 })).toEqual({ ok: true })
  })
})
