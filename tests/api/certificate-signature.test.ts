import { describe, it, expect, beforeAll } from 'vitest'
import { execFile } from 'node:child_process'
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { promisify } from 'node:util'
import { signedIn, type Client } from '../support/api'
import { certifiableSample, issue, pdfOf } from '../support/certificates'

// Debian's poppler-utils `pdfsig` checks the signature as any PDF reader would: the digest of the
// signed byte ranges against the CMS signature, and the signature against the signer's key.
async function pdfsig(bytes: Buffer): Promise<string> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'ionfolio-pdfsig-'))
  try {
    const file = path.join(dir, 'certificate.pdf')
    writeFileSync(file, bytes)
    const r = await promisify(execFile)('pdfsig', [file]).catch((e) => e)
    return `${r.stdout ?? ''}${r.stderr ?? ''}`
  } finally {
    rmSync(dir, { recursive: true, force: true })
  }
}

let manager: Client
let pdf: Buffer
beforeAll(async () => {
  manager = await signedIn('manager')
  const cert = await issue(manager, 'sample', (await certifiableSample(manager)).id)
  pdf = await pdfOf(manager, cert.id)
})

describe('the laboratory signature on an issued certificate PDF', () => {
  it('is reported intact by pdfsig, covering the whole document', async () => {
    const report = await pdfsig(pdf)
    expect(report).toContain('Signature Validation: Signature is Valid.')
    expect(report).toContain('Total document signed')
    expect(report).toContain('Signature Type: ETSI.CAdES.detached')
    expect(report).toContain('Signing Hash Algorithm: SHA-256')
    expect(report).toMatch(/Signer Certificate Common Name: Larchmere Ion Beam Laboratory/)
  })

  it('is reported broken after one byte of the file is changed', async () => {
    // A byte inside the first signed range, in the page content rather than the file's structure.
    const altered = Buffer.from(pdf)
    const at = altered.indexOf('stream', 200, 'latin1') + 20
    altered[at] ^= 0x01
    const report = await pdfsig(altered)
    expect(report).not.toContain('Signature is Valid.')
    expect(report).toMatch(/Digest Mismatch|Signature is Invalid/)
  })
})
