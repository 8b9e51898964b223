import { constants, createPrivateKey, privateEncrypt, type KeyObject } from 'node:crypto'
import forge from 'node-forge'
import { plainAddPlaceholder } from '@signpdf/placeholder-plain'
import { SignPdf } from '@signpdf/signpdf'
import { Signer, SUBFILTER_ETSI_CADES_DETACHED } from '@signpdf/utils'

// The laboratory's digital signature on certificate PDFs: a CMS (PKCS#7) detached signature over
// the PDF's byte ranges, in a signature field added with @signpdf (sub-filter ETSI.CAdES.detached,
// PAdES-style), so any PDF reader and Debian's `pdfsig` can tell whether a single byte changed.
// The PKCS#12 file is read once; the RSA operation runs in Node's crypto rather than node-forge's
// JavaScript, which keeps signing to a few milliseconds.

export interface SigningKey {
  key: KeyObject
  certificate: forge.pki.Certificate
  chain: forge.pki.Certificate[]
}

/** Reads a PKCS#12 file (key and certificate, plus any chain) with its passphrase. Throws a plain Error when it cannot. */
export function loadSigningKey(p12: Buffer, passphrase: string): SigningKey {
  const parsed = forge.pkcs12.pkcs12FromAsn1(forge.asn1.fromDer(forge.util.createBuffer(p12.toString('binary'))), false, passphrase)
  const keyBag = parsed.getBags({ bagType: forge.pki.oids.pkcs8ShroudedKeyBag })[forge.pki.oids.pkcs8ShroudedKeyBag]?.[0]
  const certs = (parsed.getBags({ bagType: forge.pki.oids.certBag })[forge.pki.oids.certBag] ?? []).map((b) => b.cert).filter((c): c is forge.pki.Certificate => !!c)
  const privateKey = keyBag?.key as forge.pki.rsa.PrivateKey | undefined
  if (!privateKey) throw new Error('The signing file holds no private key')
  const certificate = certs.find((c) => {
    const pub = c.publicKey as forge.pki.rsa.PublicKey
    return pub.n.compareTo(privateKey.n) === 0 && pub.e.compareTo(privateKey.e) === 0
  })
  if (!certificate) throw new Error('The signing file holds no certificate for its key')
  return { key: createPrivateKey(forge.pki.privateKeyToPem(privateKey)), certificate, chain: certs }
}

// DER prefix of a DigestInfo for SHA-256 (RFC 8017, section 9.2, note 1).
const SHA256_DIGEST_INFO = Buffer.from('3031300d060960864801650304020105000420', 'hex')

class LabSigner extends Signer {
  constructor(private readonly k: SigningKey) {
    super()
  }

  override async sign(pdfBuffer: Buffer, signingTime?: Date): Promise<Buffer> {
    const p7 = forge.pkcs7.createSignedData()
    p7.content = forge.util.createBuffer(pdfBuffer.toString('binary'))
    for (const c of this.k.chain) p7.addCertificate(c)
    const nodeKey = this.k.key
    // forge asks the key to sign the digest of the signed attributes with RSASSA-PKCS1-v1_5.
    const key = {
      sign: (md: forge.md.MessageDigest) => privateEncrypt({ key: nodeKey, padding: constants.RSA_PKCS1_PADDING }, Buffer.concat([SHA256_DIGEST_INFO, Buffer.from(md.digest().getBytes(), 'binary')])).toString('binary'),
    }
    p7.addSigner({
      key: key as unknown as forge.pki.rsa.PrivateKey,
      certificate: this.k.certificate,
      digestAlgorithm: forge.pki.oids.sha256,
      authenticatedAttributes: [
        { type: forge.pki.oids.contentType, value: forge.pki.oids.data },
        { type: forge.pki.oids.signingTime, value: (signingTime ?? new Date()) as unknown as string },
        { type: forge.pki.oids.messageDigest },
      ],
    })
    p7.sign({ detached: true })
    return Buffer.from(forge.asn1.toDer(p7.toAsn1()).getBytes(), 'binary')
  }
}

const signPdf = new SignPdf()

export interface SignatureInfo {
  /** The signer as a reader shows it: the laboratory. */
  name: string
  reason: string
  location: string
  contactInfo: string
}

/** The PDF with the laboratory's signature added (an incremental update: the rendered bytes are kept as they were). */
export async function signCertificatePdf(pdf: Buffer, k: SigningKey, info: SignatureInfo): Promise<Buffer> {
  const withPlaceholder = plainAddPlaceholder({ pdfBuffer: pdf, ...info, subFilter: SUBFILTER_ETSI_CADES_DETACHED, signatureLength: 8192, appName: 'Ionfolio' })
  return signPdf.sign(withPlaceholder, new LabSigner(k))
}
