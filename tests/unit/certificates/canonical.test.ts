import { describe, it, expect } from 'vitest'
import { createHash } from 'node:crypto'
import { canonicalJson } from '../../../shared/certificates/canonical'

describe('canonical JSON of a certificate payload', () => {
  it('sorts keys at every depth, keeps array order, and writes no whitespace', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, 1, 2], c: null } })).toBe('{"a":{"c":null,"d":[3,1,2]},"b":1}')
  })

  it('leaves out undefined members, as JSON.stringify does', () => {
    expect(canonicalJson({ a: undefined, b: 'x' })).toBe('{"b":"x"}')
  })

  it('refuses numbers JSON cannot hold', () => {
    expect(() => canonicalJson({ a: Number.NaN })).toThrow(/finite/)
    expect(() => canonicalJson({ a: Infinity })).toThrow(/finite/)
  })

  // RFC 8785 (JSON Canonicalization Scheme), section 3.2.4 — from memory.
  it('matches the serialisation example of RFC 8785', () => {
    const input = JSON.parse('{"numbers":[333333333.33333329,1E30,4.50,2e-3,0.000000000000000000000000001],"string":"\\u20ac$\\u000F\\u000aA\'\\u0042\\u0022\\u005c\\\\\\"\\/","literals":[null,true,false]}')
    expect(canonicalJson(input)).toBe('{"literals":[null,true,false],"numbers":[333333333.3333333,1e+30,4.5,0.002,1e-27],"string":"€$\\u000f\\nA\'B\\"\\\\\\\\\\"/"}')
  })

  it('does not depend on the order in which the payload was built', () => {
    const one = { number: 'C-2026-000001', properties: { mass: { value: 1.2, unit: 'mg' }, z: 28 } }
    const two = { properties: { z: 28, mass: { unit: 'mg', value: 1.2 } }, number: 'C-2026-000001' }
    const digest = (v: unknown) => createHash('sha256').update(canonicalJson(v)).digest('hex')
    expect(digest(one)).toBe(digest(two))
    expect(digest(one)).not.toBe(digest({ ...one, number: 'C-2026-000002' }))
  })
})
