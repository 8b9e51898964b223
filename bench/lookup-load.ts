// `npm run bench:lookup-load`: the species look-up API under 50 concurrent connections, driven by
// autocannon against the built server, for species whose SCF results are cached (the look-up then
// only reads the cache and runs the closed-form engine). Target: median latency under 20 ms.
// Baseline in the same run and under the same load: GET /api/auth/me, which only resolves the
// session — the floor any signed-in route pays.
import autocannon from 'autocannon'
import { runBench, withStack } from './lib/stack'

const SPECIES = ['Fe XIV', 'Fe 13+', 'Ar 8+', 'Ni XIII', 'Ca 10+', 'Au 51+', 'U 60+', 'Kr 10+', 'Xe 26+', 'O 5+', 'C 3+', 'Ne 7+', 'Mg 9+', 'Si 11+', 'S 13+', 'Cu 20+', 'Zn 22+', 'Mo 32+', 'Sn 40+', 'W 46+']
const CONNECTIONS = 50
const SECONDS = 10
const TARGET_MEDIAN_MS = 20

function load(base: string, cookie: string, paths: string[]) {
  return autocannon({
    url: base,
    connections: CONNECTIONS,
    duration: SECONDS,
    headers: { cookie },
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
    await load(base, cookie, paths.slice(0, 2))
    const floor = await load(base, cookie, ['/api/auth/me'])
    const lookup = await load(base, cookie, paths)
    const errors = lookup.errors + lookup.non2xx + floor.errors + floor.non2xx
    const ok = errors === 0 && lookup.latency.p50 < TARGET_MEDIAN_MS
    console.log(`
Species look-up, cached SCF results, ${SPECIES.length} species in rotation, ${CONNECTIONS} connections for ${SECONDS} s each (autocannon)
  GET /api/species/lookup   median ${lookup.latency.p50} ms  p90 ${lookup.latency.p90} ms  p99 ${lookup.latency.p99} ms  ${Math.round(lookup.requests.average)} req/s
  GET /api/auth/me (floor)  median ${floor.latency.p50} ms  p90 ${floor.latency.p90} ms  p99 ${floor.latency.p99} ms  ${Math.round(floor.requests.average)} req/s
  ratio look-up / floor (median)  ${(lookup.latency.p50 / Math.max(floor.latency.p50, 0.01)).toFixed(2)}
  errors or non-2xx answers       ${errors}
  target: median < ${TARGET_MEDIAN_MS} ms   ${ok ? 'PASS' : 'FAIL'}`)
    return ok ? 0 : 1
  })
}

runBench(main)
