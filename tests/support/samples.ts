import { Client as Minio } from 'minio'
import { expect } from 'vitest'
import type { Client } from './api'

/** A sample body that passes the schema; `over` replaces fields. */
export function sampleBody(over: Record<string, unknown> = {}) {
  return {
    name: 'Test nickel foil',
    material: 'Nickel metal',
    formula: 'Ni',
    form: 'foil',
    arealDensity: 500,
    bulkDensity: 8.908,
    components: [{ z: 28, massNumber: null, fraction: 1, basis: 'atom' }],
    ...over,
  }
}

/** Creates a sample as `client` (a manager) and answers the record. */
export async function createSample(client: Client, over: Record<string, unknown> = {}) {
  const r = await client.post('/api/samples', sampleBody(over))
  expect(r.status, JSON.stringify(r.body)).toBe(201)
  return r.body
}

let minio: Minio | null = null

/** The test run's object store, through the same NUXT_S3_* settings the server has. */
export function objectStore(): { client: Minio; bucket: string } {
  const env = process.env
  minio ??= new Minio({
    endPoint: env.NUXT_S3_END_POINT ?? '127.0.0.1',
    port: Number(env.NUXT_S3_PORT),
    useSSL: false,
    accessKey: env.NUXT_S3_ACCESS_KEY ?? 'S3RVER',
    secretKey: env.NUXT_S3_SECRET_KEY ?? 'S3RVER',
    region: env.NUXT_S3_REGION ?? 'us-east-1',
    pathStyle: true,
  })
  return { client: minio, bucket: env.NUXT_S3_BUCKET ?? 'ionfolio' }
}

/** The keys of every stored object whose key starts with `prefix`. */
export async function objectsUnder(prefix: string): Promise<string[]> {
  const { client, bucket } = objectStore()
  const keys: string[] = []
  for await (const o of client.listObjectsV2(bucket, prefix, true)) if (o.name) keys.push(o.name)
  return keys
}
