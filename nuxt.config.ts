import { fileURLToPath } from 'node:url'

// The font files the PDFs embed (server/pdf/fonts.ts names the same subsets and weights).
const fontFiles = (pkg: string) => fileURLToPath(new URL(`./node_modules/@fontsource/${pkg}/files`, import.meta.url))

// Every setting has a working local default and is overridden at run time by the matching
// NUXT_* environment variable (e.g. NUXT_DATABASE_URL, NUXT_S3_ENDPOINT, NUXT_SMTP_HOST), so
// pointing the built server at managed services is configuration only.
export default defineNuxtConfig({
  compatibilityDate: '2026-11-01',
  devtools: { enabled: false },
  telemetry: false,
  modules: ['@nuxtjs/tailwindcss', '@pinia/nuxt'],
  css: [
    '@fontsource/inter/latin-400.css',
    '@fontsource/inter/latin-ext-400.css',
    '@fontsource/inter/latin-600.css',
    '@fontsource/inter/latin-ext-600.css',
    '@fontsource/inter/greek-400.css',
    '@fontsource/roboto-mono/latin-400.css',
  ],
  tailwindcss: { cssPath: '~/assets/css/main.css', viewer: false },
  app: {
    head: {
      htmlAttrs: { lang: 'en' },
      title: 'Ionfolio',
      meta: [
        { name: 'viewport', content: 'width=device-width, initial-scale=1' },
        { name: 'description', content: 'Target samples and ion species for the laboratory' },
      ],
      link: [{ rel: 'icon', type: 'image/svg+xml', href: '/favicon.svg' }],
    },
  },
  runtimeConfig: {
    databaseUrl: 'postgres://ionfolio_app@127.0.0.1:55432/ionfolio',
    databasePoolMax: 10,
    s3: {
      endPoint: '127.0.0.1',
      port: 9300,
      useSsl: false,
      accessKey: 'S3RVER',
      secretKey: 'S3RVER',
      region: 'us-east-1',
      bucket: 'ionfolio',
      pathStyle: true,
      // Silence on a store connection for this long ends the call (a hung store answers 503).
      timeoutMs: 10_000,
    },
    // The laboratory's certificate-signing key: a PKCS#12 file and its passphrase. `npm start` and
    // `npm test` make a self-signed one under storage/signing (or their temporary folder).
    signing: {
      p12Path: '',
      p12Passphrase: '',
    },
    smtp: {
      host: '127.0.0.1',
      port: 2526,
      secure: false,
      user: '',
      pass: '',
      from: 'Ionfolio <ionfolio@larchmere-lab.example>',
    },
    // Take the client address from X-Forwarded-For: only behind a trusted load balancer.
    trustProxy: false,
    // Requests per API token per minute, per app instance (NUXT_TOKEN_RATE_LIMIT).
    tokenRateLimit: 600,
    // Background jobs through pg-boss (server/utils/jobs.ts). `precompute`: which elements the app
    // fills the SCF cache for when the engine version has no complete cache ('1-118', or 'off').
    jobs: {
      enabled: true,
      precompute: '1-118',
      precomputeBatch: 8,
      noticesCron: '15 6 * * *',
      // The store reconciliation only reports (an audit row and a log line); 'off' for none.
      reconcileCron: '45 5 * * *',
      pollSeconds: 2,
    },
    // Empty means "decide from publicBaseUrl": Secure cookies whenever the site is served over https.
    cookieSecure: '',
    public: {
      baseUrl: 'http://localhost:3300',
      labName: 'Larchmere Ion Beam Laboratory',
      // IANA zone every date and time is written in (ISO 8601 date, 24-hour time, zone named).
      labTimeZone: 'UTC',
    },
  },
  nitro: {
    experimental: { tasks: true },
    // The daily notices and the store reconciliation are scheduled through the job queue
    // (runtimeConfig.jobs, server/utils/jobs.ts), so one instance runs each tick; the Nitro tasks
    // stay for POST /api/notices/run and for running them by hand.
    serverAssets: [
      { baseName: 'pdf-inter', dir: fontFiles('inter'), pattern: 'inter-{latin,latin-ext,greek}-{400,600}-normal.woff' },
      { baseName: 'pdf-mono', dir: fontFiles('roboto-mono'), pattern: 'roboto-mono-{latin,latin-ext}-{400,700}-normal.woff' },
    ],
    typescript: { tsConfig: { compilerOptions: { noUncheckedIndexedAccess: false } } },
  },
  typescript: {
    // The physics engine indexes arrays in tight numeric loops, and the app and server compile it
    // too: there the index check is noise, so it is off in every project alike.
    tsConfig: { compilerOptions: { noUncheckedIndexedAccess: false } },
    sharedTsConfig: { compilerOptions: { noUncheckedIndexedAccess: false } },
    nodeTsConfig: {
      compilerOptions: { noUncheckedIndexedAccess: false },
      include: ['../tests/**/*.ts', '../scripts/**/*.ts', '../bench/**/*.ts', '../knex.config.ts', '../migrations/**/*.ts', '../seeds/**/*.ts'],
    },
  },
})
