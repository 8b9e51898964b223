import { z } from 'zod'

const Query = z.object({ token: z.string().min(20).max(200) })

// Lets the accept-invitation page greet the invitee by name before they choose a password.
export default defineEventHandler(async (event) => {
  const { token } = queryValid(event, Query)
  const invitation = await findOpenInvitation(useDb(), token)
  return { email: invitation.email, name: invitation.name, role: invitation.role, expiresAt: invitation.expires_at }
})
