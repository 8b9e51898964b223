import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core'
import { mkdirSync } from 'node:fs'
import path from 'node:path'
import { testBaseUrl } from './env'
import { DEMO, randomAddress, type RoleName } from './api'

// Flags that let Debian's Chromium run headless as root on a machine with no outside network.
const FLAGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync']

export const ARTIFACTS = path.resolve('tests/artifacts')

/** Launches headless Chromium from Debian's package. */
export function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: '/usr/bin/chromium', headless: true, args: FLAGS })
}

/** A fresh browser context (own cookies, own client address) at phone or desktop size. */
export async function newContext(browser: Browser, size: 'desktop' | 'phone' = 'desktop'): Promise<BrowserContext> {
  return browser.newContext({
    baseURL: testBaseUrl(),
    viewport: size === 'phone' ? { width: 390, height: 844 } : { width: 1280, height: 860 },
    deviceScaleFactor: 1,
    extraHTTPHeaders: { 'x-forwarded-for': randomAddress() },
  })
}

/** Waits until Vue has mounted (hydrated) the page, so clicks reach its handlers. */
export async function waitForApp(page: Page): Promise<void> {
  await page.waitForFunction(() => !!(document.querySelector('#__nuxt') as any)?.__vue_app__)
}

/** Signs in through the page as the demo person of `role`. */
export async function signInAs(page: Page, role: RoleName): Promise<void> {
  await page.goto('/sign-in')
  await waitForApp(page)
  await page.fill('#email', DEMO[role].email)
  await page.fill('#password', DEMO[role].password)
  await Promise.all([page.waitForURL((u) => !u.pathname.startsWith('/sign-in')), page.click('button[type=submit]')])
  await page.locator('[data-testid=signed-in-person], button[aria-controls=mobile-menu]').first().waitFor({ state: 'attached' })
}

/** Saves a full-page screenshot under tests/artifacts/ for a person to look at. */
export async function snap(page: Page, name: string): Promise<void> {
  mkdirSync(ARTIFACTS, { recursive: true })
  await page.screenshot({ path: path.join(ARTIFACTS, `${name}.png`), fullPage: true })
}
