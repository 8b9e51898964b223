import { describe, it, expect } from 'vitest'
import { batches, parseZRange, wantedSpecies } from '../../../shared/precompute-plan'
import { referenceIonisationEv } from '../../../shared/physics'

describe('the precompute plan', () => {
  it('reads a range of elements, or off, and refuses anything else', () => {
    expect(parseZRange('1-118')).toEqual({ from: 1, to: 118 })
    expect(parseZRange('26')).toEqual({ from: 26, to: 26 })
    expect(parseZRange('off')).toBeNull()
    for (const bad of ['0-3', '5-2', '1-119', 'iron', '']) expect(() => parseZRange(bad)).toThrow(/precompute range/)
  })

  it('wants exactly the species with a reference ionisation energy', () => {
    const wanted = wantedSpecies(1, 3)
    // H, He, Li: every charge state below Z has a NIST ASD value in the engine's table.
    expect(wanted).toEqual([
      { z: 1, charge: 0 },
      { z: 2, charge: 0 },
      { z: 2, charge: 1 },
      { z: 3, charge: 0 },
      { z: 3, charge: 1 },
      { z: 3, charge: 2 },
    ])
    expect(wantedSpecies(1, 30).every((s) => referenceIonisationEv(s.z, s.charge) !== null)).toBe(true)
  })

  it('cuts the same batches every time, each species in exactly one, none larger than asked', () => {
    const wanted = wantedSpecies(1, 20)
    const a = batches(wanted, 8)
    expect(batches(wanted, 8)).toEqual(a)
    expect(a.every((b) => b.length <= 8)).toBe(true)
    const flat = a.flat().map((s) => `${s.z}:${s.charge}`)
    expect(new Set(flat).size).toBe(wanted.length)
    expect(flat.length).toBe(wanted.length)
    // Round-robin: the heaviest species do not all land in the last batches.
    expect(a[0]!.some((s) => s.z >= 15)).toBe(true)
  })
})
