import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import type { Browser } from 'playwright-core'
import { launch, newContext, snap, waitForApp } from '../support/browser'

let browser: Browser
beforeAll(async () => {
  browser = await launch()
})
afterAll(async () => {
  await browser?.close()
})

// The reset page checks a new password in the browser before sending it (the same check the
// invitation page runs), and says what the server thinks of a link that is not valid.
describe('setting a new password from a reset link', () => {
  it('names a short or mistyped password beside the field, then the link the server refuses', async () => {
    const page = await (await newContext(browser, 'phone')).newPage()
    await page.goto('/reset-password/not-a-real-token')
    await waitForApp(page)
    await page.fill('#password', 'short')
    await page.fill('#confirm', 'short')
    await page.getByRole('button', { name: 'Set the password' }).click()
    await page.getByText(/Use at least \d+ characters/).waitFor()
    await page.fill('#password', 'a long enough passphrase')
    await page.fill('#confirm', 'a long enough passphrasf')
    await page.getByRole('button', { name: 'Set the password' }).click()
    await page.getByText('The two passwords differ').waitFor()
    await page.fill('#confirm', 'a long enough passphrase')
    await page.getByRole('button', { name: 'Set the password' }).click()
    await page.getByText('This link is not valid or was already used; ask for a new one').waitFor()
    expect(await page.getByTestId('reset-done').count()).toBe(0)
    await snap(page, 'reset-password-refused-phone')
  })
})
