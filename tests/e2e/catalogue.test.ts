import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, saveScreenshot, signInAs, type RunningServer, openBrowserSession, type BrowserSession } from '../helpers/browser'

const run = browserAvailable()

describe.skipIf(!run)('catalogue in the browser', () => {
  let session: BrowserSession
  let server: RunningServer
  let page: Page
  let consoleErrors: string[] = []

  beforeAll(async () => {
    session = await openBrowserSession({ viewport: { width: 1280, height: 860 } })
    ;({ server, page, consoleErrors } = session)
  })
  afterAll(() => session?.close())

  it('sends a visitor without a session to sign-in', async () => {
    await page.goto(`${server.url}/parts`)
    await page.waitForURL(/\/sign-in\?redirect=/)
    expect(await page.getByRole('heading', { name: 'Sign in' }).isVisible()).toBe(true)
    await saveScreenshot(page, 'sign-in')
  })

  it('shows a clear message for a wrong password', async () => {
    await page.getByLabel('E-mail').fill('counter@fitwright.test')
    await page.getByLabel('Password').fill('not-the-password')
    await page.getByRole('button', { name: 'Sign in' }).click()
    await expect.poll(() => page.getByRole('alert').textContent()).toContain('E-mail or password is not right')
  })

  it('lets a counter sign in, search a part number and see it in the table', async () => {
    await signInAs(page, server.url, 'counter')
    await page.goto(`${server.url}/parts`)
    await page.getByLabel('Search', { exact: true }).fill('tm-hd-2000')
    await page.waitForURL(/q=tm-hd-2000/)
    const table = page.getByRole('table')
    await expect.poll(() => table.locator('tbody tr').first().textContent()).toContain('TM-HD-2000')
    expect(await table.textContent()).toContain('TK20V cylinder head')
    await saveScreenshot(page, 'catalogue-search')
  })

  it('finds a part by its casting mark and shows only the navigation a counter may use', async () => {
    await page.getByLabel('Search', { exact: true }).fill('H18-2207B')
    await expect.poll(() => page.getByRole('table').locator('tbody tr').first().textContent()).toContain('TM-HD-1810')
    const nav = page.getByRole('navigation', { name: 'Main' })
    expect(await nav.getByRole('link', { name: 'Catalogue' }).isVisible()).toBe(true)
    expect(await nav.getByRole('link', { name: 'Users' }).count()).toBe(0)
  })

  it('keeps each part number on one line on a 768 px tablet and writes the count with separators', async () => {
    await page.setViewportSize({ width: 768, height: 1024 })
    await page.goto(`${server.url}/parts`)
    const numbers = page.getByRole('table').locator('tbody a.part-number')
    await numbers.first().waitFor()
    const lineCounts = await numbers.evaluateAll((links) => links.map((link) => link.getClientRects().length))
    expect(lineCounts.every((count) => count === 1)).toBe(true)
    // The browser's locale here is en-US: CLDR groups thousands with a comma.
    expect(await page.locator('.page-header p').textContent()).toMatch(/^\d{1,3}(,\d{3})* parts match$/)
    await saveScreenshot(page, 'catalogue-768')
    await page.setViewportSize({ width: 1280, height: 860 })
  })

  it('logged no console errors', () => {
    expect(consoleErrors.filter((text) => !text.includes('401'))).toEqual([])
  })
})
