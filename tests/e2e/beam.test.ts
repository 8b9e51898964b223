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

describe('beam planning page', () => {
  it('a scientist plans 208Pb through a carbon foil from the stock and saves the plan', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'scientist')
    await page.goto('/beam')
    await waitForApp(page)
    await page.fill('#beam-ion', '208Pb27+')
    await page.fill('#beam-energy', '4.2')
    // The demo stock's 20 µg/cm² carbon stripper foil fills in the medium and the areal density.
    const foil = page.getByTestId('foil-select')
    const value = await foil.locator('option', { hasText: 'C 20 µg/cm²' }).first().getAttribute('value')
    await foil.selectOption(value!)
    await expect(page.inputValue('#beam-medium')).resolves.toBe('C')
    await expect(page.inputValue('#beam-ad')).resolves.toBe('20')
    await page.fill('#beam-ee', '5000')
    await page.fill('#beam-j', '250')
    await page.getByTestId('beam-compute').click()
    await page.getByTestId('charge-table').waitFor()
    const url = new URL(page.url())
    expect(url.searchParams.get('ion')).toBe('208Pb27+')
    expect(url.searchParams.get('foil')).toBe(value)
    const table = await page.getByTestId('charge-table').innerText()
    expect(table).toContain('54+')
    expect(table).toContain('Schiwietz–Grande 2001')
    expect(table).toContain('Schiwietz et al. 2004')
    await expect(page.getByTestId('beam-loss').innerText()).resolves.toMatch(/MeV .* in 20 µg\/cm²/)
    await page.getByTestId('breed-table').waitFor()
    await page.getByLabel('Choose 54+').check()
    // Samples enriched in 208Pb come first (other tests may have added some); the demo stock's
    // 208Pb target is among them, with its cautions.
    const sources = page.getByTestId('beam-sources')
    await expect(sources.locator('li').first().innerText()).resolves.toMatch(/208: [\d.]+ % enriched/)
    await expect(sources.locator('li', { hasText: '208Pb target' }).first().innerText()).resolves.toMatch(/208: 98\.7 % enriched[\s\S]*Toxic/)
    const source = await page.locator('#plan-source option', { hasText: '208Pb target' }).first().getAttribute('value')
    await page.selectOption('#plan-source', source!)
    await page.fill('#plan-title', 'Pb54+ for the test run')
    await page.getByTestId('beam-save-button').click()
    await page.getByRole('link', { name: 'Pb54+ for the test run' }).first().waitFor()
    await page.waitForTimeout(500)
    await snap(page, 'beam-scientist-saved')
    await page.getByRole('link', { name: 'Pb54+ for the test run' }).first().click()
    await page.getByTestId('plan-summary').waitFor()
    const summary = await page.getByTestId('plan-summary').innerText()
    expect(summary).toContain('54+')
    expect(summary.match(/S-\d{4}-\d{6}/g)).toHaveLength(2) // the foil and the sample to pull
    await page.getByTestId('beam-rerun').click()
    await page.getByTestId('rerun-same').waitFor()
    await snap(page, 'beam-plan-page')
    // The foil's own page lists the plans that use it.
    await page.goto(`/samples/${value}`)
    await page.getByText('Plans that use this foil').waitFor()
    await expect(page.getByTestId('beam-plans').innerText()).resolves.toContain('Pb54+ for the test run')
    await context.close()
  })

  it('a technician reads a shared plan at phone width but is not offered saving', async () => {
    const context = await newContext(browser, 'phone')
    const page = await context.newPage()
    await signInAs(page, 'technician')
    await page.goto('/beam?ion=208Pb27%2B&energy=4.2&unit=MeV%2Fu&medium=C&ad=20&ee=5000&j=250')
    await waitForApp(page)
    await page.getByTestId('charge-table').waitFor()
    expect(await page.getByTestId('beam-save').count()).toBe(0)
    await expect(page.getByText('Scientists and lab managers save plans').isVisible()).resolves.toBe(true)
    await page.waitForTimeout(500)
    await snap(page, 'beam-technician-phone')
    await context.close()
  })

  it('a gas stripper keeps a column for the solid-only 2004 formula, marked not applicable, and says why', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'scientist')
    await page.goto('/beam?ion=12C1-&energy=0.21&unit=MeV%2Fu&medium=Ar&gas=true')
    await waitForApp(page)
    const table = await page.getByTestId('charge-table').innerText()
    expect(table).toContain('Schiwietz et al. 2004')
    expect(table).toContain('n/a')
    expect(table).not.toMatch(/NaN/)
    await expect(page.getByTestId('charge-table-not-applicable').innerText()).resolves.toMatch(/solid strippers only/)
    await snap(page, 'beam-gas-stripper')
    await context.close()
  })
})
