// `npm run bench:pages`: how soon the species look-up page is interactive in headless Chromium on
// loopback — on a first load of /species?q=… (server render, then hydration) and for a subsequent
// look-up typed into the page. "Interactive" is: Vue has mounted and the result is on screen.
// Baseline in the same run: the sign-in page loaded to the same point (no data to fetch).
// Target: both under 1 s (median of the rounds).
import { chromium, type Page } from 'playwright-core'
import { percentile, runBench, withStack } from './lib/stack'

const ROUNDS = 10
const TARGET_MS = 1000
const FLAGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync']
const SPECIES = ['Fe XIV', 'Ni XIII', 'Ar 8+', 'Au 51+', 'U 60+', 'Ca 10+', 'Kr 9+', 'Xe 26+', 'O 5+', 'W 46+', 'Sn 40+']

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
      const med = (xs: number[]) => percentile(xs, 50)
      const ok = med(first) < TARGET_MS && med(next) < TARGET_MS
      console.log(`
Species look-up page in headless Chromium on loopback, ${ROUNDS} rounds (median / p90)
  first load to interactive      ${med(first).toFixed(0)} / ${percentile(first, 90).toFixed(0)} ms
  subsequent look-up             ${med(next).toFixed(0)} / ${percentile(next, 90).toFixed(0)} ms
  baseline: sign-in page         ${med(baseline).toFixed(0)} / ${percentile(baseline, 90).toFixed(0)} ms
  ratio first load / baseline    ${(med(first) / med(baseline)).toFixed(2)}
  target: both under ${TARGET_MS} ms   ${ok ? 'PASS' : 'FAIL'}`)
      return ok ? 0 : 1
    } finally {
      await browser.close()
    }
  })
}

runBench(main)
