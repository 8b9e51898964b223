export default defineEventHandler((event) => {
  const user = requireUser(event)
  return { id: user.id, email: user.email, name: user.name, role: user.role }
})
