import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, openBrowserSession, saveScreenshot, signInAs, type BrowserSession, type RunningServer } from '../helpers/browser'

const run = browserAvailable()
const within = { timeout: 10_000 }

describe.skipIf(!run)('counter: the next customer from the part page', () => {
  let session: BrowserSession
  let server: RunningServer
  let page: Page

  beforeAll(async () => {
    session = await openBrowserSession({ viewport: { width: 1366, height: 900 } })
    ;({ server, page } = session)
    await signInAs(page, server.url, 'counter')
    await page.waitForURL(/\/lookup$/)
  })
  afterAll(() => session?.close())

  const heading = () => page.getByRole('heading', { level: 1 }).textContent()

  it('serves three customers in a row from the top-bar search, reached with /', async () => {
    await page.goto(`${server.url}/parts/TM-HD-2000`)
    await expect.poll(heading, within).toContain('TM-HD-2000')
    const search = page.getByRole('combobox', { name: 'Search parts' })
    for (const [typed, expected] of [
      ['TM-BL-1800', 'TM-BL-1800'],
      ['h20-318', 'TM-HD-2000'],
      ['TM-HD-1810', 'TM-HD-1810'],
    ] as const) {
      await page.locator('body').click({ position: { x: 5, y: 300 } })
      await page.keyboard.press('/')
      expect(await search.evaluate((input) => input === document.activeElement)).toBe(true)
      await search.pressSequentially(typed, { delay: 30 })
      await expect.poll(() => page.getByRole('option').first().textContent(), within).toContain(expected)
      await page.keyboard.press('Enter')
      await page.waitForURL(new RegExp(`/parts/${expected}$`))
      await expect.poll(heading, within).toContain(expected)
    }
    await saveScreenshot(page, 'counter-top-search')
  })

  it('types / into a text box as a character, not as a jump to the search', async () => {
    const search = page.getByRole('combobox', { name: 'Search parts' })
    await search.fill('')
    await search.pressSequentially('TM/', { delay: 30 })
    expect(await search.inputValue()).toBe('TM/')
    await search.fill('')
  })

  it('says a superseded number is superseded by the current part', async () => {
    await page.goto(`${server.url}/parts/TM-BL-1999`)
    await page.waitForURL(/\/parts\/TM-BL-2000$/)
    await expect
      .poll(() => page.getByRole('status').filter({ hasText: 'superseded' }).textContent(), within)
      .toContain('TM-BL-1999 is superseded by TM-BL-2000')
    await saveScreenshot(page, 'counter-superseded')
  })

  it('offers near matches for an unknown number and keeps the typed text in a search box', async () => {
    await page.goto(`${server.url}/parts/TM-BL-2010`)
    const list = page.getByRole('list', { name: 'Near matches' })
    await expect.poll(() => list.textContent(), within).toContain('TM-BL-2000')
    expect(await list.textContent()).toContain('one character different')
    expect(await page.getByRole('combobox', { name: 'Search again' }).inputValue()).toBe('TM-BL-2010')
    await saveScreenshot(page, 'counter-near-matches')
    await list.getByRole('link', { name: 'TM-BL-2000' }).click()
    await page.waitForURL(/\/parts\/TM-BL-2000$/)
    await expect.poll(heading, within).toContain('TM-BL-2000')
  })

  it('opens the heads that can replace this one from the part page, with what differs side by side', async () => {
    await page.goto(`${server.url}/parts/TM-HD-1810`)
    await page.getByRole('link', { name: 'Other cylinder heads that can replace this one' }).click()
    await page.waitForURL(/\/parts\/TM-HD-1810\/substitutes$/)
    const early = page.getByRole('article', { name: /TM-HD-1800/ })
    await expect.poll(() => early.count(), within).toBe(1)
    expect(await early.textContent()).toContain('TM-BL-1800')
    expect(await early.getByRole('row', { name: /Chamber \(cc\)/ }).textContent()).toMatch(/46.*48/)
    await saveScreenshot(page, 'counter-substitutes')
    await page.setViewportSize({ width: 768, height: 1024 })
    await saveScreenshot(page, 'counter-substitutes-768')
    await page.setViewportSize({ width: 1366, height: 900 })
  })

  it('opens the part page with a summary whose cells choose a kind and relation, and folds kinds in the address', async () => {
    await page.goto(`${server.url}/parts/TM-BL-1800`)
    const summary = page.getByRole('region', { name: 'At a glance' })
    await expect.poll(() => summary.getByRole('row').count(), within).toBeGreaterThan(2)
    // Kinds with reviewed fits head the summary.
    const firstRow = summary.getByRole('row').nth(1)
    expect(await firstRow.textContent()).toMatch(/\d+ reviewed/)
    await saveScreenshot(page, 'counter-part-summary')
    const tall = await page.evaluate(() => document.documentElement.scrollHeight)

    await summary.getByRole('button', { name: 'Fold every kind' }).click()
    await page.waitForURL(/[?&]fold=/)
    const toggles = page.locator('.fit-group-list').getByRole('button', { expanded: true })
    await expect.poll(() => toggles.count(), within).toBe(0)
    const short = await page.evaluate(() => document.documentElement.scrollHeight)
    expect(short).toBeLessThan(tall)
    await page.reload()
    await expect.poll(() => page.getByRole('button', { name: /^Cylinder head \(/, expanded: false }).count(), within).toBe(1)
    await page.setViewportSize({ width: 768, height: 1024 })
    await saveScreenshot(page, 'counter-part-folded-768')
    await page.setViewportSize({ width: 1366, height: 900 })

    await page.getByRole('button', { name: /^Cylinder head \(/ }).click()
    await expect.poll(() => page.getByRole('button', { name: /^Cylinder head \(/, expanded: true }).count(), within).toBe(1)
    expect(new URL(page.url()).searchParams.get('fold')).not.toContain('head,')

    await summary.getByRole('button', { name: 'Cylinder head: fits, show only these' }).click()
    await page.waitForURL((url) => url.searchParams.get('kind') === 'head' && url.searchParams.get('relation') === 'fits')
    await expect.poll(() => page.getByRole('list', { name: /^Cylinder head: fits, reviewed/ }).count(), within).toBe(1)
    expect(await page.getByRole('list', { name: /^Head gasket/ }).count()).toBe(0)
  })

  it('keeps the top-bar search usable on a 768 px tablet, light and dark', async () => {
    await page.setViewportSize({ width: 768, height: 1024 })
    await page.goto(`${server.url}/parts/TM-BL-2010`)
    await expect.poll(() => page.getByRole('list', { name: 'Near matches' }).count(), within).toBe(1)
    const box = await page.getByRole('combobox', { name: 'Search parts' }).boundingBox()
    expect(box!.width).toBeGreaterThan(150)
    expect(box!.x + box!.width).toBeLessThanOrEqual(768)
    await saveScreenshot(page, 'counter-near-matches-768')
    await page.getByRole('button', { name: 'Use dark theme' }).click()
    await expect.poll(() => page.evaluate(() => document.documentElement.classList.contains('fw-dark')), within).toBe(true)
    await saveScreenshot(page, 'counter-near-matches-dark-768')
    await page.setViewportSize({ width: 1366, height: 900 })
    await page.goto(`${server.url}/parts/TM-BL-1999`)
    await expect.poll(() => page.getByRole('status').filter({ hasText: 'superseded' }).count(), within).toBe(1)
    await saveScreenshot(page, 'counter-superseded-dark')
    await page.goto(`${server.url}/parts/TM-HD-1810/substitutes`)
    await expect.poll(() => page.getByRole('article').count(), within).toBeGreaterThan(0)
    await saveScreenshot(page, 'counter-substitutes-dark')
    await page.getByRole('button', { name: 'Use light theme' }).click()
  })
})
