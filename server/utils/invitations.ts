import { createHash, randomBytes } from 'node:crypto'
import type { Knex } from 'knex'

/** How long an invitation link stays usable. */
export const INVITATION_HOURS = 72

/** A fresh one-time token and the hash we store in its place. */
export function newInvitationToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url')
  return { token, hash: hashToken(token) }
}

/** SHA-256 of a token: the database never holds a usable link. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}

/** The pending invitation a token opens, or 404 (unknown, used, revoked) / 410 (expired). */
export async function findOpenInvitation(db: Knex | Knex.Transaction, token: string, { lock = false } = {}) {
  const q = db('invitations').where({ token_hash: hashToken(token) }).whereNull('accepted_at').whereNull('revoked_at').first()
  const invitation = await (lock ? q.forUpdate() : q)
  if (!invitation) throw createError({ statusCode: 404, statusMessage: 'Not found', message: 'This invitation link is not valid or was already used' })
  if (new Date(invitation.expires_at).getTime() < Date.now()) {
    throw createError({ statusCode: 410, statusMessage: 'Gone', message: 'This invitation has expired; ask a lab manager for a new one' })
  }
  return invitation
}

/** The invitation mail, as HTML and plain text. */
export function invitationMail(opts: { name: string; inviter: string; role: string; link: string; lab: string }) {
  const text = [
    `Hello ${opts.name},`,
    '',
    `${opts.inviter} has invited you to Ionfolio, the sample and species registry of ${opts.lab}, as ${opts.role}.`,
    '',
    `Choose your password here (the link works once and for ${INVITATION_HOURS} hours):`,
    opts.link,
    '',
    'If you did not expect this, ignore this message.',
  ].join('\n')
  const e = escapeHtml
  const html = `<p>Hello ${e(opts.name)},</p>
<p>${e(opts.inviter)} has invited you to Ionfolio, the sample and species registry of ${e(opts.lab)}, as <strong>${e(opts.role)}</strong>.</p>
<p><a href="${e(opts.link)}">Choose your password</a> (the link works once and for ${INVITATION_HOURS} hours).</p>
<p style="color:#555">If you did not expect this, ignore this message.</p>`
  return { text, html }
}
