import { createHash, randomUUID } from 'node:crypto'
import { createReadStream, createWriteStream } from 'node:fs'
import { rm } from 'node:fs/promises'
import os from 'node:os'
import path from 'node:path'
import { pipeline } from 'node:stream/promises'
import { Transform } from 'node:stream'
import Busboy from 'busboy'
import type { H3Event } from 'h3'
import type { Knex } from 'knex'
import type { DatasheetRow } from '#shared/types/db'
import { DATASHEET_ACCEPTED_TEXT, DATASHEET_KINDS, DATASHEET_MAX_BYTES, DATASHEET_MAX_TEXT, TextChecker, cleanFileName, contentDisposition, kindFromName, magicMatches, type DatasheetKind } from '#shared/samples/filetypes'

/** A file received and checked, waiting in a temporary file to go to the object store. */
export interface ReceivedFile {
  tmpPath: string
  originalName: string
  kind: DatasheetKind
  size: number
  sha256: string
}

// Room for the multipart framing around a file of the largest allowed size.
const FRAMING_BYTES = 1024 * 1024

function refuse(statusCode: number, message: string): never {
  throw createError({ statusCode, statusMessage: statusCode === 413 ? 'Payload Too Large' : statusCode === 415 ? 'Unsupported Media Type' : 'Bad Request', message })
}

/**
 * Streams the one file of a multipart request (field `file`) to a temporary file, hashing and
 * checking it on the way: size limit, type from the name, content against the type. Memory use
 * stays at a few chunks whatever the size, and nothing reaches the object store before the file
 * has passed every check. Throws 400/413/415 with what was wrong; the temporary file is gone then.
 */
export async function receiveUpload(event: H3Event): Promise<ReceivedFile> {
  const req = event.node.req
  if (!/^multipart\/form-data/i.test(req.headers['content-type'] ?? '')) refuse(415, 'Send the file as multipart/form-data in a field named "file"')
  if (Number(req.headers['content-length'] ?? 0) > DATASHEET_MAX_BYTES + FRAMING_BYTES) {
    refuse(413, `The file is larger than ${DATASHEET_MAX_TEXT}; accepted: ${DATASHEET_ACCEPTED_TEXT}`)
  }
  const tmpPath = path.join(os.tmpdir(), `ionfolio-upload-${randomUUID()}`)
  let problem: { status: number; message: string } | null = null
  let received: Omit<ReceivedFile, 'tmpPath'> | null = null
  const writes: Promise<void>[] = []

  let parser: ReturnType<typeof Busboy>
  try {
    parser = Busboy({ headers: req.headers, defParamCharset: 'utf8', limits: { files: 1, fileSize: DATASHEET_MAX_BYTES, fields: 10, parts: 12 } })
  } catch {
    refuse(400, 'The multipart request has no boundary; send the file as multipart/form-data in a field named "file"')
  }
  // The file streams being written, so an aborted request can close them at once.
  const open: NodeJS.ReadableStream[] = []
  parser.on('file', (field, stream, info) => {
    if (field !== 'file' || received || problem) {
      stream.resume()
      return
    }
    const originalName = cleanFileName(info.filename ?? '')
    const kind = kindFromName(originalName)
    if (!kind) {
      problem = { status: 415, message: `This type of file is not accepted; accepted: ${DATASHEET_ACCEPTED_TEXT}` }
      stream.resume()
      return
    }
    open.push(stream)
    const hash = createHash('sha256')
    const text = DATASHEET_KINDS[kind].magic ? null : new TextChecker()
    let size = 0
    let head = Buffer.alloc(0)
    const check = new Transform({
      transform(chunk: Buffer, _enc, done) {
        size += chunk.length
        hash.update(chunk)
        if (head.length < 16) head = Buffer.concat([head, chunk.subarray(0, 16 - head.length)])
        text?.push(chunk)
        done(null, chunk)
      },
    })
    stream.on('limit', () => {
      problem = { status: 413, message: `The file is larger than ${DATASHEET_MAX_TEXT}; accepted: ${DATASHEET_ACCEPTED_TEXT}` }
    })
    writes.push(
      pipeline(stream, check, createWriteStream(tmpPath)).then(() => {
        if (problem) return
        if (size === 0) problem = { status: 400, message: 'The file is empty' }
        else if (!magicMatches(kind, head) || (text && !text.end())) {
          problem = { status: 415, message: `The content of the file is not ${DATASHEET_KINDS[kind].label}, as its name says; accepted: ${DATASHEET_ACCEPTED_TEXT}` }
        } else received = { originalName, kind, size, sha256: hash.digest('hex') }
      }),
    )
  })

  try {
    await new Promise<void>((resolve, reject) => {
      parser.on('close', resolve)
      parser.on('error', reject)
      req.on('error', reject)
      // A client that goes away mid-upload: stop waiting, close the file, remove it (below).
      req.on('aborted', () => reject(new Error('aborted')))
      req.on('close', () => {
        if (!req.complete) reject(new Error('aborted'))
      })
      req.pipe(parser)
    }).catch(() => {
      req.unpipe(parser)
      for (const s of open) (s as NodeJS.ReadableStream & { destroy: (e?: Error) => void }).destroy(new Error('upload stopped'))
      problem ??= { status: 400, message: 'The upload could not be read as multipart/form-data' }
    })
    const settled = await Promise.allSettled(writes)
    if (!problem && settled.some((r) => r.status === 'rejected')) problem = { status: 400, message: 'The upload could not be read as multipart/form-data' }
    if (problem) refuse((problem as { status: number }).status, (problem as { message: string }).message)
    if (!received) refuse(400, 'Send the file in a multipart field named "file"')
    return { tmpPath, ...(received as Omit<ReceivedFile, 'tmpPath'>) }
  } catch (e) {
    await rm(tmpPath, { force: true })
    throw e
  }
}

/** Removes a received file's temporary copy. */
export function discardUpload(file: ReceivedFile): Promise<void> {
  return rm(file.tmpPath, { force: true })
}

/**
 * Puts a received file into the object store under `key`. When the store fails, any part of the
 * object that may have landed is removed and the caller gets a 502 (or 503 when the store is
 * silent): nothing to point at, nothing left.
 */
export async function storeUpload(event: H3Event, file: ReceivedFile, key: string): Promise<void> {
  await putObjectTimed(event, key, createReadStream(file.tmpPath), file.size, {
    'Content-Type': DATASHEET_KINDS[file.kind].contentType,
    'Content-Disposition': contentDisposition(file.originalName),
  }, () => createError({ statusCode: 502, statusMessage: 'Bad Gateway', message: 'The file store did not accept the file; nothing was saved. Try again shortly.' }))
}

/** A datasheet as the API answers it. */
export function datasheetRecord(d: DatasheetRow & { uploader_name?: string | null }) {
  return {
    id: d.id,
    sampleId: d.sample_id,
    fileName: d.original_name,
    contentType: d.content_type,
    size: Number(d.size_bytes),
    sha256: d.sha256,
    uploadedAt: d.uploaded_at,
    uploadedBy: d.uploader_name ?? null,
  }
}

/** A sample record with its datasheets, newest first. */
export async function withDatasheets<T extends { id: string }>(db: Knex | Knex.Transaction, record: T) {
  const rows = await db('datasheets as d')
    .leftJoin('users as u', 'u.id', 'd.uploaded_by')
    .where('d.sample_id', record.id)
    .orderBy('d.uploaded_at', 'desc')
    .select('d.*', 'u.name as uploader_name')
  return { ...record, datasheets: rows.map((r) => datasheetRecord(r as DatasheetRow & { uploader_name: string | null })) }
}
