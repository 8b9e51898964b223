// `npm run bench:pages`: how soon the species look-up page and the beam planner are interactive
// in headless Chromium on loopback — on a first load of /species?q=… or /beam?ion=…&… (server
// render, then hydration) and for a subsequent question typed into the page. "Interactive" is:
// Vue has mounted and the result is on screen (for /beam: the charge-state table and the
// breeding table). Baseline in the same run: the sign-in page loaded to the same point (no data
// to fetch). Target: every median under 1 s.
import { chromium, type Page } from 'playwright-core'
import { percentile, runBench, withStack } from './lib/stack'

const ROUNDS = 10
const TARGET_MS = 1000
const FLAGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync']
const SPECIES = ['Fe XIV', 'Ni XIII', 'Ar 8+', 'Au 51+', 'U 60+', 'Ca 10+', 'Kr 9+', 'Xe 26+', 'O 5+', 'W 46+', 'Sn 40+']
// Beam plans: ion, MeV/u, stripper, µg/cm²; each also breeds its element at 5 keV, 250 A/cm².
const PLANS = [
  ['208Pb27+', '4.2', 'C', '20'],
  ['48Ca10+', '5', 'C', '40'],
  ['238U28+', '11.4', 'C', '200'],
  ['40Ar8+', '1.5', 'C', '10'],
  ['58Ni9+', '3', 'Al', '100'],
  ['84Kr13+', '6', 'C', '50'],
  ['132Xe20+', '4', 'C', '30'],
] as const
const beamUrl = ([ion, energy, medium, ad]: (typeof PLANS)[number]) => `/beam?${new URLSearchParams({ ion, energy, unit: 'MeV/u', medium, ad, ee: '5000', j: '250' })}`

const mounted = (page: Page) => page.waitForFunction(() => !!(document.querySelector('#__nuxt') as any)?.__vue_app__)

async function main(): Promise<number> {
  return withStack(async ({ base, cookieOf }) => {
    const cookie = (await cookieOf('scientist')).split('=')
    const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', headless: true, args: FLAGS })
    try {
      const context = await browser.newContext({ baseURL: base })
      await context.addCookies([{ name: cookie[0]!, value: cookie.slice(1).join('='), url: base }])
      const page = await context.newPage()
      // Warm the server and the browser cache once, as a person's second visit would be.
      await page.goto(`/species?q=${encodeURIComponent('Fe')}`)
      await page.getByTestId('species-result').waitFor()

      const first: number[] = []
      const next: number[] = []
      const baseline: number[] = []
      for (let i = 0; i < ROUNDS; i++) {
        const anon = await browser.newContext({ baseURL: base })
        const p = await anon.newPage()
        let t = performance.now()
        await p.goto('/sign-in')
        await mounted(p)
        baseline.push(performance.now() - t)
        await anon.close()

        t = performance.now()
        await page.goto(`/species?q=${encodeURIComponent(SPECIES[i % SPECIES.length]!)}`)
        await mounted(page)
        await page.getByTestId('species-result').waitFor()
        first.push(performance.now() - t)

        const q = SPECIES[(i + 1) % SPECIES.length]!
        t = performance.now()
        await page.fill('#species-q', q)
        await page.getByRole('button', { name: 'Look up' }).click()
        await page.waitForFunction((want) => document.querySelector('[data-testid=species-title]')?.textContent?.includes(want), q.split(' ')[1] ?? q)
        next.push(performance.now() - t)
      }
      // The beam planner: the same two measures.
      await page.goto(beamUrl(PLANS[0]))
      await page.getByTestId('charge-table').waitFor()
      const beamFirst: number[] = []
      const beamNext: number[] = []
      for (let i = 0; i < ROUNDS; i++) {
        const plan = PLANS[(i + 1) % PLANS.length]!
        let t = performance.now()
        await page.goto(beamUrl(plan))
        await mounted(page)
        await page.getByTestId('charge-table').waitFor()
        await page.getByTestId('breed-table').waitFor()
        beamFirst.push(performance.now() - t)

        const [ion, energy] = PLANS[(i + 2) % PLANS.length]!
        t = performance.now()
        await page.fill('#beam-ion', ion)
        await page.fill('#beam-energy', energy)
        await page.getByTestId('beam-compute').click()
        await page.waitForFunction((want) => document.querySelector('[data-testid=beam-energy-forms]')?.textContent?.includes(want), ion.replace(/^\d+/, ''))
        beamNext.push(performance.now() - t)
      }
      const med = (xs: number[]) => percentile(xs, 50)
      const ok = [first, next, beamFirst, beamNext].every((xs) => med(xs) < TARGET_MS)
      console.log(`
Species look-up page in headless Chromium on loopback, ${ROUNDS} rounds (median / p90)
  first load to interactive      ${med(first).toFixed(0)} / ${percentile(first, 90).toFixed(0)} ms
  subsequent look-up             ${med(next).toFixed(0)} / ${percentile(next, 90).toFixed(0)} ms
  baseline: sign-in page         ${med(baseline).toFixed(0)} / ${percentile(baseline, 90).toFixed(0)} ms
  ratio first load / baseline    ${(med(first) / med(baseline)).toFixed(2)}
Beam planner (/beam with charge states, energy loss and charge breeding)
  first load to interactive      ${med(beamFirst).toFixed(0)} / ${percentile(beamFirst, 90).toFixed(0)} ms
  another plan typed in          ${med(beamNext).toFixed(0)} / ${percentile(beamNext, 90).toFixed(0)} ms
  ratio first load / baseline    ${(med(beamFirst) / med(baseline)).toFixed(2)}
  target: every median under ${TARGET_MS} ms   ${ok ? 'PASS' : 'FAIL'}`)
      return ok ? 0 : 1
    } finally {
      await browser.close()
    }
  })
}

runBench(main)
