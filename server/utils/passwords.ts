import { hash, verify } from '@node-rs/argon2'

// argon2id with the library's defaults (19 MiB, 2 passes): the OWASP baseline.
const OPTIONS = { algorithm: 2 as const }

/** An argon2id hash of `password`. */
export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS)
}

let dummyHash: Promise<string> | null = null

/**
 * Checks `password` against `stored`; with no stored hash it still spends the same time on a
 * dummy hash, so an unknown e-mail cannot be told from a wrong password by the clock.
 */
export async function checkPassword(stored: string | null | undefined, password: string): Promise<boolean> {
  if (!stored) {
    dummyHash ??= hash('not-a-real-password-0000', OPTIONS)
    await verify(await dummyHash, password).catch(() => false)
    return false
  }
  return verify(stored, password).catch(() => false)
}
