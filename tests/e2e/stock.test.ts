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
  })
})
