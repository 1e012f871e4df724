import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, openBrowserSession, saveScreenshot, signInAs, type BrowserSession, type RunningServer } from '../helpers/browser'

const run = browserAvailable()
const within = { timeout: 10_000 }

describe.skipIf(!run)('counter: which fitting heads are on the shelf', () => {
  let session: BrowserSession
  let server: RunningServer
  let page: Page
  let consoleErrors: string[] = []

  beforeAll(async () => {
    session = await openBrowserSession({ viewport: { width: 1366, height: 900 } })
    ;({ server, page, consoleErrors } = session)
  })
  afterAll(() => session?.close())

  it('shows stock on each line and keeps only what is on a shelf when asked', async () => {
    await signInAs(page, server.url, 'counter')
    // The sign-in page asks who is signed in and is told 401: expected before signing in.
    consoleErrors.length = 0
    await page.goto(`${server.url}/parts/TM-BL-1800?kind=head`)
    const late = page.locator('[data-part="TM-HD-1810"]').first()
    await expect.poll(() => late.textContent(), within).toContain('2 in stock')
    expect(await late.textContent()).toContain('Hollin yard, lot B')
    expect(await page.locator('[data-part="TM-HD-2050"]').first().textContent()).toContain('Not in stock')
    await page.getByLabel('In stock only').check()
    await page.waitForURL(/stock=1/)
    await expect.poll(() => page.locator('[data-part="TM-HD-2050"]').count(), within).toBe(0)
    expect(await page.locator('[data-part="TM-HD-1810"]').count()).toBeGreaterThan(0)
    await saveScreenshot(page, 'part-page-in-stock')
    await page.setViewportSize({ width: 768, height: 1024 })
    await saveScreenshot(page, 'part-page-in-stock-tablet')
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(768)
    expect(consoleErrors, consoleErrors.join('\n')).toEqual([])
    await page.setViewportSize({ width: 1366, height: 900 })
  })

  it('names the counter’s home site first once chosen on the account screen, though the yard holds more', async () => {
    // A used unit of the late head at the Northgate counter: the yard still holds two.
    const added = await page.evaluate(async () => {
      const token = /(?:^|;\s*)fitwright-csrf=([^;]+)/.exec(document.cookie)?.[1] ?? ''
      const response = await fetch('/api/stock', {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', 'x-csrf-token': decodeURIComponent(token) },
        body: JSON.stringify({ partNumber: 'TM-HD-1810', site: 'Northgate counter', condition: 'used', priceCents: 16_000 }),
      })
      return response.status
    })
    expect(added).toBe(201)
    await page.goto(`${server.url}/parts/TM-BL-1800?kind=head`)
    const late = page.locator('[data-part="TM-HD-1810"]').first()
    await expect.poll(() => late.textContent(), within).toContain('3 in stock')
    expect(await late.textContent()).toContain('nearest: Hollin yard, lot B · also Northgate counter')

    await page.goto(`${server.url}/account`)
    await page.getByRole('combobox', { name: 'Site you work at', exact: true }).click()
    await page.getByRole('option', { name: 'Northgate counter', exact: true }).click()
    await page.getByText('Home site: Northgate counter').waitFor(within)
    await saveScreenshot(page, 'account-home-site')
    await page.setViewportSize({ width: 768, height: 1024 })
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(768)
    await saveScreenshot(page, 'account-home-site-tablet')
    await page.setViewportSize({ width: 1366, height: 900 })

    await page.goto(`${server.url}/parts/TM-BL-1800?kind=head`)
    await expect.poll(() => late.textContent(), within).toContain('nearest: Northgate counter · also Hollin yard, lot B')
    await saveScreenshot(page, 'part-page-nearest-site')
    expect(consoleErrors, consoleErrors.join('\n')).toEqual([])
  })
})
