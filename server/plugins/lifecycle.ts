import { H3Error } from 'h3'

// Start-up and shut-down: close pools when Nitro closes, and turn "the database is unreachable"
// into a 503 the client can retry, instead of an anonymous 500.
// PostgreSQL's class 22, "data exception" (SQLSTATE, PostgreSQL manual appendix A).
function isDataException(error: unknown): boolean {
  let e: any = error
  for (let depth = 0; e && depth < 5; depth++) {
    if (typeof e.code === 'string' && /^22[0-9A-Z]{3}$/.test(e.code)) return true
    e = e.cause
  }
  return false
}

/** What a client is told to wait before retrying while the database is away. */
const DB_RETRY_AFTER_SECONDS = 5

export default defineNitroPlugin((nitroApp) => {
  nitroApp.hooks.hook('error', (error, ctx) => {
    if (error instanceof H3Error && error.statusCode === 500 && isDatabaseUnavailable(error.cause ?? error)) {
      if (ctx?.event && !ctx.event.node.res.headersSent) setResponseHeader(ctx.event, 'Retry-After', DB_RETRY_AFTER_SECONDS)
      error.statusCode = 503
      error.statusMessage = 'Service Unavailable'
      error.message = 'The database is unreachable; try again shortly'
      error.unhandled = false
    } else if (error instanceof H3Error && error.statusCode === 500 && isDataException(error.cause ?? error)) {
      // A value the database cannot hold (out of range, bad encoding) is the input's fault: 400.
      error.statusCode = 400
      error.statusMessage = 'Invalid input'
      error.message = 'A value is outside what can be stored; check the numbers, dates and text you sent'
      error.unhandled = false
    }
  })
  nitroApp.hooks.hook('close', async () => {
    await Promise.allSettled([closeScfPool(), closeDb(), closeLucia()])
    closeMailer()
  })
})
