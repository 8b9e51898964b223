function within<T>(ms: number, p: Promise<T>): Promise<T> {
  return Promise.race([p, new Promise<T>((_, reject) => setTimeout(() => reject(new Error('timeout')), ms))])
}

async function probe(check: () => Promise<unknown>): Promise<{ ok: boolean; ms: number }> {
  const started = performance.now()
  try {
    await within(3_000, check())
    return { ok: true, ms: Math.round(performance.now() - started) }
  } catch {
    return { ok: false, ms: Math.round(performance.now() - started) }
  }
}

// Public on purpose (a load balancer asks it); it says only up or down, never why in detail.
export default defineEventHandler(async (event) => {
  const [database, storage, mail] = await Promise.all([
    probe(() => useDb().raw('select 1')),
    probe(async () => {
      await useBucket()
    }),
    probe(() => useMailer().verify()),
  ])
  const ok = database.ok && storage.ok && mail.ok
  setResponseStatus(event, ok ? 200 : 503)
  return { status: ok ? 'ok' : 'degraded', database, storage, mail }
})
