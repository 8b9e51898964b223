import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { execFileSync, spawnSync } from 'node:child_process'
import { mkdtempSync, readFileSync, rmSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { fileURLToPath } from 'node:url'
import { signedIn, unique } from '../support/api'
import { testBaseUrl } from '../support/env'
import { certifiableSample, issue } from '../support/certificates'
import { createToken } from '../support/tokens'

// The README's examples are run as written against the test server, with a read token made here.
const README = readFileSync(path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../README.md'), 'utf8')
const section = README.slice(README.indexOf('## Scripts and the API'), README.indexOf('## Background jobs'))
const block = (lang: string) => new RegExp('```' + lang + '\\n([\\s\\S]*?)```').exec(section)?.[1] ?? ''
const curlLines = block('sh').split('\n').filter((l) => l.startsWith('curl '))

let env: Record<string, string>
let dir: string
let certificate: { id: string; number: string }

beforeAll(async () => {
  const manager = await signedIn('manager')
  const sample = await certifiableSample(manager, { name: `README example ${unique()}` })
  certificate = await issue(manager, 'sample', sample.id)
  const { secret } = await createToken(manager, 'read', 'README examples')
  dir = mkdtempSync(path.join(os.tmpdir(), 'ionfolio-readme-'))
  env = { PATH: process.env.PATH ?? '/usr/bin:/bin', IONFOLIO: testBaseUrl(), IONFOLIO_TOKEN: secret, CERTIFICATE_ID: certificate.id }
})
afterAll(() => rmSync(dir, { recursive: true, force: true }))

describe('the README examples', () => {
  it('has the curl lines for a look-up, the certified samples and a certificate download', () => {
    expect(curlLines.length).toBe(4)
    expect(curlLines.every((l) => l.includes('Authorization: Bearer $IONFOLIO_TOKEN') && !/[?&](access_)?token=/.test(l))).toBe(true)
  })

  it('runs every curl line with a token', () => {
    const out = curlLines.map((line) => execFileSync('sh', ['-c', line], { cwd: dir, env, encoding: 'utf8', timeout: 60_000 }))
    const lookup = JSON.parse(out[0]!)
    expect(lookup.notations.spectroscopic).toBe('Fe XIV')
    // The look-up gives the NIST ASD reference beside the estimates (the value itself is checked
    // against its source in the physics unit tests, not here).
    expect(lookup.ionisationEnergy.reference.source).toMatch(/NIST ASD/)
    expect(lookup.ionisationEnergy.estimates.length).toBeGreaterThan(0)
    const certs = JSON.parse(out[1]!)
    expect(certs.items.some((c: { id: string }) => c.id === certificate.id)).toBe(true)
    expect(readFileSync(path.join(dir, 'certificate.pdf')).subarray(0, 5).toString()).toBe('%PDF-')
    expect(readFileSync(path.join(dir, 'samples.csv'), 'utf8').split('\n')[0]).toMatch(/code/i)
  })

  it('runs the Python example where Python has requests', () => {
    const probe = spawnSync('python3', ['-c', 'import requests'], { encoding: 'utf8' })
    if (probe.status !== 0) return // no python3-requests on this machine: nothing to run
    const r = spawnSync('python3', ['-c', block('python')], { cwd: dir, env, encoding: 'utf8', timeout: 120_000 })
    expect(r.status, r.stderr).toBe(0)
    expect(r.stdout).toMatch(/^Fe XIV /m)
    expect(r.stdout).toContain(certificate.number)
    expect(readFileSync(path.join(dir, `${certificate.number}.pdf`)).subarray(0, 5).toString()).toBe('%PDF-')
  })
})
