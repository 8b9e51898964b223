import http from 'node:http'
import https from 'node:https'
import type { H3Event } from 'h3'
import { Client } from 'minio'

let client: Client | null = null
let bucketReady: Promise<void> | null = null

/** A store call that got no answer in time (a hung or frozen store). */
export class StoreTimeoutError extends Error {}

/** A stored object larger than its record says it can be: read no further. */
export class ObjectTooLargeError extends Error {}

/** The store's time limit: silence on a connection for this long ends the call (runtimeConfig.s3.timeoutMs). */
export function storeTimeoutMs(): number {
  return Number(useRuntimeConfig().s3.timeoutMs) || 10_000
}

// minio has no per-call timeout, but takes a transport: every request it makes through this one
// is destroyed after `ms` of silence on its socket, before the answer or in the middle of a body,
// so a store that accepts connections and never answers cannot hold a request (or a socket) forever.
function timedTransport(mod: typeof http | typeof https, ms: number) {
  return {
    ...mod,
    request: (options: http.RequestOptions, callback?: (res: http.IncomingMessage) => void) => {
      const req = mod.request(options, callback)
      req.setTimeout(ms, () => req.destroy(new StoreTimeoutError('The object store did not answer in time')))
      return req
    },
  }
}

/** The object-store client (any S3 service: the settings decide). */
export function useObjectStore(): Client {
  if (!client) {
    const { s3 } = useRuntimeConfig()
    const useSSL = String(s3.useSsl) === 'true'
    client = new Client({
      endPoint: String(s3.endPoint),
      port: Number(s3.port),
      useSSL,
      accessKey: String(s3.accessKey),
      secretKey: String(s3.secretKey),
      region: String(s3.region),
      pathStyle: String(s3.pathStyle) !== 'false',
      transport: timedTransport(useSSL ? https : http, storeTimeoutMs()) as never,
    })
  }
  return client
}

/** Rejects with StoreTimeoutError when `p` has not settled within `ms` (a whole-call bound). */
export function withinStoreTime<T>(p: Promise<T>, ms = storeTimeoutMs() * 2): Promise<T> {
  let timer: NodeJS.Timeout
  const limit = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new StoreTimeoutError('The object store did not answer in time')), ms)
  })
  return Promise.race([p, limit]).finally(() => clearTimeout(timer))
}

/** The bucket name, created on first use if missing. */
export async function useBucket(): Promise<string> {
  const bucket = String(useRuntimeConfig().s3.bucket)
  if (!bucketReady) {
    bucketReady = withinStoreTime(
      (async () => {
        const store = useObjectStore()
        if (!(await store.bucketExists(bucket))) await store.makeBucket(bucket, String(useRuntimeConfig().s3.region))
      })(),
    ).catch((e) => {
      bucketReady = null
      throw e
    })
  }
  await bucketReady
  return bucket
}

/** The 503 for a store that is down or silent: the caller may retry shortly. */
export function storeUnavailable(event: H3Event) {
  setResponseHeader(event, 'Retry-After', 30)
  return createError({ statusCode: 503, statusMessage: 'Service Unavailable', message: 'The file store is not answering; try again shortly' })
}

/**
 * Reads a whole object into memory within the store's time limit, at most `maxBytes` of it.
 * Throws whatever the store throws (StoreTimeoutError when it goes silent).
 */
export async function readObject(key: string, maxBytes: number): Promise<Buffer> {
  const bucket = await useBucket()
  const stream = await withinStoreTime(useObjectStore().getObject(bucket, key))
  const chunks: Buffer[] = []
  let size = 0
  await withinStoreTime(
    new Promise<void>((resolve, reject) => {
      stream.on('data', (chunk: Buffer) => {
        size += chunk.length
        if (size > maxBytes) {
          stream.destroy()
          reject(new ObjectTooLargeError('The stored object is larger than its record allows'))
          return
        }
        chunks.push(chunk)
      })
      stream.on('error', reject)
      stream.on('end', resolve)
    }),
    storeTimeoutMs() * 6,
  ).catch((e) => {
    stream.destroy()
    throw e
  })
  return Buffer.concat(chunks)
}

/**
 * Puts an object within the store's time limit. When the put times out the object may still land
 * later (the request was on its way): it is removed now and once more after the time limit has
 * passed again, and the caller records nothing. Throws the 503 (timeout) or `onFailure()` (any
 * other store error), after removing whatever part of the object may have landed.
 */
export async function putObjectTimed(event: H3Event, key: string, body: Buffer | NodeJS.ReadableStream, size: number, meta: Record<string, string>, onFailure: () => Error): Promise<void> {
  try {
    const bucket = await useBucket()
    await withinStoreTime(useObjectStore().putObject(bucket, key, body as Buffer, size, meta))
  } catch (e) {
    if (e instanceof StoreTimeoutError) {
      // Not awaited: a silent store would hold the answer for another time limit.
      void removeStoredObject(key)
      setTimeout(() => void removeStoredObject(key), storeTimeoutMs() * 3).unref()
      throw storeUnavailable(event)
    }
    await removeStoredObject(key)
    throw onFailure()
  }
}

/** Removes an object, ignoring a store that is down or an object that is not there. */
export async function removeStoredObject(key: string): Promise<void> {
  try {
    await withinStoreTime(useObjectStore().removeObject(await useBucket(), key))
  } catch {
    // the store is unreachable or never had it; reconciliation (npm run reconcile) finds leftovers
  }
}
