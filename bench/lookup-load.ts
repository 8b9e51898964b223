// `npm run bench:lookup-load`: the species look-up API under 50 concurrent connections, driven by
// autocannon against the built server, for species whose SCF results are cached (the look-up then
// only reads the cache and runs the closed-form engine). Target: median latency under 20 ms.
// Baseline in the same run and under the same load: GET /api/auth/me, which only resolves the
// session — the floor any signed-in route pays. The look-up is then run again with a personal API
// token instead of the session cookie (interleaved, twice each): token authentication may add at
// most 1 ms to the median.
import autocannon from 'autocannon'
import { runBench, withStack } from './lib/stack'

const SPECIES = ['Fe XIV', 'Fe 13+', 'Ar 8+', 'Ni XIII', 'Ca 10+', 'Au 51+', 'U 60+', 'Kr 10+', 'Xe 26+', 'O 5+', 'C 3+', 'Ne 7+', 'Mg 9+', 'Si 11+', 'S 13+', 'Cu 20+', 'Zn 22+', 'Mo 32+', 'Sn 40+', 'W 46+']
const CONNECTIONS = 50
const SECONDS = 10
const TARGET_MEDIAN_MS = 20
const TOKEN_OVERHEAD_MS = 1

// The bench's token must not meet the per-token rate limit.
process.env.NUXT_TOKEN_RATE_LIMIT ??= '100000000'

function load(base: string, auth: string, paths: string[]) {
  return autocannon({
    url: base,
    connections: CONNECTIONS,
    duration: SECONDS,
    headers: auth.startsWith('Bearer ') ? { authorization: auth } : { cookie: auth },
    requests: paths.map((path) => ({ method: 'GET', path })),
  })
}

async function main(): Promise<number> {
  return withStack(async ({ base, cookieOf }) => {
    const cookie = await cookieOf('scientist')
    const paths = SPECIES.map((s) => `/api/species/lookup?q=${encodeURIComponent(s)}`)
    // Fill the cache: the first look-up of each species solves it (or waits for the solve).
    for (const path of paths) {
      for (let i = 0; i < 40; i++) {
        const body = (await (await fetch(base + path, { headers: { cookie } })).json()) as { scfStatus: string }
        if (body.scfStatus === 'cached') break
        await new Promise((r) => setTimeout(r, 250))
      }
    }
    const made = await fetch(`${base}/api/tokens`, {
      method: 'POST',
      headers: { cookie, origin: base, 'content-type': 'application/json' },
      body: JSON.stringify({ name: 'bench', scope: 'read', expiresOn: new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10) }),
    })
    if (made.status !== 201) throw new Error(`could not create the bench token: ${made.status}`)
    const bearer = `Bearer ${((await made.json()) as { secret: string }).secret}`
    await load(base, cookie, paths.slice(0, 2))
    await load(base, bearer, paths.slice(0, 2))
    const floor = await load(base, cookie, ['/api/auth/me'])
    const lookup = await load(base, cookie, paths)
    const withToken = await load(base, bearer, paths)
    const lookup2 = await load(base, cookie, paths)
    const withToken2 = await load(base, bearer, paths)
    const sessionMedian = (lookup.latency.p50 + lookup2.latency.p50) / 2
    const tokenMedian = (withToken.latency.p50 + withToken2.latency.p50) / 2
    const overhead = tokenMedian - sessionMedian
    const errors = [lookup, lookup2, withToken, withToken2, floor].reduce((n, r) => n + r.errors + r.non2xx, 0)
    const ok = errors === 0 && lookup.latency.p50 < TARGET_MEDIAN_MS && overhead <= TOKEN_OVERHEAD_MS
    console.log(`
Species look-up, cached SCF results, ${SPECIES.length} species in rotation, ${CONNECTIONS} connections for ${SECONDS} s each (autocannon)
  GET /api/species/lookup   median ${lookup.latency.p50} ms  p90 ${lookup.latency.p90} ms  p99 ${lookup.latency.p99} ms  ${Math.round(lookup.requests.average)} req/s
  GET /api/auth/me (floor)  median ${floor.latency.p50} ms  p90 ${floor.latency.p90} ms  p99 ${floor.latency.p99} ms  ${Math.round(floor.requests.average)} req/s
  GET /api/species/lookup with an API token  median ${withToken.latency.p50} / ${withToken2.latency.p50} ms (two runs)  p90 ${withToken.latency.p90} ms  ${Math.round(withToken.requests.average)} req/s
  GET /api/species/lookup with the session   median ${lookup.latency.p50} / ${lookup2.latency.p50} ms (two runs)
  ratio look-up / floor (median)  ${(lookup.latency.p50 / Math.max(floor.latency.p50, 0.01)).toFixed(2)}
  token minus session (mean of the medians)  ${overhead.toFixed(2)} ms; ratio ${(tokenMedian / Math.max(sessionMedian, 0.01)).toFixed(2)}
  errors or non-2xx answers       ${errors}
  targets: median < ${TARGET_MEDIAN_MS} ms; token adds <= ${TOKEN_OVERHEAD_MS} ms   ${ok ? 'PASS' : 'FAIL'}`)
    return ok ? 0 : 1
  })
}

runBench(main)
