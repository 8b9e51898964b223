import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { randomUUID } from 'node:crypto'
import type { Browser, Page } from 'playwright-core'
import { launch, newContext, signInAs, snap, waitForApp } from '../support/browser'
import { unique } from '../support/api'

let browser: Browser
beforeAll(async () => {
  browser = await launch()
})
afterAll(async () => {
  await browser?.close()
})

const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n', 'latin1')

async function component(page: Page, index: number, z: string, massNumber: string, fraction: string, enrichment?: string) {
  const row = page.getByTestId(`component-${index}`)
  await row.locator('select').nth(0).selectOption(z)
  await row.locator('select').nth(1).selectOption(massNumber)
  await row.getByLabel(/fraction$/i).first().fill(fraction)
  if (enrichment) await row.getByLabel('Enrichment %').fill(enrichment)
}

describe('the sample registry in the browser', () => {
  const tag = unique()
  let samplePath = ''

  it('lets a manager register a sample with two isotopic components, showing errors beside the fields', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto('/samples/new')
    await waitForApp(page)
    await page.fill('#s-name', `Nickel pair ${tag}`)
    await page.fill('#s-material', 'Nickel metal, 58Ni and 60Ni')
    await page.fill('#s-formula', 'Ni')
    await component(page, 0, '28', '58', '0.7', '99.3')
    await page.getByTestId('add-component').click()
    await expect(page.evaluate(() => document.activeElement?.closest('[data-testid=component-1]') !== null)).resolves.toBe(true)
    await component(page, 1, '28', '60', '0.2')
    await page.fill('#s-areal', '500')
    await page.fill('#s-areal-u', '15')
    await page.fill('#s-rho', '8.908')
    await page.fill('#s-hazards', 'H317 H999')
    await page.getByRole('button', { name: 'Register sample' }).click()
    await page.getByText(/The fractions add up to 0\.9000/).waitFor({ timeout: 5_000 })
    await page.getByText(/"H999" is not a GHS hazard statement code/).waitFor({ timeout: 5_000 })
    // A named isotope without enrichment or analysis is an error, not 100 %.
    await page.getByText(/Give the enrichment of 60Ni/).waitFor({ timeout: 5_000 })
    expect(new URL(page.url()).pathname).toBe('/samples/new')
    await snap(page, 'sample-form-errors')

    await page.getByTestId('component-1').getByLabel(/fraction$/i).first().fill('0.3')
    // The second component gets the supplier's full analysis instead, typed from the keyboard.
    await page.getByTestId('component-1-analysis-mode').check()
    const lines: [string, string, string][] = [['60', '99.2', '0.1'], ['58', '0.8', '0.1']]
    for (const [i, [a, p, u]] of lines.entries()) {
      await page.getByTestId('component-1').getByRole('button', { name: 'Add an isotope' }).click()
      await expect.poll(() => page.evaluate(() => document.activeElement?.id ?? '')).toMatch(/-a\d+$/)
      await page.getByLabel(`Isotope of line ${i + 1}`).selectOption(a)
      await page.getByLabel(`Atom % of line ${i + 1}`).fill(p)
      await page.getByLabel(`Uncertainty in % of line ${i + 1}`).fill(u)
    }
    await page.fill('#s-hazards', 'H317 H351 H372')
    await expect(page.getByTestId('fraction-sum').innerText()).resolves.toContain('1.0000')
    await snap(page, 'sample-form')
    await Promise.all([page.waitForURL(/\/samples\/[0-9a-f-]{36}$/), page.getByRole('button', { name: 'Register sample' }).click()])
    samplePath = new URL(page.url()).pathname
    await expect(page.getByTestId('sample-code').innerText()).resolves.toMatch(/^S-\d{4}-\d{6}$/)
    const isotopes = await page.getByTestId('isotopes-table').innerText()
    expect(isotopes).toContain('⁵⁸Ni')
    expect(isotopes).toContain('⁶⁰Ni')
    // Rounded to the uncertainty: two significant digits of u, the value to the same place.
    expect(isotopes).toMatch(/\d+\.\d+ ± 0\.\d{2,} %/)
    await expect(page.getByTestId('analysis-table').innerText()).resolves.toContain('99.20 ± 0.10 %')
    await snap(page, 'sample-page-analysis')
    await expect(page.getByTestId('mean-mass').innerText()).resolves.toMatch(/^58\.\d+ ± 0\.\d+ u$/)
    await context.close()
  })

  it('shows a manager the radioactive sources and takes a licence limit', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto('/inventory')
    await waitForApp(page)
    await expect(page.getByText(/radiation protection officer and local regulations decide/).count()).resolves.toBe(1)
    await page.fill('#l-nuclide', '252Cf')
    await page.fill('#l-limit', '1e6')
    await page.getByRole('button', { name: 'Set the limit' }).click()
    await page.getByText('The limit is set.').waitFor({ timeout: 5_000 })
    await expect(page.getByTestId('licence-limits').innerText()).resolves.toMatch(/Cf-252\s+the whole laboratory: 1 × 10⁶ Bq/)
    await expect(page.getByTestId('inventory-lab').innerText()).resolves.toContain('Cf-252')
    await snap(page, 'inventory')
    await context.close()
  })

  it('uploads a datasheet with a progress bar that runs to the end', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto(samplePath)
    await waitForApp(page)
    await page.setInputFiles('#datasheet-file', { name: `coa-${tag}.pdf`, mimeType: 'application/pdf', buffer: PDF })
    await page.getByRole('button', { name: 'Upload' }).click()
    await page.waitForSelector('[data-testid=upload-progress][aria-valuenow="100"]')
    await expect(page.getByTestId('upload-message').innerText()).resolves.toContain('is stored')
    await expect(page.getByTestId('datasheet-list').innerText()).resolves.toContain(`coa-${tag}.pdf`)
    // The history reloads after the list: wait for it rather than read it at once.
    await page.getByTestId('history').getByText('Datasheet added').waitFor()
    await snap(page, 'sample-page-desktop')
    await context.close()
  })

  it('finds the sample by search in the list', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto('/samples')
    await waitForApp(page)
    await snap(page, 'samples-list-desktop')
    await page.getByTestId('sample-search').fill(`pair ${tag}`)
    await page.waitForFunction(() => document.querySelector('[data-testid=row-count]')?.textContent?.trim() === '1–1 of 1')
    await page.waitForURL((u) => u.searchParams.get('q') === `pair ${tag}`)
    await page.getByRole('link', { name: /^S-\d{4}-\d{6}$/ }).click()
    await page.waitForURL((u) => u.pathname === samplePath)
    await page.goto(`/samples?q=${encodeURIComponent(`no such thing ${tag}`)}`)
    await expect(page.getByTestId('empty-state').innerText()).resolves.toContain('No sample matches')
    await context.close()
  })

  it('shows a technician everything and no edit controls', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'technician')
    await page.goto(samplePath)
    await waitForApp(page)
    await expect(page.getByTestId('sample-code').isVisible()).resolves.toBe(true)
    await expect(page.getByTestId('datasheet-list').innerText()).resolves.toContain(`coa-${tag}.pdf`)
    await expect(page.getByTestId('edit-sample').count()).resolves.toBe(0)
    await expect(page.getByTestId('retire-sample').count()).resolves.toBe(0)
    await expect(page.locator('#datasheet-file').count()).resolves.toBe(0)
    await page.goto('/samples')
    await waitForApp(page)
    await expect(page.getByRole('link', { name: 'Register a sample' }).count()).resolves.toBe(0)
    await expect(page.getByRole('link', { name: 'Import CSV' }).count()).resolves.toBe(0)
    await page.goto('/samples/new')
    await expect(page.getByRole('heading', { level: 1 }).innerText()).resolves.toMatch(/Not part of your role/)
    await context.close()
  })

  it('on a version clash shows the fields that differ and saves the choices against the new version', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto(`${samplePath}/edit`)
    await waitForApp(page)
    // another manager's save, made while this form is open: a note and a supplier
    const status = await page.evaluate(async (path) => {
      const current = await (await fetch(`/api${path}`)).json()
      return (await fetch(`/api${path}`, { method: 'PATCH', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ version: current.version, notes: 'Moved to drawer 2 by a colleague', supplier: 'Colleague Metals' }) })).status
    }, samplePath)
    expect(status).toBe(200)
    await page.fill('#s-name', `Nickel pair ${tag}, renamed`)
    await page.fill('#s-supplier', 'My Supplier Ltd')
    await page.getByRole('button', { name: 'Save changes' }).click()
    await page.getByTestId('clash').waitFor()
    expect(await page.getByTestId('clash').evaluate((el) => el.getBoundingClientRect().top >= 0 && el.getBoundingClientRect().top < window.innerHeight)).toBe(true)
    // Every field that differs, each with yours and theirs; only those.
    const fields = await page.locator('[data-clash]').evaluateAll((els) => els.map((e) => e.getAttribute('data-clash')))
    expect(fields.sort()).toEqual(['name', 'notes', 'supplier'])
    await expect(page.locator('[data-clash=name]').innerText()).resolves.toContain(`Nickel pair ${tag}, renamed`)
    // Defaults: what was changed here is kept, what only they changed is taken from them.
    await expect(page.getByTestId('keep-yours-name').isChecked()).resolves.toBe(true)
    await expect(page.getByTestId('keep-theirs-notes').isChecked()).resolves.toBe(true)
    await expect(page.getByTestId('keep-yours-supplier').isChecked()).resolves.toBe(true)
    await page.getByTestId('keep-theirs-supplier').check()
    await snap(page, 'sample-clash-merge-desktop')
    await Promise.all([page.waitForURL((u) => u.pathname === samplePath), page.getByTestId('clash-save').click()])
    await page.getByRole('heading', { level: 1, name: `Nickel pair ${tag}, renamed` }).waitFor()
    const saved = await page.evaluate(async (path) => (await fetch(`/api${path}`)).json(), samplePath)
    expect(saved).toMatchObject({ name: `Nickel pair ${tag}, renamed`, notes: 'Moved to drawer 2 by a colleague', supplier: 'Colleague Metals' })
    await expect(page.getByTestId('history').innerText()).resolves.toContain(`Nickel pair ${tag} → Nickel pair ${tag}, renamed`)
    await context.close()
  })

  it('shows the caution box of a radioactive sample, at desktop and phone width', async () => {
    for (const size of ['desktop', 'phone'] as const) {
      const context = await newContext(browser, size)
      const page = await context.newPage()
      await signInAs(page, 'scientist')
      await page.goto('/samples?hazard=radioactive&q=uranium')
      await waitForApp(page)
      await page.getByRole('link', { name: /^S-\d{4}-\d{6}$/ }).first().click()
      await page.waitForSelector('[data-testid=cautions]')
      await expect(page.locator('[data-caution=radioactive]').innerText()).resolves.toMatch(/radiation-protection officer/)
      await snap(page, `sample-radioactive-${size}`)
      if (size === 'phone') {
        await page.goto(samplePath)
        await waitForApp(page)
        await snap(page, 'sample-page-phone')
        await page.goto('/samples')
        await waitForApp(page)
        await snap(page, 'samples-list-phone')
      }
      await context.close()
    }
  })

  it('asks before retiring, and retires only when confirmed', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto(samplePath)
    await waitForApp(page)
    page.once('dialog', (d) => d.dismiss())
    await page.getByTestId('retire-sample').click()
    await expect(page.getByTestId('sample-code').isVisible()).resolves.toBe(true)
    await expect(page.getByText('Retired', { exact: true }).count()).resolves.toBe(0)
    let asked = ''
    page.once('dialog', (d) => {
      asked = d.message()
      void d.accept()
    })
    await page.getByTestId('retire-sample').click()
    await page.getByText('The sample is retired.').waitFor()
    expect(asked).toMatch(/^Retire S-\d{4}-\d{6}\?/)
    await expect(page.getByTestId('retire-sample').count()).resolves.toBe(0)
    await context.close()
  })

  it('answers a missing sample with the 404 page', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'auditor')
    const res = await page.goto(`/samples/${randomUUID()}`)
    expect(res?.status()).toBe(404)
    await expect(page.getByRole('heading', { level: 1 }).innerText()).resolves.toMatch(/Nothing here/)
    await context.close()
  })
})
