import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, saveScreenshot, signInAs, type RunningServer, openBrowserSession, type BrowserSession } from '../helpers/browser'

const run = browserAvailable()

const PARTS_CSV = [
  'part_number,kind,name,family,year_from,year_to,chamber_cc,valve_lift',
  'TM-HD-2100,head,"TK20V cylinder head, ported",TK20V,1996,2000,42.5,variable',
  'TM-HD-2000,head,TK20V cylinder head,TK20V,1992,2001,44,variable',
  'TM-HD-2101,head,Head with a typo,TK20V,1996,2000,big,variable',
].join('\n')

describe.skipIf(!run)('imports in the browser', () => {
  let session: BrowserSession
  let server: RunningServer
  let page: Page
  let consoleErrors: string[] = []

  beforeAll(async () => {
    session = await openBrowserSession()
    ;({ server, page, consoleErrors } = session)
    await signInAs(page, server.url, 'editor')
  })
  afterAll(() => session?.close())

  it('lets an editor preview a parts file and see counts, row errors and changes', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Imports' }).click()
    await page.waitForURL(/\/imports/)
    await page
      .getByLabel('CSV file', { exact: true })
      .setInputFiles({ name: 'heads.csv', mimeType: 'text/csv', buffer: Buffer.from(PARTS_CSV) })
    await page.getByRole('button', { name: 'Preview' }).click()
    await expect.poll(() => page.getByText('Preview: nothing has been written yet.').isVisible()).toBe(true)
    const counts = page.getByRole('region', { name: 'Preview counts' })
    expect(await counts.textContent()).toMatch(/new\s*1.*changed\s*1.*unchanged\s*0.*rejected\s*1/s)
    const errors = page.getByRole('table', { name: 'Row errors' })
    expect(await errors.textContent()).toContain('"big" is not a number')
    expect(await page.getByRole('table', { name: 'Row changes' }).textContent()).toMatch(/TM-HD-2000\s*change\s*year_to:\s*2000\s*→\s*2001/)
    expect(await page.getByRole('button', { name: 'Commit' }).isDisabled()).toBe(true)
    await saveScreenshot(page, 'imports-preview')
  })

  it('commits only the valid rows when the editor chooses to, and lists the batch', async () => {
    await page.getByLabel('Commit only the valid rows').check()
    await page.getByRole('button', { name: 'Commit' }).click()
    await expect.poll(() => page.getByText(/Committed as batch \d+\./).isVisible()).toBe(true)
    const batches = page.getByRole('table', { name: 'Import batches' })
    await expect.poll(() => batches.locator('tbody tr').first().textContent()).toContain('heads.csv')
    expect(await batches.locator('tbody tr').first().textContent()).toContain('1 / 1 / 0 / 1')
    await expect.poll(() => page.locator('.p-datatable-mask').count()).toBe(0)
    await saveScreenshot(page, 'imports-committed')
  })

  it('reverts the batch after a confirmation', async () => {
    const batches = page.getByRole('table', { name: 'Import batches' })
    await batches
      .locator('tbody tr')
      .first()
      .getByRole('button', { name: /Revert batch/ })
      .click()
    await page.getByRole('alertdialog').getByRole('button', { name: 'Revert' }).click()
    await expect.poll(() => batches.locator('tbody tr').first().textContent()).toContain('reverted by Tobias Ferrand')
  })

  it('logged no console errors (the 401 of the session check before sign-in aside)', () => {
    expect(consoleErrors.filter((text) => !text.includes('401'))).toEqual([])
  })
})
