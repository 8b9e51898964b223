export default defineEventHandler(async (event) => {
  const user = event.context.user
  await endSession(event)
  if (user) await writeAudit(useDb(), event, { action: 'auth.sign-out', entityType: 'user', entityId: user.id }, { id: user.id, email: user.email })
  setResponseStatus(event, 204)
  return null
})
