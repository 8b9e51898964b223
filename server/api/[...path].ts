// Anything under /api that no route file answers: a JSON 404, never the HTML page renderer.
// (A wrong method on a real path is answered earlier, by middleware/00.methods.ts.)
export default defineEventHandler(() => {
  throw createError({ statusCode: 404, statusMessage: 'Not Found', message: 'No such API route' })
})
