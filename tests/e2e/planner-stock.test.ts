import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, openBrowserSession, saveScreenshot, SCREENSHOT_DIR, signInAs, type BrowserSession } from '../helpers/browser'

const run = browserAvailable()
const within = { timeout: 10_000 }

function partsListRow(page: Page, partNumber: string) {
  return page
    .getByRole('region', { name: /Parts list/ })
    .getByRole('row')
    .filter({ hasText: partNumber })
}

describe.skipIf(!run)('technician: the planner shows what is on the shelf', () => {
  let session: BrowserSession
  let page: Page

  beforeAll(async () => {
    session = await openBrowserSession({ viewport: { width: 1366, height: 900 } })
    page = session.page
    await signInAs(page, session.server.url, 'tech')
    // The sign-in page's session probe answers 401 before signing in.
    session.consoleErrors.length = 0
  })
  afterAll(() => session?.close())

  it('shows on each head suggestion how many are in stock, the best condition, the price range and the site', async () => {
    await page.goto(`${session.server.url}/planner?block=TM-BL-1800`)
    const head = page.getByRole('combobox', { name: 'Cylinder head', exact: true })
    await head.click()
    await head.pressSequentially('TM-HD-18', { delay: 30 })
    const used = page.getByRole('option', { name: /^TM-HD-1810\b/ }).first()
    // The demo yard holds a used grade-A unit (175.00) and a core (25.00) of this head.
    await expect.poll(() => used.textContent(), within).toMatch(/2 in stock · best used · 25\.00–175\.00\s*nearest: Hollin yard, lot B/)
    await page.waitForTimeout(400)
    await page.screenshot({ path: `${SCREENSHOT_DIR}/planner-stock-suggestions-1366.png` })
    await used.click()
    await page.waitForURL(/head=TM-HD-1810/)
  })

  it('names in the parts list the unit to take for each part, or "order" where the shelf has none', async () => {
    const gasket = page.getByRole('combobox', { name: 'Head gasket', exact: true })
    await gasket.click()
    await gasket.pressSequentially('TM-HG-18', { delay: 30 })
    await page
      .getByRole('option', { name: /^TM-HG-1800\b/ })
      .first()
      .click()
    await expect.poll(() => gasket.inputValue(), within).toBe('TM-HG-1800')
    await expect.poll(() => partsListRow(page, 'TM-HG-1800').count(), within).toBe(1)

    await expect
      .poll(() => partsListRow(page, 'TM-HD-1810').textContent(), within)
      .toContain('Hollin yard, lot B · Rack H4 · used · 175.00')
    expect(await partsListRow(page, 'TM-BL-1800').textContent()).toContain('Hollin yard, lot B · Floor, bay 2 · used · 90.00')
    expect(await partsListRow(page, 'TM-HG-1800').locator('.order').textContent()).toBe('order')
    const list = page.getByRole('region', { name: /Parts list/ })
    await saveScreenshot(page, 'planner-stock-planner-1366')
    await list.screenshot({ path: `${SCREENSHOT_DIR}/planner-stock-parts-list-1366.png` })
    await page.setViewportSize({ width: 768, height: 1024 })
    await expect.poll(() => partsListRow(page, 'TM-HD-1810').isVisible(), within).toBe(true)
    await saveScreenshot(page, 'planner-stock-planner-768')
    await list.screenshot({ path: `${SCREENSHOT_DIR}/planner-stock-parts-list-768.png` })
    const head = page.getByRole('combobox', { name: 'Cylinder head', exact: true })
    await head.click()
    await expect
      .poll(
        () =>
          page
            .getByRole('option', { name: /^TM-HD-1810\b/ })
            .first()
            .textContent(),
        within,
      )
      .toContain('in stock')
    await page.waitForTimeout(400)
    await page.screenshot({ path: `${SCREENSHOT_DIR}/planner-stock-suggestions-768.png` })
    expect(session.consoleErrors, session.consoleErrors.join('\n')).toEqual([])
  })
})
