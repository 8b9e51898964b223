import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import type { Browser } from 'playwright-core'
import { launch, newContext, signInAs, snap, waitForApp } from '../support/browser'

let browser: Browser
beforeAll(async () => {
  browser = await launch()
})
afterAll(async () => {
  await browser?.close()
})

describe('species look-up page', () => {
  it('looks up Fe XIV from the input, keeps the query in the URL and shows configuration, term and energies', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'scientist')
    await page.goto('/species')
    await waitForApp(page)
    await page.fill('#species-q', 'Fe XIV')
    await page.getByRole('button', { name: 'Look up' }).click()
    await page.getByTestId('species-result').waitFor()
    expect(new URL(page.url()).searchParams.get('q')).toBe('Fe XIV')
    // Fe XIV is Al-like: [Ne] 3s2 3p 2P°1/2 (NIST ASD ground level, via Debian python3-pymatgen for
    // the isoelectronic neutral Al and the engine's own tests).
    await expect(page.getByTestId('core-configuration').innerText()).resolves.toBe('[Ne] 3s2 3p1')
    await expect(page.getByTestId('ground-term').locator('[aria-label]').getAttribute('aria-label')).resolves.toBe('term 2P°1/2')
    const table = await page.getByTestId('ionisation-table').innerText()
    // Reference ionisation energy of Fe XIV: 392.2 eV (NIST ASD via pymatgen).
    expect(table).toContain('392.2')
    expect(table).toContain('slater-hydrogenic')
    await page.waitForTimeout(300)
    await snap(page, 'species-fe14-desktop')
    await context.close()
  })

  it('shows the parser\'s message in the page for a species beyond the bare nucleus', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'technician')
    await page.goto('/species?q=' + encodeURIComponent('Fe 27+'))
    await expect(page.getByTestId('species-error').innerText()).resolves.toMatch(/beyond the bare nucleus/)
    await snap(page, 'species-error')
    await context.close()
  })

  it('works at phone width from a shared link', async () => {
    const context = await newContext(browser, 'phone')
    const page = await context.newPage()
    await signInAs(page, 'scientist')
    await page.goto('/species?q=' + encodeURIComponent('U'))
    await page.getByTestId('species-result').waitFor()
    await page.waitForTimeout(500)
    await snap(page, 'species-u-phone')
    await context.close()
  })
})

describe('recording a species and linking a sample', () => {
  it('a scientist records Ni XIII from the look-up and links a nickel sample from its page', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'scientist')
    await page.goto('/species?q=' + encodeURIComponent('Ni XIII'))
    await waitForApp(page)
    await page.getByTestId('record-species').click()
    await page.waitForURL(/\/species\/[0-9a-f-]{36}$/)
    await expect(page.getByTestId('result-history').innerText()).resolves.toMatch(/engine \d+\.\d+\.\d+/)
    await waitForApp(page)
    await page.locator('input[name=link-sample]').first().check()
    await page.getByTestId('link-sample').click()
    await page.getByTestId('linked-samples').waitFor()
    await expect(page.getByTestId('linked-samples').locator('li').count()).resolves.toBeGreaterThan(0)
    await snap(page, 'species-record-desktop')
    await context.close()
  })

  it('a technician can look up but is offered no recording', async () => {
    const context = await newContext(browser, 'phone')
    const page = await context.newPage()
    await signInAs(page, 'technician')
    await page.goto('/species?q=' + encodeURIComponent('Ni 2+'))
    await page.getByTestId('species-result').waitFor()
    await expect(page.getByTestId('record-species').count()).resolves.toBe(0)
    await page.goto('/species/registry')
    await page.getByTestId('row-count').waitFor()
    await snap(page, 'species-registry-phone')
    await context.close()
  })
})
