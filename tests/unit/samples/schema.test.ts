import { describe, expect, it } from 'vitest'
import { SampleBody, SampleListQuery, SamplePatchBody } from '../../../shared/schemas/samples'

const paths = (input: unknown) => {
  const r = SampleBody.safeParse(input)
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'))
}
const base = { name: 'Gold foil', material: 'Gold', form: 'foil', components: [{ z: 79, massNumber: null, fraction: 1, basis: 'atom' }] }

describe('the sample schema', () => {
  it('reads the text a form sends: decimal commas, blanks as empty, codes in any case', () => {
    const s = SampleBody.parse({ ...base, arealDensity: '1,5', thickness: '', hazardStatements: 'h300+H330', components: [{ z: '79', massNumber: '', fraction: '1', basis: 'atom', enrichmentPercent: '' }] })
    expect(s).toMatchObject({ arealDensity: 1.5, thickness: null, hazardStatements: ['H300', 'H330'], status: 'available', components: [{ z: 79, massNumber: null, fraction: 1, enrichmentPercent: null }] })
  })

  it('reports every problem at once, the composition and the other rules beside a wrong field', () => {
    expect(paths({ ...base, form: 'blanket', hazardStatements: 'H999', receivedOn: '2026-02-01', recertifyBy: '2026-01-01', components: [{ z: 79, massNumber: null, fraction: 0.5, basis: 'atom' }] }).sort()).toEqual(
      ['components', 'form', 'hazardStatements', 'recertifyBy'],
    )
    expect(paths({ ...base, receivedOn: 'soon', radioactive: true }).sort()).toEqual(['activityBq', 'nuclide', 'receivedOn'])
  })

  it('refuses repeats, mixed bases and enrichment on a natural element', () => {
    expect(paths({ ...base, components: [{ z: 79, massNumber: null, fraction: 0.5, basis: 'atom', enrichmentPercent: 50 }, { z: 79, massNumber: null, fraction: 0.5, basis: 'mass' }] }).sort()).toEqual(
      ['components.0.enrichmentPercent', 'components.1.basis', 'components.1.z'],
    )
  })

  it('leaves out of a change what the change does not name, and wants the version', () => {
    expect(SamplePatchBody.parse({ version: 3, name: 'New' })).toEqual({ version: 3, name: 'New' })
    expect(SamplePatchBody.safeParse({ name: 'New' }).success).toBe(false)
    expect(SamplePatchBody.safeParse({ version: 3, code: 'S-2026-000001' }).success).toBe(false)
  })

  it('reads list filters as people type them', () => {
    expect(SampleListQuery.parse({ element: 'ni', isotope: '48Ca', hazard: 'h350I', status: '' })).toMatchObject({ element: 28, isotope: { z: 20, massNumber: 48 }, hazard: 'H350i', status: undefined })
  })
})
