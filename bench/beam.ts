// `npm run bench:beam`: the strip and breed answers over HTTP. Starts its own stack (as `npm test`
// does), signs in, and times, interleaved in the same run:
//   strip:    GET /api/beam/charge-states for 208Pb27+ at 4.2 MeV/u through 20 µg/cm² of carbon;
//   breed:    GET /api/beam/breeding for 40Ar at 5 keV and 250 A/cm² (bare Ar is reached);
//   baseline: GET /api/auth/me, the cheapest signed-in route (the session check alone).
// Target: strip and breed medians under 50 ms; the ratio to the baseline is printed beside them.
import { percentile, runBench, withStack } from './lib/stack'

const ROUNDS = 200
const WARM_UP = 30
const TARGET_MS = 50

async function main(): Promise<number> {
  return withStack(async ({ base, cookieOf }) => {
    const cookie = await cookieOf('scientist')
    const routes = {
      strip: `${base}/api/beam/charge-states?ion=208Pb27%2B&energy=4.2&medium=C&arealDensity=20`,
      breed: `${base}/api/beam/breeding?ion=40Ar&electronEnergy=5000&currentDensity=250`,
      baseline: `${base}/api/auth/me`,
    }
    const time = async (url: string) => {
      const t = performance.now()
      const r = await fetch(url, { headers: { cookie } })
      await r.arrayBuffer()
      if (r.status !== 200) throw new Error(`${url} answered ${r.status}`)
      return performance.now() - t
    }
    const names = Object.keys(routes) as (keyof typeof routes)[]
    for (let i = 0; i < WARM_UP; i++) for (const n of names) await time(routes[n])
    const times: Record<string, number[]> = { strip: [], breed: [], baseline: [] }
    for (let i = 0; i < ROUNDS; i++) {
      // rotate the order so no route always runs right after another
      for (let k = 0; k < names.length; k++) {
        const n = names[(i + k) % names.length]!
        times[n]!.push(await time(routes[n]))
      }
    }
    const median = (n: string) => percentile(times[n]!, 50)
    const b = median('baseline')
    const ok = median('strip') < TARGET_MS && median('breed') < TARGET_MS
    console.log(`
Beam planning over HTTP, ${ROUNDS} rounds each (signed in as a scientist)
  strip  208Pb27+ 4.2 MeV/u C 20 µg/cm²   median ${median('strip').toFixed(2)} ms   p95 ${percentile(times.strip!, 95).toFixed(2)} ms   ${(median('strip') / b).toFixed(1)} × baseline
  breed  40Ar 5 keV 250 A/cm²              median ${median('breed').toFixed(2)} ms   p95 ${percentile(times.breed!, 95).toFixed(2)} ms   ${(median('breed') / b).toFixed(1)} × baseline
  baseline GET /api/auth/me                median ${b.toFixed(2)} ms
  target: strip and breed medians < ${TARGET_MS} ms
  ${ok ? 'PASS' : 'FAIL'}`)
    return ok ? 0 : 1
  })
}

runBench(main)
