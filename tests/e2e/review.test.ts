import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, saveScreenshot, signInAs, type RunningServer, openBrowserSession, type BrowserSession } from '../helpers/browser'

const run = browserAvailable()

describe.skipIf(!run)('reviewing proposed links in the browser', () => {
  let session: BrowserSession
  let server: RunningServer
  let page: Page

  beforeAll(async () => {
    session = await openBrowserSession()
    ;({ server, page } = session)
    await signInAs(page, server.url, 'editor')
  })
  afterAll(() => session?.close())

  it('lets an editor approve a field report, which then counts as a reviewed fit on the part page', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review' }).click()
    await page.waitForURL(/\/review/)
    const table = page.getByRole('table', { name: 'Proposed links' })
    await expect.poll(() => table.locator('tbody tr').count()).toBe(2)
    await saveScreenshot(page, 'review-queue')
    await page.getByRole('button', { name: 'Approve TM-HD-2050 with TM-EM-2000H' }).click()
    await expect.poll(() => table.locator('tbody tr').count()).toBe(1)
    await page.goto(`${server.url}/parts/TM-HD-2050?kind=exhaust-manifold`)
    const row = page.getByRole('listitem').filter({ hasText: 'TM-EM-2000H' }).first()
    await expect.poll(() => row.textContent()).toMatch(/Reviewed link/)
  })
})
