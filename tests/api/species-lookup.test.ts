import { describe, it, expect, beforeAll } from 'vitest'
import { everyone, type Client } from '../support/api'

let clients: Awaited<ReturnType<typeof everyone>>
beforeAll(async () => {
  clients = await everyone()
})

describe('GET /api/species/lookup', () => {
  it.each(['manager', 'scientist', 'technician', 'auditor'] as const)('serves the species record to the %s', async (role) => {
    const r = await (clients[role] as Client).get(`/api/species/lookup?q=${encodeURIComponent('Fe XIV')}`)
    expect(r.status).toBe(200)
    // Al-like Fe XIV: ground level 3s2 3p 2P°1/2 and ionisation energy 392.2 eV (NIST ASD, via
    // Debian python3-pymatgen periodic_table.json).
    expect(r.body).toMatchObject({ input: 'Fe XIV', z: 26, symbol: 'Fe', charge: 13, electrons: 13, configuration: '1s2 2s2 2p6 3s2 3p1', core: '[Ne] 3s2 3p1', term: '2P°1/2', isoelectronic: 'Al-like' })
    expect(r.body.ionisationEnergy.reference.eV).toBeCloseTo(392.2, 1)
    expect(r.body.ionisationEnergy.estimates.map((e: { method: string }) => e.method)).toEqual(expect.arrayContaining(['slater-hydrogenic', 'slater-total-energy']))
  })

  it('answers the same object as the command line, SCF results from the shared cache included', async () => {
    const first = await clients.scientist.get('/api/species/lookup?q=Ar%208%2B')
    expect(['computed', 'cached', 'pending']).toContain(first.body.scfStatus)
    let again = await clients.scientist.get('/api/species/lookup?q=Ar%208%2B')
    for (let i = 0; i < 20 && again.body.scfStatus !== 'cached'; i++) {
      await new Promise((r) => setTimeout(r, 250))
      again = await clients.scientist.get('/api/species/lookup?q=Ar%208%2B')
    }
    expect(again.body.scfStatus).toBe('cached')
    // a repeat is served from the kept answer: the same JSON, still typed as JSON
    const repeat = await clients.scientist.get('/api/species/lookup?q=Ar%208%2B')
    expect(repeat.headers.get('content-type')).toMatch(/^application\/json/)
    expect(repeat.body).toEqual(again.body)
    const { execFileSync } = await import('node:child_process')
    const line = execFileSync(process.execPath, ['--import', 'tsx', 'scripts/species.ts', '--json', 'Ar 8+'], { encoding: 'utf8' }).trim()
    expect(again.body).toEqual(JSON.parse(line))
    // Ne-like Ar IX: ionisation energy 422.45 eV (NIST ASD, via Debian python3-pymatgen); the
    // self-interaction-corrected ΔSCF should land within 3 %.
    const delta = again.body.ionisationEnergy.estimates.find((e: { method: string }) => e.method === 'scf-delta')
    expect(delta.eV).toBeGreaterThan(422.45 * 0.97)
    expect(delta.eV).toBeLessThan(422.45 * 1.03)
    expect(again.body.screening.every((row: { zEffMeanRadius?: number }) => typeof row.zEffMeanRadius === 'number')).toBe(true)
    expect(again.body.scf.density.r.length).toBeGreaterThan(20)
    // the relativistic solution rides in the same cache row: its estimates, and the binding energy
    // of every nlj subshell of 1s2 2s2 2p6, the outermost (2p3/2) tied to the NIST value
    const methods = again.body.ionisationEnergy.estimates.map((e: { method: string }) => e.method)
    expect(methods).toEqual(expect.arrayContaining(['dirac-scf-delta', 'dirac-scf-eigenvalue', 'dirac-lsd-delta']))
    expect(again.body.bindingEnergies.map((b: { subshell: string }) => b.subshell)).toEqual(['1s1/2', '2s1/2', '2p1/2', '2p3/2'])
    expect(again.body.bindingEnergies[3]).toEqual({ subshell: '2p3/2', eV: again.body.ionisationEnergy.reference.eV, method: 'nist-asd' })
    expect(again.body.dirac.density.small['1s1/2'].length).toBe(again.body.dirac.density.r.length)
  })

  it('answers 401 signed out', async () => {
    expect((await clients.anonymous.get('/api/species/lookup?q=Fe')).status).toBe(401)
  })

  it.each([
    ['Fe 27+', /beyond the bare nucleus/],
    ['Xx3+', /Accepted notations/],
    ['', /Enter a species/],
  ])('answers %j with a 400 whose message is the parser\'s', async (q, message) => {
    const r = await clients.scientist.get(`/api/species/lookup?q=${encodeURIComponent(q)}`)
    expect(r.status).toBe(400)
    expect(JSON.stringify(r.body)).toMatch(message)
  })
})
