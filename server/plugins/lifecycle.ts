import { H3Error } from 'h3'

// Start-up and shut-down: close pools when Nitro closes, and turn "the database is unreachable"
// into a 503 the client can retry, instead of an anonymous 500.
export default defineNitroPlugin((nitroApp) => {
  nitroApp.hooks.hook('error', (error) => {
    if (error instanceof H3Error && error.statusCode === 500 && isDatabaseUnavailable(error.cause ?? error)) {
      error.statusCode = 503
      error.statusMessage = 'Service Unavailable'
      error.message = 'The database is unreachable; try again shortly'
      error.unhandled = false
    }
  })
  nitroApp.hooks.hook('close', async () => {
    await Promise.allSettled([closeScfPool(), closeDb(), closeLucia()])
    closeMailer()
  })
})
