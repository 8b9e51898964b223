// Listens for session announcements from every app instance (see utils/session-cache.ts).
export default defineNitroPlugin((nitroApp) => {
  listenForSessionEvents(String(useRuntimeConfig().databaseUrl)).catch(() => {})
  nitroApp.hooks.hook('close', () => stopSessionEvents())
})
