// The S3-compatible stand-in, in-process. @20minutes/s3rver checks request signatures, so a
// wrong key fails here as it would against a real S3 service, but it serves a request that
// carries no signature at all as if the bucket were public (its authentication middleware passes
// such requests on, and no option turns that off). A production bucket must be private: so the
// stand-in gets a guard of our own in front of every route that refuses any request without an
// Authorization header or a presigned query (403 AccessDenied, as S3 answers for a private bucket).
import { mkdirSync } from 'node:fs'
import { createRequire } from 'node:module'

const require = createRequire(import.meta.url)

/** Koa middleware: an unsigned request gets S3's AccessDenied; a signed one goes on to s3rver's own check. */
async function requireSignature(ctx, next) {
  const signed = 'authorization' in ctx.headers || 'X-Amz-Algorithm' in ctx.query || 'Signature' in ctx.query
  if (!signed) {
    ctx.status = 403
    ctx.type = 'application/xml'
    ctx.body = '<?xml version="1.0" encoding="UTF-8"?>\n<Error><Code>AccessDenied</Code><Message>Access Denied</Message></Error>'
    return
  }
  await next()
}

/** Starts the stand-in on 127.0.0.1:`port` with its data in `directory`; resolves a handle. */
export async function startObjectStore({ port, directory }) {
  mkdirSync(directory, { recursive: true })
  const S3rver = require('@20minutes/s3rver')
  const server = new S3rver({ address: '127.0.0.1', port, directory, silent: true })
  // s3rver is a Koa application that composes its middleware when it starts listening: the guard
  // goes first, ahead of its logger and router.
  server.middleware.unshift(requireSignature)
  await server.run()
  return { port, stop: () => server.close().catch(() => {}) }
}
