import { addTypeTemplate, defineNuxtModule } from '@nuxt/kit'

// Hands the server the list of API routes and their methods, as Nitro scanned them, so a wrong
// method on a real path can be told (405) from a path that does not exist (404).
export default defineNuxtModule({
  meta: { name: 'ionfolio-api-routes' },
  setup(_options, nuxt) {
    addTypeTemplate(
      {
        filename: 'types/ionfolio-api-routes.d.ts',
        getContents: () => `declare module '#api-routes' {\n  const routes: Array<{ route: string; method: string }>\n  export default routes\n}\n`,
      },
      { nitro: true, nuxt: true },
    )
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
