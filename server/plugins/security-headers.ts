import { createHash } from 'node:crypto'
import { inlineScripts, pageCsp } from '#shared/security/headers'

// A rendered page's policy allows exactly the inline scripts it carries, by their SHA-256.
// (Development skips it: Vite's live reload injects scripts of its own.)
export default defineNitroPlugin((nitroApp) => {
  if (import.meta.dev) return
  nitroApp.hooks.hook('render:response', (response) => {
    if (typeof response.body !== 'string') return
    const hashes = inlineScripts(response.body).map((s) => createHash('sha256').update(s, 'utf8').digest('base64'))
    response.headers = { ...response.headers, 'content-security-policy': pageCsp(hashes) }
  })
})
