import { describe, it, expect, afterAll } from 'vitest'
import { execFileSync } from 'node:child_process'
import { testDb, closeTestDb } from '../support/db'
import { signedIn } from '../support/api'

afterAll(closeTestDb)

function precompute(...args: string[]): string {
  return execFileSync(process.execPath, ['--import', 'tsx', 'scripts/precompute.ts', ...args], { encoding: 'utf8', env: process.env })
}

describe('npm run precompute against the test database', () => {
  it('fills the cache for the chosen elements, then finds nothing left to do', async () => {
    const out = precompute('--z', '3-4', '--workers', '1')
    // Li and Be: 3 + 4 species with a NIST ASD ionisation energy (every charge state 0 … Z − 1).
    expect(out).toMatch(/7 species wanted/)
    const rows = await testDb()('species_scf_cache').whereIn('z', [3, 4])
    expect(rows.map((r) => `${r.z}:${r.charge}`).sort()).toEqual(['3:0', '3:1', '3:2', '4:0', '4:1', '4:2', '4:3'])
    expect(rows.every((r) => r.converged)).toBe(true)
    expect(precompute('--z', '3-4')).toMatch(/solving 0/)
  })

  it('rejects a malformed range with the accepted form', () => {
    expect(() => precompute('--z', '0-500')).toThrow(/--z takes an element number or a range/)
  })

  it('serves precomputed results to the look-up at once', async () => {
    const scientist = await signedIn('scientist')
    const r = await scientist.get('/api/species/lookup?q=Be%2B')
    expect(r.body.scfStatus).toBe('cached')
    // Be II: 18.211 eV (NIST ASD, via Debian python3-pymatgen periodic_table.json).
    const delta = r.body.ionisationEnergy.estimates.find((e: { method: string }) => e.method === 'scf-delta')
    expect(Math.abs(delta.eV - 18.211) / 18.211).toBeLessThan(0.05)
  })
})
