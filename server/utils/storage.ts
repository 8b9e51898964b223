import { Client } from 'minio'

let client: Client | null = null
let bucketReady: Promise<void> | null = null

/** The object-store client (any S3 service: the settings decide). */
export function useObjectStore(): Client {
  if (!client) {
    const { s3 } = useRuntimeConfig()
    client = new Client({
      endPoint: String(s3.endPoint),
      port: Number(s3.port),
      useSSL: String(s3.useSsl) === 'true',
      accessKey: String(s3.accessKey),
      secretKey: String(s3.secretKey),
      region: String(s3.region),
      pathStyle: String(s3.pathStyle) !== 'false',
    })
  }
  return client
}

/** The bucket name, created on first use if missing. */
export async function useBucket(): Promise<string> {
  const bucket = String(useRuntimeConfig().s3.bucket)
  if (!bucketReady) {
    bucketReady = (async () => {
      const store = useObjectStore()
      if (!(await store.bucketExists(bucket))) await store.makeBucket(bucket, String(useRuntimeConfig().s3.region))
    })().catch((e) => {
      bucketReady = null
      throw e
    })
  }
  await bucketReady
  return bucket
}
