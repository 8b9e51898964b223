import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import type { Browser } from 'playwright-core'
import { launch, newContext, signInAs, snap, waitForApp } from '../support/browser'
import { testBaseUrl } from '../support/env'

let browser: Browser
beforeAll(async () => {
  browser = await launch()
})
afterAll(async () => {
  await browser?.close()
})

const me = (secret: string) => fetch(`${testBaseUrl()}/api/auth/me`, { headers: { authorization: `Bearer ${secret}` } })

describe('programmatic access from the pages', () => {
  it('a scientist creates a token on the account page, sees the secret once, uses it and revokes it', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'scientist')
    await page.getByTestId('signed-in-person').getByRole('link').click()
    await page.waitForURL(/\/account$/)
    await waitForApp(page)
    await page.fill('#token-name', 'Analysis notebook')
    await page.selectOption('#token-scope', 'read')
    await page.getByRole('button', { name: 'Create token' }).click()
    const secret = (await page.getByTestId('token-secret').locator('code').first().innerText()).trim()
    expect(secret).toMatch(/^ionf_/)
    // The list refreshes after the secret is shown.
    await page.getByTestId('tokens-table').getByText('Analysis notebook').waitFor()
    await snap(page, 'account-token-created')
    expect((await me(secret)).status).toBe(200)

    page.once('dialog', (d) => d.accept())
    await page.getByRole('row', { name: /Analysis notebook/ }).getByRole('button', { name: 'Revoke' }).click()
    await page.getByTestId('tokens-notice').getByText(/is revoked/).waitFor()
    expect((await me(secret)).status).toBe(401)
    await page.reload()
    await waitForApp(page)
    await expect(page.getByTestId('token-secret').count()).resolves.toBe(0)
    await context.close()
  })

  it('a manager follows the background jobs, and everyone can read the API description', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Jobs', exact: true }).click()
    await page.waitForURL(/\/jobs$/)
    await expect(page.getByTestId('jobs-table').innerText()).resolves.toMatch(/SCF precompute[\s\S]*Daily notices/)
    await expect(page.getByTestId('precompute-progress').innerText()).resolves.toMatch(/species cached/)
    await snap(page, 'jobs')
    await page.goto('/api-docs')
    await waitForApp(page)
    const tokens = page.getByTestId('api-group-tokens')
    await tokens.locator('summary', { hasText: 'Create a personal API token' }).click()
    await expect(tokens.innerText()).resolves.toMatch(/expiresOn[\s\S]*201/)
    await snap(page, 'api-docs')
    await context.close()
  })
})
