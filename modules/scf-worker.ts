import path from 'node:path'
import { defineNuxtModule } from '@nuxt/kit'
import { build } from 'esbuild'

// The SCF solver runs in worker threads, which need a file of their own: bundle the worker entry
// beside the built server (.output/server/workers/scf.mjs) once Nitro has compiled.
export default defineNuxtModule({
  meta: { name: 'ionfolio-scf-worker' },
  setup(_options, nuxt) {
    const entry = path.join(nuxt.options.rootDir, 'server', 'workers', 'scf.ts')
    nuxt.hook('nitro:init', (nitro) => {
      nitro.hooks.hook('compiled', async () => {
        await build({
          entryPoints: [entry],
          bundle: true,
          platform: 'node',
          format: 'esm',
          target: 'node20',
          outfile: path.join(nitro.options.output.serverDir, 'workers', 'scf.mjs'),
          logLevel: 'warning',
        })
      })
    })
  },
})
