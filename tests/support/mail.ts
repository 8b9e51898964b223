import { readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'

export interface SpooledMail {
  to: string[]
  from: string | null
  subject: string
  text: string
  html: string
}

function spool(): string {
  const dir = process.env.IONFOLIO_TEST_MAIL_DIR
  if (!dir) throw new Error('IONFOLIO_TEST_MAIL_DIR is not set: run through `npm test`')
  return dir
}

/** Every message the test SMTP server has received so far, oldest first. */
export function allMail(): SpooledMail[] {
  return readdirSync(spool())
    .filter((f) => f.endsWith('.json'))
    .sort()
    .map((f) => JSON.parse(readFileSync(path.join(spool(), f), 'utf8')))
}

/** Waits for a message to `to` (optionally matching `subject`) and returns the newest. */
export async function waitForMail(to: string, subject?: RegExp, timeoutMs = 10_000): Promise<SpooledMail> {
  const until = Date.now() + timeoutMs
  while (Date.now() < until) {
    const found = allMail().filter((m) => m.to.includes(to) && (!subject || subject.test(m.subject)))
    if (found.length) return found[found.length - 1]!
    await new Promise((r) => setTimeout(r, 100))
  }
  throw new Error(`no mail to ${to} arrived within ${timeoutMs} ms`)
}
