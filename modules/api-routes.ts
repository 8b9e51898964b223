import { defineNuxtModule } from '@nuxt/kit'

// Hands the server the list of API routes and their methods, as Nitro scanned them, so the
// catch-all route can tell "no such route" (404) from "wrong method" (405).
export default defineNuxtModule({
  meta: { name: 'ionfolio-api-routes' },
  setup(_options, nuxt) {
    nuxt.hook('nitro:init', (nitro) => {
      nitro.options.virtual['#api-routes'] = () => {
        const routes = nitro.scannedHandlers
          .filter((h) => h.route?.startsWith('/api/') && !h.route.includes('**'))
          .map((h) => ({ route: h.route!, method: (h.method ?? 'all').toUpperCase() }))
        return `export default ${JSON.stringify(routes)}`
      }
    })
  },
})
