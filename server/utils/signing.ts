import { readFileSync } from 'node:fs'
import { loadSigningKey, signCertificatePdf, type SigningKey } from '../pdf/sign'

let signingKey: SigningKey | null = null

/**
 * The laboratory's signing key, from NUXT_SIGNING_P12_PATH and NUXT_SIGNING_P12_PASSPHRASE, read
 * once. Without one no certificate is issued (503): an unsigned certificate would look like a
 * signed one's forgery.
 */
function useSigningKey(): SigningKey {
  if (!signingKey) {
    const { signing } = useRuntimeConfig()
    const file = String(signing.p12Path ?? '')
    try {
      if (!file) throw new Error('NUXT_SIGNING_P12_PATH is not set')
      signingKey = loadSigningKey(readFileSync(file), String(signing.p12Passphrase ?? ''))
    } catch (e) {
      console.error('Certificate signing key not usable:', e instanceof Error ? e.message : e)
      throw createError({ statusCode: 503, statusMessage: 'Service Unavailable', message: 'The laboratory signing key is not set up; no certificate can be issued' })
    }
  }
  return signingKey
}

/** Signs a rendered certificate PDF with the laboratory's key. */
export function signPdf(pdf: Buffer, number: string): Promise<Buffer> {
  const lab = String(useRuntimeConfig().public.labName)
  return signCertificatePdf(pdf, useSigningKey(), { name: lab, reason: `Certificate ${number} issued by ${lab}`, location: lab, contactInfo: String(useRuntimeConfig().smtp.from) })
}
