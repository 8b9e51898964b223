import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import type { Browser } from 'playwright-core'
import { launch, newContext, signInAs, snap, waitForApp } from '../support/browser'
import { DEMO } from '../support/api'

let browser: Browser
beforeAll(async () => {
  browser = await launch()
})
afterAll(async () => {
  await browser?.close()
})

// What each role should find in the main navigation (DESIGN.md §2), as far as pages exist.
const NAV: Array<[string, string[], string[]]> = [
  ['manager', ['Overview', 'Samples', 'Species', 'Certificates', 'Scan', 'Audit trail', 'People', 'Jobs'], []],
  ['scientist', ['Overview', 'Samples', 'Species', 'Certificates'], ['Scan', 'Audit trail', 'People', 'Jobs']],
  ['technician', ['Overview', 'Samples', 'Species', 'Certificates', 'Scan'], ['Audit trail', 'People', 'Jobs']],
  ['auditor', ['Overview', 'Samples', 'Species', 'Certificates', 'Audit trail'], ['Scan', 'People', 'Jobs']],
]

describe('the shell, per role', () => {
  it.each(NAV)('%s signs in, sees the right navigation and signs out', async (role, shown, hidden) => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, role as keyof typeof DEMO)
    const nav = page.getByRole('navigation', { name: 'Main' })
    for (const label of shown) await expect(nav.getByRole('link', { name: label, exact: true }).count()).resolves.toBe(1)
    for (const label of hidden) await expect(nav.getByRole('link', { name: label, exact: true }).count()).resolves.toBe(0)
    await expect(page.getByTestId('signed-in-person').innerText()).resolves.toContain(DEMO[role as keyof typeof DEMO].name)
    await snap(page, `overview-${role}`)
    await page.getByRole('button', { name: 'Sign out' }).first().click()
    await page.waitForURL(/\/sign-in/)
    await page.goto('/')
    await page.waitForURL(/\/sign-in/)
    await context.close()
  })

  it('shows the error for a wrong password and stays on the sign-in page', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await page.goto('/sign-in')
    await waitForApp(page)
    await page.fill('#email', DEMO.manager.email)
    await page.fill('#password', 'definitely not it')
    await page.click('button[type=submit]')
    await expect(page.getByTestId('sign-in-error').innerText()).resolves.toMatch(/not right/)
    expect(new URL(page.url()).pathname).toBe('/sign-in')
    await snap(page, 'sign-in-error')
    await context.close()
  })

  it('keeps a scientist out of the People page with a plain explanation', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'scientist')
    await page.goto('/people')
    await expect(page.getByRole('heading', { level: 1 }).innerText()).resolves.toMatch(/Not part of your role/)
    await context.close()
  })

  it('shows a 404 page for an unknown address', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'technician')
    const res = await page.goto('/no/such/page')
    expect(res?.status()).toBe(404)
    await expect(page.getByRole('heading', { level: 1 }).innerText()).resolves.toMatch(/Nothing here/)
    await snap(page, 'not-found')
    await context.close()
  })

  it('works at phone width: the menu opens and offers the role\'s pages', async () => {
    const context = await newContext(browser, 'phone')
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.getByRole('button', { name: 'Menu' }).click()
    const menu = page.locator('#mobile-menu')
    await expect(menu.getByRole('link', { name: 'People' }).isVisible()).resolves.toBe(true)
    await snap(page, 'phone-menu')
    await context.close()
  })

  it('lets a manager invite from the People page', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto('/people')
    await waitForApp(page)
    await page.fill('#invite-name', 'Rui Castellan')
    const email = `rui-${Date.now()}@larchmere-lab.example`
    await page.fill('#invite-email', email)
    await page.selectOption('#invite-role', 'technician')
    await page.getByRole('button', { name: 'Send invitation' }).click()
    await expect(page.getByTestId('people-notice').innerText()).resolves.toMatch(/Invitation sent/)
    await snap(page, 'people')
    // inviting the same person again says so and offers to send again
    await page.fill('#invite-name', 'Rui Castellan')
    await page.fill('#invite-email', email)
    await page.getByRole('button', { name: 'Send invitation' }).click()
    await expect(page.getByTestId('people-offer').innerText()).resolves.toMatch(/is already invited, since \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/)
    await snap(page, 'people-already-invited')
    await page.getByRole('button', { name: 'Send the invitation again' }).click()
    await expect(page.getByTestId('people-notice').innerText()).resolves.toMatch(/A new invitation was sent/)
    await context.close()
  })
})
