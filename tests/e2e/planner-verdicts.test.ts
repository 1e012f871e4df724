import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, openBrowserSession, saveScreenshot, signInAs, type BrowserSession, type RunningServer } from '../helpers/browser'

const run = browserAvailable()
const within = { timeout: 10_000 }
const banner = (page: Page) => page.locator('.planner-verdict')

describe.skipIf(!run)('technician: the banner leads with road-legality, the deciding reason and unjudgeable values', () => {
  let session: BrowserSession
  let server: RunningServer
  let page: Page

  beforeAll(async () => {
    session = await openBrowserSession({ viewport: { width: 1366, height: 900 } })
    ;({ server, page } = session)
    await signInAs(page, server.url, 'tech')
  })
  afterAll(() => session?.close())

  it.each([
    ['desktop', 1366, 900],
    ['tablet', 768, 1024],
  ])('on %s, an OBD-I control unit in a 1999 car makes the banner say not road-legal', async (name, width, height) => {
    await page.setViewportSize({ width, height })
    await page.goto(`${server.url}/planner?head=TM-HD-1800&ecu=TM-EC-1800&year=1999`)
    await expect.poll(() => banner(page).getByRole('heading', { level: 2 }).textContent(), within).toMatch(/not road-legal for a 1999 car/)
    expect(await banner(page).textContent()).toContain('OBD-II')
    await saveScreenshot(page, `planner-verdicts-blocked-${name}`)
  })

  it('leads a does-not-fit pair with the failing gasket bore, not the matching bolt pattern', async () => {
    await page.setViewportSize({ width: 1366, height: 900 })
    await page.goto(`${server.url}/planner?block=TM-BL-2000&head-gasket=TM-HG-1800`)
    const pair = page.locator('.planner-pairs li[data-relation="does-not-fit"]').first()
    await expect.poll(() => pair.locator('.reason').textContent(), within).toMatch(/84\.5/)
  })

  it.each([
    ['desktop', 1366, 900],
    ['tablet', 768, 1024],
  ])('on %s, an octane of 300 turns the banner into an error that takes you to the field', async (name, width, height) => {
    await page.setViewportSize({ width, height })
    await page.goto(`${server.url}/planner?head=TM-HD-1800&octane=300`)
    const alert = banner(page)
    await expect.poll(() => alert.getAttribute('data-verdict'), within).toBe('error')
    expect(await alert.textContent()).toContain('Octane must be between 80 and 120.')
    expect(await alert.textContent()).not.toContain('Checking the build')
    await saveScreenshot(page, `planner-verdicts-error-${name}`)
    await alert.getByRole('link', { name: 'Fuel octane' }).click()
    await expect.poll(() => page.evaluate(() => document.activeElement?.id), within).toBe('ctx-octane')
  })
})
