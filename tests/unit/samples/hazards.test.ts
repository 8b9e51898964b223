import { describe, expect, it } from 'vitest'
import { classifyHazards, hazardKinds, type HazardInput } from '../../../shared/samples/hazards'

const base: HazardInput = { form: 'foil', formula: null, radioactive: false, nuclide: null, hazardStatements: [], components: [] }
const el = (z: number, massNumber: number | null = null) => ({ z, massNumber })

// Which samples get which caution (DESIGN.md §9; the element lists are common practice, no source).
describe('cautions', () => {
  it.each<[string, Partial<HazardInput>, string[]]>([
    ['a gold foil', { components: [el(79)] }, []],
    ['a sample flagged radioactive', { radioactive: true, nuclide: 'Co-60', components: [el(27, 60)] }, ['radioactive']],
    ['uranium, even unflagged', { components: [el(92, 238), el(9)] }, ['radioactive']],
    ['radium', { components: [el(88)] }, ['radioactive', 'pyrophoric']],
    ['a nuclide not found in nature (22Na)', { components: [el(11, 22)] }, ['radioactive', 'pyrophoric']],
    ['a lead target', { components: [el(82, 208)] }, ['toxic']],
    ['beryllium, arsenic, cadmium, mercury, thallium', { components: [el(4), el(33), el(48), el(80), el(81)], formula: 'mixed' }, ['toxic']],
    ['a nickel foil stated H350', { components: [el(28)], hazardStatements: ['H350'] }, ['toxic']],
    ['an EU variant H360FD', { components: [el(28)], hazardStatements: ['H360FD'] }, ['toxic']],
    ['only H302 (harmful, not toxic)', { components: [el(29)], hazardStatements: ['H302'] }, []],
    ['calcium metal', { formula: 'Ca', components: [el(20, 48)] }, ['pyrophoric']],
    ['calcium carbonate', { form: 'powder', formula: 'CaCO3', components: [el(20, 48), el(6), el(8)] }, []],
    ['lithium metal foil', { components: [el(3, 7)] }, ['pyrophoric']],
    ['magnesium foil', { components: [el(12)] }, []],
    ['magnesium powder', { form: 'powder', components: [el(12)] }, ['pyrophoric']],
    ['a fine thorium oxide powder', { form: 'powder', formula: 'ThO2', components: [el(90), el(8)] }, ['radioactive', 'pyrophoric']],
    ['a sample stated H260', { components: [el(6)], hazardStatements: ['H260'] }, ['pyrophoric']],
    ['a gas cylinder', { form: 'gas_cylinder', components: [el(18)] }, ['pressurised']],
    ['a lecture bottle stated H280', { form: 'other', components: [el(2)], hazardStatements: ['H280'] }, ['pressurised']],
  ])('%s', (_what, over, kinds) => {
    expect(hazardKinds({ ...base, ...over })).toEqual(kinds)
  })

  it('says why, and defers to the institution in plain words', () => {
    const [c] = classifyHazards({ ...base, components: [el(92, 238)] })
    expect(c!.reasons).toEqual(['Contains U, which has no stable isotope.', 'The radioactive flag is not set: check the record.'])
    for (const caution of classifyHazards({ ...base, form: 'gas_cylinder', radioactive: true, nuclide: 'U-238', hazardStatements: ['H330'], components: [el(92, 238), el(3)] })) {
      expect(caution.advice).toMatch(/officer/)
      expect(caution.advice).toMatch(/local regulations/)
    }
  })
})

describe('H-statements keep their letter suffixes in the caution box', () => {
  it('lists H350i and H360FD as stored, matched on the GHS code they refine', () => {
    const toxic = classifyHazards({ ...base, hazardStatements: ['H350i', 'H360FD', 'H302'] }).find((c) => c.kind === 'toxic')!
    expect(toxic.reasons).toContain('Hazard statements H350i, H360FD.')
    expect(toxic.reasons.join(' ')).not.toMatch(/H350(?!i)|H360(?!FD)/)
  })
})
