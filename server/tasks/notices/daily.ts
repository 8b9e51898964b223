// The daily notices (nuxt.config.ts schedules it); POST /api/notices/run starts it on demand.
export default defineTask({
  meta: { name: 'notices:daily', description: 'Re-certification due, check-outs overdue, and missed certificate notices' },
  async run() {
    return { result: await runDailyNotices() }
  },
})
