import type { Knex } from 'knex'

/** How long a password reset link works. */
export const RESET_MINUTES = 60

/**
 * Makes a reset link for `user` and mails it, inside the caller's transaction (when the mail
 * cannot go, no link is left that nobody received). Earlier unused links stop working.
 */
export async function sendResetLink(trx: Knex.Transaction, user: { id: string; email: string; name: string }, opts: { requestedBy?: { id: string; name: string } | null; reactivate?: boolean } = {}): Promise<void> {
  await trx('password_resets').where({ user_id: user.id }).whereNull('used_at').update({ used_at: trx.fn.now() })
  const { token, hash } = newInvitationToken()
  await trx('password_resets').insert({ user_id: user.id, token_hash: hash, expires_at: new Date(Date.now() + RESET_MINUTES * 60_000), requested_by: opts.requestedBy?.id ?? null, reactivate: !!opts.reactivate })
  const config = useRuntimeConfig()
  const link = `${String(config.public.baseUrl).replace(/\/$/, '')}/reset-password/${token}`
  const by = opts.requestedBy ? `${opts.requestedBy.name}, a lab manager, has sent you a link to set a new password` : 'Someone (we hope you) asked to reset your password'
  const text = [`Hello ${user.name},`, '', `${by} for Ionfolio at ${config.public.labName}.`, '', `Set it here (the link works once and for ${RESET_MINUTES} minutes):`, link, '', 'Setting a new password signs you out everywhere else. If you did not ask for this, ignore this message: your password stays as it is.'].join('\n')
  const e = escapeHtml
  const html = `<p>Hello ${e(user.name)},</p><p>${e(by)} for Ionfolio at ${e(String(config.public.labName))}.</p><p><a href="${e(link)}">Set a new password</a> (the link works once and for ${RESET_MINUTES} minutes).</p><p style="color:#555">Setting a new password signs you out everywhere else. If you did not ask for this, ignore this message: your password stays as it is.</p>`
  await sendMail({ to: user.email, subject: 'Set your Ionfolio password', text, html })
}
