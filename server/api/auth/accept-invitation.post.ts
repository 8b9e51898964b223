import { randomUUID } from 'node:crypto'
import { AcceptInvitationBody } from '#shared/schemas/auth'

export default defineEventHandler(async (event) => {
  const { token, password } = await readValid(event, AcceptInvitationBody)
  const passwordHash = await hashPassword(password)

  const db = useDb()
  const user = await db.transaction(async (trx) => {
    const invitation = await findOpenInvitation(trx, token, { lock: true })
    const taken = await trx('users').whereRaw('lower(email) = ?', [invitation.email]).first()
    if (taken) throw createError({ statusCode: 409, statusMessage: 'Conflict', message: 'This e-mail already has an account' })
    const [created] = await trx('users')
      .insert({ id: randomUUID(), email: invitation.email, name: invitation.name, role: invitation.role, password_hash: passwordHash })
      .returning(['id', 'email', 'name', 'role'])
    await trx('invitations').where({ id: invitation.id }).update({ accepted_at: trx.fn.now() })
    await writeAudit(trx, event, { action: 'user.joined', entityType: 'user', entityId: created.id, after: { email: created.email, name: created.name, role: created.role, invitation: invitation.id } }, { id: created.id, email: created.email })
    return created
  })

  await startSession(event, user.id)
  return user
})
