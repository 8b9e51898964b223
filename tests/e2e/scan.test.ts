import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { readFileSync } from 'node:fs'
import type { Browser, Page } from 'playwright-core'
import { launch, newContext, signInAs, snap, waitForApp } from '../support/browser'
import { signedIn, unique, type Client } from '../support/api'
import { createSample } from '../support/samples'
import { pdfPages, renderPages } from '../support/pdf'

let browser: Browser
let manager: Client
let technician: Client
let places: { id: string; path: string; name: string }[]
beforeAll(async () => {
  browser = await launch()
  manager = await signedIn('manager')
  technician = await signedIn('technician')
  places = (await technician.get('/api/locations')).body.items
})
afterAll(async () => {
  await browser?.close()
})

const noSideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)

describe('scanning a label on a phone', () => {
  it('reads a photo of a label, opens the bench card and moves the sample', async () => {
    const sample = await createSample(manager, { name: `Scanned foil ${unique()}`, locationId: places[0]!.id, massMg: 4, hazardStatements: 'H317 H351 H372' })
    // The photo: the single label as the label printer would print it, rendered at 200 dpi.
    const label = await technician.post('/api/labels', { sampleIds: [sample.id], layout: 'single', allowLoopback: true })
    expect(label.status).toBe(200)
    const [photo] = await renderPages(label.body as Buffer, 200)

    const context = await newContext(browser, 'phone')
    const page = await context.newPage()
    await signInAs(page, 'technician')
    await page.goto('/scan')
    await waitForApp(page)
    await expect(noSideways(page)).resolves.toBe(true)
    await snap(page, 'scan-phone')
    await Promise.all([page.waitForURL(`**/scan/${sample.code}`), page.getByTestId('scan-photo').setInputFiles(photo!)])
    await page.getByTestId('bench-card').waitFor()
    await expect(page.getByTestId('bench-code').innerText()).resolves.toBe(sample.code)
    await expect(page.getByTestId('bench-place').innerText()).resolves.toBe(places[0]!.path)
    await expect(page.locator('[data-caution=toxic]').count()).resolves.toBe(1)
    await expect(noSideways(page)).resolves.toBe(true)
    await snap(page, 'bench-card-phone')

    const to = places[2]!
    await page.getByTestId('action-move').click()
    await page.getByTestId('act-place').selectOption(to.id)
    await snap(page, 'bench-move-form-phone')
    await page.getByTestId('act-save').click()
    await page.getByTestId('bench-notice').getByText('Moved.').waitFor()
    await expect(page.getByTestId('bench-place').innerText()).resolves.toBe(to.path)
    await expect(page.getByTestId('bench-events').innerText()).resolves.toContain(to.path)
    const after = (await technician.get(`/api/samples/${sample.id}`)).body
    expect(after).toMatchObject({ locationId: to.id, version: 2 })

    await page.getByTestId('action-check-out').click()
    // To a person of the lab, found by typing part of the name in the searchable select.
    await page.getByTestId('act-person-filter').fill('vella')
    await expect(page.getByTestId('act-person').inputValue()).resolves.not.toBe('')
    await expect(page.locator('[data-testid=act-person] option:checked').innerText()).resolves.toBe('Tobias Vellacott')
    await page.getByTestId('act-run').fill('Beam time 26-41')
    await snap(page, 'bench-checkout-form-phone')
    await page.getByTestId('act-save').click()
    await page.getByTestId('bench-checkout').waitFor()
    await expect(page.getByTestId('bench-checkout').innerText()).resolves.toContain('Tobias Vellacott')
    await page.getByTestId('action-consume').click()
    await page.getByTestId('act-amount').fill('1,5')
    await expect(page.getByTestId('action-form').innerText()).resolves.toContain('2.5 mg will be left.')
    await page.getByTestId('act-save').click()
    await page.getByTestId('bench-notice').getByText('Use recorded.').waitFor()
    await expect(page.getByTestId('bench-mass').innerText()).resolves.toBe('2.5 mg')
    await snap(page, 'bench-card-after-phone')

    // More than is left: said in the form, with what is left, and nothing changes.
    await page.getByTestId('action-consume').click()
    await page.getByTestId('act-amount').fill('3.1')
    await page.getByTestId('act-save').click()
    await page.getByRole('alert').filter({ hasText: 'Only 2.5 mg left' }).first().waitFor()
    await expect(page.getByRole('alert').filter({ hasText: 'Only 2.5 mg left' }).count()).resolves.toBe(1)

    // "My check-outs": the check-out the technician made, with its holder and due day.
    await page.goto('/checkouts?scope=mine')
    await waitForApp(page)
    const mine = page.getByTestId('checkout-item').filter({ hasText: sample.code })
    await expect(mine.innerText()).resolves.toContain('Tobias Vellacott')
    await expect(noSideways(page)).resolves.toBe(true)
    await snap(page, 'checkouts-mine-phone')
    await context.close()
  })

  it('lists every code in a photo of a whole label sheet and opens the one picked', async () => {
    const chosen = (await technician.get('/api/samples?pageSize=30&sort=code')).body.items.slice(0, 12)
    const sheet = await technician.post('/api/labels', { sampleIds: chosen.map((s: any) => s.id), layout: 'sheet', allowLoopback: true })
    const [photo] = await renderPages(sheet.body as Buffer, 150)
    const context = await newContext(browser, 'phone')
    const page = await context.newPage()
    await signInAs(page, 'technician')
    await page.goto('/scan')
    await waitForApp(page)
    await page.getByTestId('scan-photo').setInputFiles(photo!)
    await page.getByTestId('scan-choices').waitFor({ timeout: 45_000 })
    const listed = await page.getByTestId('scan-choice').allInnerTexts()
    expect(listed.sort()).toEqual(chosen.map((s: any) => s.code).sort())
    await snap(page, 'scan-several-codes-phone')
    await Promise.all([page.waitForURL(`**/scan/${chosen[4].code}`), page.getByTestId('scan-choice').filter({ hasText: chosen[4].code }).click()])
    await page.getByTestId('bench-card').waitFor()
    await context.close()
  })

  it('opens a typed code with the keyboard alone, and says when a code is not one', async () => {
    const sample = await createSample(manager, { name: `Typed foil ${unique()}` })
    const context = await newContext(browser, 'phone')
    const page = await context.newPage()
    await signInAs(page, 'technician')
    await page.goto('/scan')
    await waitForApp(page)
    await page.getByTestId('scan-code').fill('X-12')
    await page.getByTestId('scan-code').press('Enter')
    await expect(page.getByTestId('scan-problem').innerText()).resolves.toMatch(/"X-12" is not a sample code/)
    // A well-formed code that names no sample: what was read, and a way to type it again.
    await page.getByTestId('scan-code').fill('S-2026-999999')
    await Promise.all([page.waitForURL('**/scan/S-2026-999999'), page.getByTestId('scan-code').press('Enter')])
    await expect(page.getByTestId('bench-unknown-read').innerText()).resolves.toBe('S-2026-999999')
    await Promise.all([page.waitForURL('**/scan?typed=*'), page.getByTestId('bench-type-again').click()])
    await expect(page.getByTestId('scan-code').inputValue()).resolves.toBe('S-2026-999999')
    await page.getByTestId('scan-code').fill(sample.code.replace(/-0+/, '-'))
    await Promise.all([page.waitForURL(`**/scan/${sample.code}`), page.getByTestId('scan-code').press('Enter')])
    await page.getByTestId('bench-card').waitFor()
    await context.close()
  })

  it('shows the scan page and the bench card at desktop width too, and read-only to a scientist', async () => {
    const sample = await createSample(manager, { name: `Desk foil ${unique()}`, locationId: places[1]!.id })
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto('/scan')
    await waitForApp(page)
    await snap(page, 'scan-desktop')
    await page.goto(`/scan/${sample.code}`)
    await waitForApp(page)
    await snap(page, 'bench-card-desktop')
    await context.close()

    const sci = await newContext(browser, 'phone')
    const sp = await sci.newPage()
    await signInAs(sp, 'scientist')
    await sp.goto(`/scan/${sample.code}`)
    await waitForApp(sp)
    await sp.getByTestId('bench-card').waitFor()
    await expect(sp.getByTestId('action-move').count()).resolves.toBe(0)
    await sp.goto('/scan')
    await expect(sp.getByRole('heading', { level: 1 }).innerText()).resolves.toMatch(/Not part of your role/)
    await sci.close()
  })
})

describe('printing labels from the lists', () => {
  it('lets a technician tick samples and download their labels', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'technician')
    await page.goto('/samples')
    await waitForApp(page)
    const boxes = page.getByTestId('choose-sample')
    await boxes.nth(0).check()
    await boxes.nth(1).check()
    await expect(page.getByTestId('print-labels').innerText()).resolves.toBe('Print labels (2)')
    await page.getByTestId('label-layout').selectOption('single')
    await snap(page, 'samples-list-labels-desktop')
    // The test server's public address is a loopback one: the page warns before printing.
    await page.getByTestId('print-labels').click()
    await page.getByTestId('labels-loopback').waitFor()
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('print-labels-anyway').click()])
    expect((await pdfPages(readFileSync((await download.path())!))).pages).toBe(2)
    await context.close()
  })
})
