// The router picks the most specific path first, so a wrong method on a real API path would
// otherwise fall through to the page renderer. Answer it here as a JSON 405 with Allow.
export default defineEventHandler((event) => {
  const path = event.path.split('?')[0]!
  if (!path.startsWith('/api/')) return
  const methods = apiMethodsFor(path)
  if (!methods.length) return
  const method = event.method === 'HEAD' ? 'GET' : event.method
  if (methods.includes(method)) return
  setResponseHeader(event, 'Allow', methods.join(', '))
  throw createError({ statusCode: 405, statusMessage: 'Method Not Allowed', message: 'This method is not allowed here', data: { allow: methods } })
})
