import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import { readFileSync } from 'node:fs'
import type { Browser, Page } from 'playwright-core'
import { launch, newContext, signInAs, snap, waitForApp } from '../support/browser'
import { signedIn, unique, type Client } from '../support/api'
import { waitForMail } from '../support/mail'
import { pdfText } from '../support/pdf'
import { certifiableSample, pdfOf } from '../support/certificates'

let browser: Browser
let manager: Client
beforeAll(async () => {
  browser = await launch()
  manager = await signedIn('manager')
})
afterAll(async () => {
  await browser?.close()
})

describe('certificates in the browser', () => {
  const tag = unique()
  let sample: any
  let cert: { id: string; number: string; sha256: string }

  it('lets a manager issue a certificate from the sample page', async () => {
    sample = await certifiableSample(manager, { name: `Żółć nickel-58 foil ${tag}` })
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto(`/samples/${sample.id}`)
    await waitForApp(page)
    let asked = ''
    page.once('dialog', (d) => {
      asked = d.message()
      void d.accept()
    })
    await page.getByTestId('issue-certificate').click()
    await page.getByTestId('certificate-notice').getByText(/is issued/).waitFor()
    expect(asked).toMatch(/never changes/)
    await expect(page.getByTestId('subject-certificates').innerText()).resolves.toMatch(/C-\d{4}-\d{6}/)
    await expect(page.getByTestId('issue-certificate').count()).resolves.toBe(0)
    await snap(page, 'sample-page-certificate-desktop')
    await page.getByTestId('certificate-notice').getByRole('link', { name: 'Open it' }).click()
    await page.waitForURL(/\/certificates\/[0-9a-f-]{36}$/)
    await waitForApp(page)
    const id = new URL(page.url()).pathname.split('/').pop()!
    cert = (await manager.get(`/api/certificates/${id}`)).body
    await expect(page.getByTestId('content-digest').innerText()).resolves.toBe(cert.sha256)
    await snap(page, 'certificate-page-manager-desktop')
    await page.goto('/')
    await waitForApp(page)
    await expect(page.getByTestId('overview-certificates').innerText()).resolves.toContain(cert.number)
    await snap(page, 'overview-certificates-desktop')
    await context.close()
  })

  it('mails the auditors that it was issued', async () => {
    const mail = await waitForMail('auditor@larchmere-lab.example', new RegExp(`Certificate ${cert.number} issued`))
    expect(mail.text).toContain(`/certificates/${cert.id}`)
  })

  it('lets an auditor find it, download it, check its digest and verify it', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'auditor')
    await page.goto('/certificates')
    await waitForApp(page)
    await snap(page, 'certificates-list-desktop')
    await page.getByRole('searchbox', { name: 'Search certificates' }).fill(cert.number)
    await page.waitForFunction(() => document.querySelector('[data-testid=row-count]')?.textContent?.includes('of 1'))
    await page.getByRole('link', { name: cert.number }).click()
    await page.waitForURL(`**/certificates/${cert.id}`)
    await waitForApp(page)
    await expect(page.getByTestId('choose-revoke').count()).resolves.toBe(0)
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('download-pdf').click()])
    expect(download.suggestedFilename()).toBe(`${cert.number}-v1.pdf`)
    const text = (await pdfText(readFileSync((await download.path())!))).replace(/\s+/g, ' ')
    expect(text).toContain(`SHA-256 ${cert.sha256}`)
    expect(text).toContain(`Żółć nickel-58 foil ${tag}`)
    await page.getByTestId('recompute').click()
    await expect(page.getByTestId('recomputed').innerText()).resolves.toBe('Matches the printed digest.')
    await snap(page, 'certificate-page-auditor-desktop')
    await page.getByTestId('verify-link').click()
    await page.waitForURL(/\/verify\//)
    await page.locator('[data-testid=verify-answer][data-status=genuine]').waitFor()
    await snap(page, 'verify-genuine-desktop')
    await context.close()
  })

  it('shows a stranger on a phone only the answer, and never "genuine" for a wrong digest', async () => {
    const context = await newContext(browser, 'phone')
    const page = await context.newPage()
    const wrong = (cert.sha256[0] === 'a' ? 'b' : 'a') + cert.sha256.slice(1)
    await page.goto(`/verify/${cert.number}?digest=${wrong}`)
    await waitForApp(page)
    await page.locator('[data-testid=verify-answer][data-status=unknown]').waitFor()
    await expect(page.locator('body').innerText()).resolves.not.toContain(sample.name)
    await snap(page, 'verify-unknown-phone')
    await page.getByTestId('verify-digest').fill(cert.sha256)
    await page.getByTestId('verify-digest').press('Tab')
    await page.keyboard.press('Enter')
    await page.locator('[data-testid=verify-answer][data-status=genuine]').waitFor()
    await snap(page, 'verify-genuine-phone')
    await context.close()
  })

  it('shows the certified values, and tells the issued PDF from an altered one dropped on the page', async () => {
    const issued = await pdfOf(manager, cert.id)
    // One byte changed in the page content: the same size, the same look, not the issued file.
    const altered = Buffer.from(issued)
    altered[altered.indexOf('stream', 200, 'latin1') + 20] ^= 0x01
    const context = await newContext(browser)
    const page = await context.newPage()
    await page.goto(`/verify/${cert.number}?digest=${cert.sha256}`)
    await waitForApp(page)
    await page.locator('[data-testid=verify-answer][data-status=genuine]').waitFor()
    const certified = await page.getByTestId('verify-certified').innerText()
    expect(certified).toContain(`Żółć nickel-58 foil ${tag}`)
    // certifiableSample's values (tests/support/certificates.ts): 500 ± 15 µg/cm², 2.5 mg.
    expect(certified).toContain('500 ± 15 µg/cm²')
    expect(certified).toContain('2.5 mg')

    const drop = async (p: Page, bytes: Buffer, name: string) => {
      await p.getByTestId('verify-drop').evaluate((zone, { b64, name }) => {
        const bin = atob(b64)
        const data = new Uint8Array(bin.length)
        for (let i = 0; i < bin.length; i++) data[i] = bin.charCodeAt(i)
        const dt = new DataTransfer()
        dt.items.add(new File([data], name, { type: 'application/pdf' }))
        zone.dispatchEvent(new DragEvent('drop', { dataTransfer: dt, bubbles: true, cancelable: true }))
      }, { b64: bytes.toString('base64'), name })
    }
    await drop(page, issued, `${cert.number}-v1.pdf`)
    await page.locator('[data-testid=verify-file-answer][data-identical=true]').waitFor()
    await expect(page.getByTestId('verify-file-answer').innerText()).resolves.toContain('Identical to the issued file')
    await snap(page, 'verify-file-identical-desktop')
    await drop(page, altered, `${cert.number}-v1.pdf`)
    await page.locator('[data-testid=verify-file-answer][data-identical=false]').waitFor()
    await expect(page.getByTestId('verify-file-answer').innerText()).resolves.toContain('Not the issued file')
    await snap(page, 'verify-file-altered-desktop')
    // The file picker does the same.
    await page.getByTestId('verify-file').setInputFiles({ name: 'from-picker.pdf', mimeType: 'application/pdf', buffer: issued })
    await page.locator('[data-testid=verify-file-answer][data-identical=true]').waitFor()
    await context.close()
  })

  it('lets a manager certify a recorded species from its page', async () => {
    const recorded = await (await signedIn('scientist')).post('/api/species', { species: 'Ne 7+' })
    expect([200, 201]).toContain(recorded.status)
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto(`/species/${recorded.body.id}`)
    await waitForApp(page)
    page.once('dialog', (d) => void d.accept())
    await page.getByTestId('issue-certificate').click()
    await page.getByTestId('certificate-notice').getByText(/is issued/).waitFor()
    await snap(page, 'species-page-certificate-desktop')
    await context.close()
  })

  it('lets a manager revoke it with a reason, after which it verifies as revoked', async () => {
    const context = await newContext(browser, 'phone')
    const page = await context.newPage()
    await signInAs(page, 'manager')
    await page.goto(`/certificates/${cert.id}`)
    await waitForApp(page)
    await page.getByTestId('choose-revoke').click()
    await page.getByTestId('reason').fill('Issued before the final weighing')
    page.once('dialog', (d) => void d.accept())
    await page.getByTestId('confirm-action').click()
    await page.getByText('The certificate is revoked.').waitFor()
    await expect(page.getByTestId('certificate-status').innerText()).resolves.toBe('Revoked')
    await snap(page, 'certificate-page-revoked-phone')
    await page.goto('/certificates')
    await waitForApp(page)
    await snap(page, 'certificates-list-phone')
    await page.goto(`/verify/${cert.number}?digest=${cert.sha256}`)
    await page.locator('[data-testid=verify-answer][data-status=revoked]').waitFor()
    await context.close()
  })
})
