import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { writeFileSync, mkdirSync } from 'node:fs'
import path from 'node:path'
import type { Browser, Page } from 'playwright-core'
import { ARTIFACTS, launch, newContext, signInAs, snap, waitForApp } from '../support/browser'
import { signedIn, unique, DEMO, type Client } from '../support/api'
import { createSample } from '../support/samples'

let browser: Browser
let manager: Client
beforeAll(async () => {
  browser = await launch()
  manager = await signedIn('manager')
})
afterAll(async () => {
  await browser?.close()
})

/** Collects Content-Security-Policy violations the page reports (console and DOM events). */
function watchCsp(page: Page): string[] {
  const seen: string[] = []
  page.on('console', (m) => {
    if (/Content Security Policy|Refused to (execute|load|apply)/i.test(m.text())) seen.push(m.text())
  })
  return seen
}

describe('an auditor reads a sample’s whole story', () => {
  it('opens the full history from the sample page and reads it as sentences', async () => {
    const tag = unique()
    const sample = await createSample(manager, { name: `Nickel foil ${tag}` })
    expect((await manager.patch(`/api/samples/${sample.id}`, { version: 1, name: `Nickel foil ${tag} rolled`, massMg: 12.5 })).status).toBe(200)
    expect((await manager.post(`/api/samples/${sample.id}/custody`, { action: 'condition', version: 2, note: 'Edges slightly curled' })).status).toBe(201)

    const context = await newContext(browser)
    const page = await context.newPage()
    const csp = watchCsp(page)
    await signInAs(page, 'auditor')
    await page.goto(`/samples/${sample.id}`)
    await waitForApp(page)
    await Promise.all([page.waitForURL(/\/audit\?/), page.getByTestId('full-history').click()])
    await page.getByTestId('audit-record').waitFor()
    const table = page.locator('table')
    await table.getByText('noted the condition of').waitFor()
    const text = await table.innerText()
    expect(text).toContain(`${DEMO.manager.name} changed sample ${sample.code} Nickel foil ${tag} rolled`)
    expect(text).toContain(`${DEMO.manager.name} registered sample ${sample.code}`)
    expect(text).toMatch(/name: Nickel foil \S+ → Nickel foil \S+ rolled/)
    expect(text).toMatch(/mass \(mg\): — → 12\.5/)
    expect(text).toMatch(/\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/)
    expect(text).not.toContain('{"')
    // the record's link leads back to the sample
    await expect(table.getByRole('link', { name: `sample ${sample.code} Nickel foil ${tag} rolled` }).first().getAttribute('href')).resolves.toBe(`/samples/${sample.id}`)
    await snap(page, 'audit-sample-history')

    // export the story and check the file in the page: intact, then altered
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByText('Export CSV').click()])
    const file = await download.path()
    await page.getByTestId('audit-verify-file').setInputFiles(file!)
    await expect(page.getByTestId('audit-verify-result').innerText()).resolves.toMatch(/complete and unaltered: 3 rows/)
    const { readFileSync } = await import('node:fs')
    const altered = readFileSync(file!, 'utf8').replace('sample.custody.condition', 'sample.custody.moved')
    mkdirSync(ARTIFACTS, { recursive: true })
    const alteredPath = path.join(ARTIFACTS, 'audit-altered.csv')
    writeFileSync(alteredPath, altered)
    await page.getByTestId('audit-verify-file').setInputFiles(alteredPath)
    await expect(page.getByTestId('audit-verify-result').innerText()).resolves.toMatch(/not the file exported: line \d+\. This row was changed/)
    await snap(page, 'audit-verify-altered')
    expect(csp).toEqual([])
    await context.close()
  })
})
