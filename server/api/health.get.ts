function within<T>(ms: number, p: Promise<T>): Promise<T> {
  let timer: NodeJS.Timeout
  return Promise.race([p, new Promise<T>((_, reject) => { timer = setTimeout(() => reject(new Error('timeout')), ms) })]).finally(() => clearTimeout(timer))
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

// The store is asked afresh (a bucket check, not the bucket-ready flag kept since start-up), with
// the answer shared for at most STORE_CACHE_MS so a busy balancer does not hammer it; a store that
// is down or frozen shows as down within the probe's 3 s bound.
const STORE_CACHE_MS = 3_000
let storeProbe: { at: number; result: Promise<{ ok: boolean; ms: number }> } | null = null
function storageProbe() {
  if (!storeProbe || Date.now() - storeProbe.at > STORE_CACHE_MS) {
    const bucket = String(useRuntimeConfig().s3.bucket)
    storeProbe = {
      at: Date.now(),
      result: probe(async () => {
        if (!(await useObjectStore().bucketExists(bucket))) throw new Error('no bucket')
      }),
    }
  }
  return storeProbe.result
}

// Public on purpose (a load balancer asks it); it says only up or down, never why in detail.
export default defineEventHandler(async (event) => {
  const [database, storage, mail] = await Promise.all([probe(() => useDb().raw('select 1')), storageProbe(), probe(() => useMailer().verify())])
  const ok = database.ok && storage.ok && mail.ok
  setResponseStatus(event, ok ? 200 : 503)
  return { status: ok ? 'ok' : 'degraded', database, storage, mail }
})
