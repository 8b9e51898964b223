import { InvitationQuery as Query } from '#shared/schemas/auth'


// Lets the accept-invitation page greet the invitee by name before they choose a password.
export default defineEventHandler(async (event) => {
  const { token } = queryValid(event, Query)
  const invitation = await findOpenInvitation(useDb(), token)
  return { email: invitation.email, name: invitation.name, role: invitation.role, expiresAt: invitation.expires_at }
})
