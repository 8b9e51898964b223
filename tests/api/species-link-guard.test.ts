import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { everyone } from '../support/api'
import { closeTestDb, testDb } from '../support/db'
import { createSample } from '../support/samples'

// The server refuses a species-sample link unless the sample contains the species' element, and
// the isotope when one is named — whichever page (or client) sends it.
let c: Awaited<ReturnType<typeof everyone>>
beforeAll(async () => {
  c = await everyone()
})
afterAll(closeTestDb)

const species = async (text: string) => {
  const r = await c.scientist.post('/api/species', { species: text })
  expect(r.status, JSON.stringify(r.body)).toBeLessThan(300)
  return r.body
}
const link = (speciesId: string, sampleId: string) => c.scientist.post(`/api/species/${speciesId}/samples`, { sampleId })

describe('the linking guard', () => {
  it('refuses Ni19+ for a ⁴⁸Ca sample with a 400 that names what the sample contains', async () => {
    const ca = await createSample(c.manager, { name: '48Ca target', formula: 'Ca', material: 'Calcium', components: [{ z: 20, massNumber: 48, fraction: 1, basis: 'atom', enrichmentPercent: 97.8 }] })
    const ni = await species('Ni 19+')
    const r = await link(ni.id, ca.id)
    expect(r.status).toBe(400)
    expect(r.body.message).toBe('The sample does not contain the element of this species')
    expect(r.body.data).toMatchObject({ reason: 'element', contains: ['Ca'], issues: [{ path: 'sampleId' }] })
    expect(await testDb()('sample_species').where({ sample_id: ca.id })).toEqual([])
  })

  it('takes an isotope found in nature from a natural sample, but not one that is not', async () => {
    const natural = await createSample(c.manager, { name: 'Natural nickel foil' })
    expect((await link((await species('58Ni 10+')).id, natural.id)).status).toBe(201)
    expect((await link((await species('Ni 10+')).id, natural.id)).status).toBe(201)
    const r = await link((await species('63Ni 10+')).id, natural.id)
    expect(r.status).toBe(400)
    expect(r.body.data.reason).toBe('isotope')
    expect(r.body.message).toBe('The sample does not contain the isotope this species names')
  })

  it('takes the other isotopes from an enrichment below 100 %, none from one at 100 %', async () => {
    const partly = await createSample(c.manager, { name: '58Ni 99.3 %', components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', enrichmentPercent: 99.3 }] })
    const whole = await createSample(c.manager, { name: '58Ni 100 %', components: [{ z: 28, massNumber: 58, fraction: 1, basis: 'atom', enrichmentPercent: 100 }] })
    const ni60 = await species('60Ni 5+')
    expect((await link(ni60.id, partly.id)).status).toBe(201)
    expect((await link(ni60.id, whole.id)).status).toBe(400)
    expect((await link((await species('58Ni 5+')).id, whole.id)).status).toBe(201)
  })
})
