import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import type { Browser, BrowserContext, ConsoleMessage, Page } from 'playwright-core'
import { launch, newContext, signInAs, snap, waitForApp } from '../support/browser'
import { signedIn, type Client } from '../support/api'

// Every page, at desktop and at phone width, loads without a warning or an error in the browser
// console (hydration mismatches show up there), without the page scrolling sideways, and leaves
// a screenshot in tests/artifacts/ to look at.
let browser: Browser
let manager: Client
const contexts: Partial<Record<'desktop' | 'phone', BrowserContext>> = {}
let pages: { name: string; path: string; anonymous?: boolean }[] = []

beforeAll(async () => {
  browser = await launch()
  manager = await signedIn('manager')
  const sample = (await manager.get('/api/samples?pageSize=1&sort=code')).body.items[0]
  const species = (await manager.post('/api/species', { species: 'Fe 13+' })).body
  const certs = (await manager.get('/api/certificates?pageSize=1')).body.items ?? []
  pages = [
    { name: 'overview', path: '/' },
    { name: 'samples', path: '/samples' },
    { name: 'sample', path: `/samples/${sample.id}` },
    { name: 'sample-edit', path: `/samples/${sample.id}/edit` },
    { name: 'sample-new', path: '/samples/new' },
    { name: 'sample-import', path: '/samples/import' },
    { name: 'places', path: '/samples/places' },
    { name: 'species-lookup', path: `/species?q=${encodeURIComponent('Fe13+')}` },
    { name: 'species-registry', path: '/species/registry' },
    { name: 'species-record', path: `/species/${species.id}` },
    { name: 'species-compare', path: `/species/compare?element=Fe&from=8&to=14` },
    // a stripper plan and a breeding run: both beam charts drawn
    { name: 'beam', path: '/beam?ion=208Pb27%2B&energy=4.2&unit=MeV%2Fu&medium=C&ad=20&ee=5000&j=250' },
    { name: 'certificates', path: '/certificates' },
    ...(certs[0] ? [{ name: 'certificate', path: `/certificates/${certs[0].id}` }, { name: 'verify', path: `/verify/${certs[0].number}`, anonymous: true }] : []),
    { name: 'scan', path: '/scan' },
    { name: 'bench-card', path: `/scan/${sample.code}` },
    { name: 'checkouts', path: '/checkouts?scope=open' },
    { name: 'audit', path: '/audit' },
    { name: 'people', path: '/people' },
    { name: 'sign-in', path: '/sign-in', anonymous: true },
  ]
  for (const size of ['desktop', 'phone'] as const) {
    const context = await newContext(browser, size)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.close()
    contexts[size] = context
  }
})
afterAll(async () => {
  await browser?.close()
})

async function visit(page: Page, path: string): Promise<string[]> {
  const heard: string[] = []
  const listen = (m: ConsoleMessage) => {
    if (m.type() === 'error' || m.type() === 'warning') heard.push(`${m.type()}: ${m.text()}`)
  }
  page.on('console', listen)
  page.on('pageerror', (e) => heard.push(`pageerror: ${e.message}`))
  await page.goto(path)
  await waitForApp(page)
  // Hydration warnings come while the app mounts; charts and late fetches a moment after.
  await page.waitForLoadState('networkidle')
  await page.waitForTimeout(300)
  return heard
}

describe.each(['desktop', 'phone'] as const)('every page at %s width', (size) => {
  it('loads with a clean console and no sideways scrolling', async () => {
    const problems: string[] = []
    for (const p of pages) {
      const context = p.anonymous ? await newContext(browser, size) : contexts[size]!
      const page = await context.newPage()
      const heard = await visit(page, p.path)
      problems.push(...heard.map((h) => `${p.name}: ${h}`))
      const sideways = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)
      if (sideways > 1) problems.push(`${p.name}: the page scrolls ${sideways} px sideways`)
      await snap(page, `page-${p.name}-${size}`)
      await page.close()
      if (p.anonymous) await context.close()
    }
    expect(problems).toEqual([])
  }, 240_000)
})

// The People table used to be rendered in the browser only, to hide a hydration mismatch (its
// actions column had an empty header, which the browser's render holds as an empty text node
// that the server's HTML cannot carry). It now comes from the server and must hydrate cleanly.
describe('the People table', () => {
  it('comes rendered in the server\'s HTML and hydrates without a mismatch', async () => {
    const page = await contexts.desktop!.newPage()
    const html = await (await page.request.get('/people')).text()
    expect(html).toMatch(/<table class="data-table"/)
    expect(html).toContain('aria-label="Role of ')
    const heard = await visit(page, '/people')
    expect(heard).toEqual([])
    // the actions column's header has words (for screen readers), never an empty string
    expect(html).toContain('<span class="sr-only">Actions</span>')
    // the rows the server sent are still there once the browser has taken over
    await expect(page.locator('select[aria-label^="Role of "]').count()).resolves.toBeGreaterThan(0)
    await page.close()
  })
})
