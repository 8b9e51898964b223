import { describe, it, expect, beforeAll, afterAll } from 'vitest'
import type { Browser, Page } from 'playwright-core'
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

  it('opens the look-up for an ion typed into the address bar as /species/<ion>, not a 404', async () => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'technician')
    const reply = await page.goto('/species/Fe13+')
    expect(reply?.status()).toBe(200)
    await page.getByTestId('species-result').waitFor()
    expect(new URL(page.url()).pathname).toBe('/species')
    expect(new URL(page.url()).searchParams.get('q')).toBe('Fe13+')
    // Fe13+ is Fe XIV, Al-like: [Ne] 3s2 3p (NIST ASD ground level, as in the first test of this file).
    await expect(page.getByTestId('core-configuration').innerText()).resolves.toBe('[Ne] 3s2 3p1')
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

// Issue 11: heavy highly charged ions lead with a best estimate near the reference, state its
// typical error and show every correction; reference values NIST ASD (via Debian python3-pymatgen):
// W⁴⁶⁺ 4057 eV, Pb⁸¹⁺ 101336.7 eV, U⁸⁹⁺ 32836.5 eV, Yb²¹⁺ 580 eV.
describe('heavy highly charged ions', () => {
  /** A scientist's look-up of `q`, once its SCF results are in (the caller closes the context). */
  const openLookUp = async (q: string) => {
    const context = await newContext(browser)
    const page = await context.newPage()
    await signInAs(page, 'scientist')
    await page.goto('/species?q=' + encodeURIComponent(q))
    await page.getByTestId('species-result').waitFor()
    // the SCF solution may still be computing on a cold cache: reload until it is in
    for (let i = 0; i < 20 && (await page.getByTestId('scf-pending').count()) > 0; i++) {
      await page.waitForTimeout(1500)
      await page.reload()
      await page.getByTestId('species-result').waitFor()
    }
    return { context, page }
  }
  const readBest = async (page: Page) => ({ best: await page.getByTestId('best-estimate').innerText(), table: await page.getByTestId('ionisation-table').innerText() })
  const lookUp = async (q: string, shot: string) => {
    const { context, page } = await openLookUp(q)
    await page.waitForTimeout(300)
    await snap(page, shot)
    const read = await readBest(page)
    await context.close()
    return read
  }
  const bestEv = (text: string) => Number(/Best estimate\s+([\d,.\s]+?)\s*eV/.exec(text)![1]!.replace(/[,\s]/g, ''))

  it.each([
    ['W46+', 4057, 'species-w46'],
    ['Pb81+', 101336.7, 'species-pb81'],
    ['U89+', 32836.5, 'species-u89'],
    // Hg VI → Hg VII, 76.6 ± 0.5 eV measured (NIST ASD 5.12): led by the Hartree–Fock ΔSCF since engine 1.5.0
    ['Hg5+', 76.6, 'species-hg5'],
  ])('%s: a best estimate within 1 % of the reference, with its typical error', async (q, reference, shot) => {
    const { best } = await lookUp(q, shot)
    expect(Math.abs(bestEv(best) / reference - 1)).toBeLessThan(0.01)
    expect(best).toMatch(/typically ±/)
  })

  // Er IV [Xe] 4f11 → Er V [Xe] 4f10 (NIST ASD 5.12 ground shells), 42.42 ± 0.04 eV (NIST ASD via
  // Debian python3-pymatgen; the stated uncertainty from ASD 5.12): a 4f removal at low charge.
  it('Er3+ leads with the figure of its own kind of shell: an f electron at charge 1–4', async () => {
    const { best, table } = await lookUp('Er3+', 'species-er3')
    expect(best).toMatch(/typically ±[\d.]+ % for ions of charge 1–4, Z ≥ 55, losing an f electron/)
    expect(table).toContain('dirac-lsd-delta')
    // the class figure printed is what the page's method is off by on average over its class; this
    // ion, one of the 44 with precise references, is off by more than that (engine 1.5.0: −4.6 %
    // with hf-correlated-delta, whose class mean is ±3.5 %; dirac-lsd-delta was +3.6 % of ±5.4 %),
    // within one and a half times it
    const typical = Number(/typically ±([\d.]+) %/.exec(best)![1])
    expect(Math.abs(bestEv(best) / 42.42 - 1) * 100).toBeLessThan(1.5 * typical)
  })

  it('U89+ shows the screened self-energy and vacuum polarisation of the Li-like ion with their sizes', async () => {
    const { table } = await lookUp('U89+', 'species-u89-corrections')
    expect(table).toContain('dirac-scf-delta-qed')
    expect(table).toMatch(/self-energy \(screened\)\s+−\d/)
    expect(table).toMatch(/vacuum polarisation \(Uehling, screened\)\s+\+\d/)
  })

  it('Yb21+ shows the configuration chosen by energy and an estimate within 3 % of the reference', async () => {
    const { context, page } = await openLookUp('Yb21+')
    // NIST ASD gives Yb XXII the ground shells 4d10 4f3 (GSIE, as exported in tardis-sn/carsus-data-nist)
    await expect(page.getByTestId('core-configuration').innerText()).resolves.toBe('[Kr] 4d10 4f3')
    await expect(page.getByTestId('configuration-source').innerText()).resolves.toMatch(/Chosen by energy/)
    await snap(page, 'species-yb21')
    const { best } = await readBest(page)
    await context.close()
    expect(Math.abs(bestEv(best) / 580 - 1)).toBeLessThan(0.03)
  })

  // NIST ASD 5.12 (ground states and ionization energies export): Yb XII [Cd] 4f11 4I°15/2,
  // (244) ± 12 eV, a theoretical value; W XVI [Cd] 4f11, [361.9] ± 1.5 eV, semi-empirical.
  it('Yb11+ shows the reference\'s stated uncertainty and ASD\'s ground shells beside the engine\'s', async () => {
    const { context, page } = await openLookUp('Yb11+')
    await expect(page.getByTestId('reference-uncertainty').innerText()).resolves.toMatch(/Theoretical value, stated uncertainty ±12 eV \(4\.9 %\)\. Deviations smaller than that do not tell the methods apart\./)
    await expect(page.getByTestId('reference-configuration').innerText()).resolves.toMatch(/NIST ASD lists \[Cd\] 4f11 \(4I°15\/2\) as the ground shells of this ion; the engine's configuration differs/)
    await snap(page, 'species-yb11-reference')
    await page.goto('/species?q=' + encodeURIComponent('W15+'))
    await page.getByTestId('species-result').waitFor()
    await expect(page.getByTestId('reference-uncertainty').innerText()).resolves.toMatch(/Semi-empirical value, stated uncertainty ±1\.5 eV \(0\.41 %\)\.$/)
    await expect(page.getByTestId('reference-configuration').innerText()).resolves.toMatch(/NIST ASD lists the same ground shells \(\[Cd\] 4f11, level 4I°15\/2\)/)
    await context.close()
  })
})
