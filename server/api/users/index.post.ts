import { InviteAgainBody } from '#shared/schemas/auth'
import { CAN, ROLE_LABELS } from '#shared/auth/roles'

// Inviting writes the invitation and sends its mail inside one transaction: when the mail
// cannot be sent, no invitation is left behind that nobody received.
export default defineEventHandler(async (event) => {
  const inviter = requireRole(event, ...CAN.managePeople)
  const body = await readValid(event, InviteAgainBody)

  const db = useDb()
  const config = useRuntimeConfig()
  const invitation = await db.transaction(async (trx) => {
    const existing = await trx('users').whereRaw('lower(email) = ?', [body.email]).first()
    if (existing) {
      throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'A person with this e-mail already has an account', data: { reason: 'account', userId: existing.id, active: existing.active } })
    }
    // Inviting someone already invited says so; sending again needs `resend` (and the old link stops working).
    const pending = await trx('invitations').where({ email: body.email }).whereNull('accepted_at').whereNull('revoked_at').where('expires_at', '>', trx.fn.now()).orderBy('created_at', 'desc').first()
    if (pending && !body.resend) {
      throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'This person is already invited', data: { reason: 'invited', invitation: { id: pending.id, name: pending.name, role: pending.role, createdAt: pending.created_at, expiresAt: pending.expires_at } } })
    }
    await trx('invitations').where({ email: body.email }).whereNull('accepted_at').whereNull('revoked_at').update({ revoked_at: trx.fn.now() })
    const { token, hash } = newInvitationToken()
    const [row] = await trx('invitations')
      .insert({ email: body.email, name: body.name, role: body.role, token_hash: hash, invited_by: inviter.id, expires_at: new Date(Date.now() + INVITATION_HOURS * 3600_000) })
      .returning(['id', 'email', 'name', 'role', 'expires_at', 'created_at'])
    await writeAudit(trx, event, { action: pending ? 'user.invitation-resent' : 'user.invited', entityType: 'invitation', entityId: row.id, after: { email: row.email, name: row.name, role: row.role } })
    const link = `${String(config.public.baseUrl).replace(/\/$/, '')}/invite/${token}`
    const mail = invitationMail({ name: body.name, inviter: inviter.name, role: ROLE_LABELS[body.role].toLowerCase(), link, lab: String(config.public.labName) })
    try {
      await sendMail({ to: body.email, subject: 'Your invitation to Ionfolio', ...mail })
    } catch {
      throw createError({ statusCode: 502, statusMessage: 'Bad Gateway', message: 'The invitation mail could not be sent; nothing was saved' })
    }
    return row
  })

  setResponseStatus(event, 201)
  return { id: invitation.id, email: invitation.email, name: invitation.name, role: invitation.role, expiresAt: invitation.expires_at, createdAt: invitation.created_at }
})
