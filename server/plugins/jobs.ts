// Starts the shared background jobs (utils/jobs.ts). A failure to start is logged, not fatal:
// the app serves requests, and another instance works the queues.
export default defineNitroPlugin((nitroApp) => {
  startJobs().catch((e) => console.error('The job queue did not start:', e instanceof Error ? e.message : e))
  nitroApp.hooks.hook('close', () => stopJobs())
})
