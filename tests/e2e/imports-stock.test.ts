import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, saveScreenshot, signInAs, type RunningServer, openBrowserSession, type BrowserSession } from '../helpers/browser'

const run = browserAvailable()
const within = { timeout: 10_000 }

const STOCK_CSV = [
  'part_number,site,condition,price,location,label',
  'TM-HD-2000,Northgate counter,new,455.00,"Aisle 3, shelf 2",NG-000300',
  'TM-HD-1810,Northgate counter,used A,-20,Rack 1,NG-000301',
].join('\n')

describe.skipIf(!run)('a stock file in the browser', () => {
  let session: BrowserSession
  let server: RunningServer
  let page: Page
  let consoleErrors: string[] = []

  beforeAll(async () => {
    session = await openBrowserSession({ viewport: { width: 1366, height: 900 } })
    ;({ server, page, consoleErrors } = session)
    await signInAs(page, server.url, 'editor')
  })
  afterAll(() => session?.close())

  it('names a stock file chosen as parts and switches to stock on request', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Imports' }).click()
    await page.waitForURL(/\/imports/)
    await page
      .getByLabel('CSV file', { exact: true })
      .setInputFiles({ name: 'delivery.csv', mimeType: 'text/csv', buffer: Buffer.from(STOCK_CSV) })
    const hint = page.getByRole('status').filter({ hasText: 'This looks like a stock file, not a parts file.' })
    await expect.poll(() => hint.isVisible(), within).toBe(true)
    await saveScreenshot(page, 'imports-stock-hint')
    await hint.getByRole('button', { name: 'Import it as stock' }).click()
    await expect.poll(() => hint.count(), within).toBe(0)
    expect(await page.getByRole('group').getByRole('button', { name: 'Stock', exact: true }).getAttribute('aria-pressed')).toBe('true')
  })

  it('previews the units with the bad price named, commits the valid one and lists a stock batch', async () => {
    await page.getByRole('button', { name: 'Preview' }).click()
    await expect.poll(() => page.getByText('Preview: nothing has been written yet.').isVisible(), within).toBe(true)
    expect(await page.getByRole('region', { name: 'Preview counts' }).textContent()).toMatch(
      /new\s*1.*changed\s*0.*unchanged\s*0.*rejected\s*1/s,
    )
    expect(await page.getByRole('table', { name: 'Row errors' }).textContent()).toContain('price cannot be negative (-20)')
    expect(await page.getByRole('table', { name: 'Row changes' }).textContent()).toContain('NG-000300')
    await page.setViewportSize({ width: 768, height: 1024 })
    await saveScreenshot(page, 'imports-stock-preview-tablet')
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(768)
    await page.setViewportSize({ width: 1366, height: 900 })
    await page.getByLabel('Commit only the valid rows').check()
    await page.getByRole('button', { name: 'Commit' }).click()
    await expect.poll(() => page.getByText(/Committed as batch \d+\./).isVisible(), within).toBe(true)
    const first = page.getByRole('table', { name: 'Import batches' }).locator('tbody tr').first()
    await expect.poll(() => first.textContent(), within).toContain('delivery.csv')
    expect(await first.textContent()).toContain('stock')
    await saveScreenshot(page, 'imports-stock-committed')
  })

  it('reverts the stock batch after a question that names what goes back', async () => {
    const first = page.getByRole('table', { name: 'Import batches' }).locator('tbody tr').first()
    await first.getByRole('button', { name: /Revert batch/ }).click()
    const dialog = page.getByRole('alertdialog')
    expect(await dialog.textContent()).toContain('every stock unit delivery.csv created, changed or removed')
    await dialog.getByRole('button', { name: 'Revert' }).click()
    await expect.poll(() => first.textContent(), within).toContain('reverted by Tobias Ferrand')
  })

  it('gives the counter the imports screen for stock files only, at desktop and tablet width', async () => {
    await page.getByRole('button', { name: 'Sign out' }).click()
    await signInAs(page, server.url, 'counter')
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Imports' }).click()
    await page.waitForURL(/\/imports/)
    const kinds = page.getByRole('group').filter({ has: page.getByRole('button', { name: 'Stock', exact: true }) })
    await expect.poll(() => kinds.getByRole('button').allTextContents(), within).toEqual(['Stock'])
    const exports = page.getByRole('region', { name: 'Export' }).getByRole('link')
    expect(await exports.allTextContents()).toEqual([expect.stringContaining('Stock CSV')])
    // The editor's stock batch is listed; the demo's catalogue batches are not.
    const rows = page.getByRole('table', { name: 'Import batches' }).locator('tbody tr')
    await expect.poll(() => rows.count(), within).toBeGreaterThan(0)
    for (const text of await rows.allTextContents()) expect(text).toContain('stock')
    await saveScreenshot(page, 'imports-counter')
    await page.setViewportSize({ width: 768, height: 1024 })
    await saveScreenshot(page, 'imports-counter-tablet')
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(768)
    await page.setViewportSize({ width: 1366, height: 900 })
  })

  it('logged no console errors (the 401 of the session check before sign-in aside)', () => {
    expect(consoleErrors.filter((text) => !text.includes('401'))).toEqual([])
  })
})
