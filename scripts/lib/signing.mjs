// The laboratory's certificate-signing key for local runs: an RSA key and a self-signed X.509
// certificate in a PKCS#12 file, made once (node-forge) and kept outside the repository's tracked
// files (under storage/, which git ignores, or the test run's temporary folder). A production
// key is set with NUXT_SIGNING_P12_PATH and NUXT_SIGNING_P12_PASSPHRASE instead (README, Settings).
import { existsSync, mkdirSync, readFileSync, writeFileSync, chmodSync } from 'node:fs'
import { randomBytes } from 'node:crypto'
import path from 'node:path'
import forge from 'node-forge'

/**
 * Makes `dir`/signing.p12 (and its passphrase in signing.pass, both mode 600) unless they exist;
 * answers the NUXT_SIGNING_* settings that point the app at them.
 */
export function ensureSigningKey(dir, { labName = 'Larchmere Ion Beam Laboratory' } = {}) {
  const p12Path = path.join(dir, 'signing.p12')
  const passPath = path.join(dir, 'signing.pass')
  if (!existsSync(p12Path) || !existsSync(passPath)) {
    mkdirSync(dir, { recursive: true })
    const passphrase = randomBytes(24).toString('base64url')
    const keys = forge.pki.rsa.generateKeyPair({ bits: 2048, e: 0x10001 })
    const cert = forge.pki.createCertificate()
    cert.publicKey = keys.publicKey
    cert.serialNumber = '01' + randomBytes(8).toString('hex')
    cert.validity.notBefore = new Date(Date.now() - 60_000)
    cert.validity.notAfter = new Date(Date.now() + 10 * 365 * 86_400_000)
    const name = [
      { name: 'commonName', value: `${labName} certificate signing (local, self-signed)` },
      { name: 'organizationName', value: labName },
    ]
    cert.setSubject(name)
    cert.setIssuer(name)
    cert.setExtensions([
      { name: 'basicConstraints', cA: false },
      { name: 'keyUsage', digitalSignature: true, nonRepudiation: true },
    ])
    cert.sign(keys.privateKey, forge.md.sha256.create())
    const p12 = forge.pkcs12.toPkcs12Asn1(keys.privateKey, [cert], passphrase, { algorithm: '3des', friendlyName: 'ionfolio-signing' })
    writeFileSync(p12Path, Buffer.from(forge.asn1.toDer(p12).getBytes(), 'binary'), { mode: 0o600 })
    writeFileSync(passPath, passphrase, { mode: 0o600 })
    chmodSync(p12Path, 0o600)
  }
  return { NUXT_SIGNING_P12_PATH: p12Path, NUXT_SIGNING_P12_PASSPHRASE: readFileSync(passPath, 'utf8').trim() }
}
