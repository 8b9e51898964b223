// The S3-compatible stand-in, in-process. @20minutes/s3rver checks request signatures, so a
// wrong key fails here as it would against a real S3 service.
import { mkdirSync } from 'node:fs'
import { createRequire } from 'node:module'

const require = createRequire(import.meta.url)

/** Starts the stand-in on 127.0.0.1:`port` with its data in `directory`; resolves a handle. */
export async function startObjectStore({ port, directory }) {
  mkdirSync(directory, { recursive: true })
  const S3rver = require('@20minutes/s3rver')
  const server = new S3rver({ address: '127.0.0.1', port, directory, silent: true })
  await server.run()
  return { port, stop: () => server.close().catch(() => {}) }
}
