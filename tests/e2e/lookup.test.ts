import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, saveScreenshot, signInAs, type RunningServer, openBrowserSession, type BrowserSession } from '../helpers/browser'
import { nodePosition, waitForGraph } from '../helpers/graph-page'

const run = browserAvailable()
/** A fresh page loads the client, restores the session and asks the API: give it time. */
const within = { timeout: 10_000 }

describe.skipIf(!run)('counter: what fits a head, and the fit graph', () => {
  let session: BrowserSession
  let server: RunningServer
  let page: Page
  let consoleErrors: string[] = []

  beforeAll(async () => {
    session = await openBrowserSession({ viewport: { width: 1280, height: 860 } })
    ;({ server, page, consoleErrors } = session)
  })
  afterAll(() => session?.close())

  it('lands a counter on the lookup after sign-in', async () => {
    await signInAs(page, server.url, 'counter')
    await page.waitForURL(/\/lookup$/)
    expect(await page.getByRole('heading', { name: 'Look up a part' }).isVisible()).toBe(true)
    expect(await page.getByRole('combobox', { name: 'Find a part' }).evaluate((input) => input === document.activeElement)).toBe(true)
    await saveScreenshot(page, 'lookup')
  })

  it('suggests parts while a casting mark is typed and opens the highlighted one with Enter', async () => {
    await page.getByRole('combobox', { name: 'Find a part' }).pressSequentially('h20-318', { delay: 40 })
    const first = page.getByRole('option').first()
    await expect.poll(() => first.textContent(), within).toContain('TM-HD-2000')
    expect(await first.textContent()).toContain('H20-3180')
    await saveScreenshot(page, 'lookup-suggestions')
    await page.keyboard.press('Enter')
    await page.waitForURL(/\/parts\/TM-HD-2000$/)
  })

  it('shows the head and what else fits it, grouped by kind and relation', async () => {
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent(), within).toContain('TM-HD-2000')
    const blocksWithMod = page.getByRole('list', { name: 'Cylinder block: fits with modification' })
    expect(await blocksWithMod.textContent()).toContain('TM-BL-1800')
    expect(await blocksWithMod.textContent()).toContain('Fit an oil feed restrictor')
    expect(await page.getByRole('list', { name: 'Intake manifold: does not fit' }).textContent()).toContain('TM-IM-1800')
    await saveScreenshot(page, 'part-page')
  })

  it('explains why a block fits with modification: the reviewed link and the steps of the work', async () => {
    await page.getByRole('button', { name: 'Why: TM-BL-1800' }).click()
    const dialog = page.getByRole('dialog')
    await dialog.waitFor()
    expect(await dialog.textContent()).toContain('reviewed link')
    expect(await dialog.getByRole('list', { name: 'Steps' }).locator('li').count()).toBeGreaterThan(1)
    expect(await dialog.textContent()).toContain('Caution:')
    await saveScreenshot(page, 'part-why')
    await page.keyboard.press('Escape')
    await dialog.waitFor({ state: 'hidden' })
  })

  it('filters by relation and by rule inference, keeping the filters in a shareable address', async () => {
    await page.getByRole('button', { name: /Does not fit \(\d+\)/ }).click()
    await page.waitForURL(/relation=does-not-fit/)
    await expect.poll(() => page.getByRole('list', { name: 'Cylinder block: fits with modification' }).count(), within).toBe(0)
    expect(await page.getByText('TM-IM-1800').first().isVisible()).toBe(true)
    await page.getByLabel('Include answers inferred by the rules').uncheck()
    await page.waitForURL(/inferred=0/)
    await page.reload()
    await expect.poll(() => page.getByRole('status').filter({ hasText: 'Nothing matches these filters' }).count(), within).toBe(1)
    expect(await page.getByLabel('Include answers inferred by the rules').isChecked()).toBe(false)
    await page.getByLabel('Include answers inferred by the rules').check()
    await page.getByRole('button', { name: /^All$/ }).click()
    await page.waitForURL((url) => !url.search.includes('relation'))
  })

  it('opens the fit graph of the head, with a legend that tells relations by line, marker and words', async () => {
    await page.getByRole('link', { name: 'Show in fit graph' }).click()
    await page.waitForURL(/\/graph\/TM-HD-2000$/)
    await waitForGraph(page)
    const legend = page.getByRole('region', { name: 'Legend' })
    expect(await legend.textContent()).toContain('Fits with modification')
    expect(await legend.textContent()).toContain('Same part, another number')
    const table = page.getByRole('table')
    expect(await table.textContent()).toContain('TM-BL-1800')
    expect(await page.getByRole('img', { name: /Fit graph around TM-HD-2000: 3 parts, 2 connections/ }).count()).toBe(1)
    await saveScreenshot(page, 'graph-neighbourhood')
  })

  it('re-centres on a part clicked in the graph and opens a part double-clicked', async () => {
    const block = await nodePosition(page, 'TM-BL-1800')
    await page.mouse.click(block.x, block.y)
    await page.waitForURL(/\/graph\/TM-BL-1800$/)
    await waitForGraph(page)
    await page.getByRole('button', { name: '2 steps' }).click()
    await page.waitForURL(/depth=2/)
    await waitForGraph(page)
    await saveScreenshot(page, 'graph-two-steps')
    const head = await nodePosition(page, 'TM-HD-1800')
    await page.mouse.dblclick(head.x, head.y)
    await page.waitForURL(/\/parts\/TM-HD-1800$/)
  })

  it('finds the chain of fits between a sealed distributor and a block', async () => {
    await page.goto(`${server.url}/graph/path?from=TM-DS-2005&to=TM-BL-1800`)
    await waitForGraph(page)
    expect(await page.getByRole('status').filter({ hasText: 'reaches TM-BL-1800 through 3 fit links' }).count()).toBe(1)
    expect(await page.getByRole('table').textContent()).toContain('TM-XA-0203')
    await saveScreenshot(page, 'graph-path')
  })

  it('draws the graph and the part page in the dark theme and at tablet width', async () => {
    await page.goto(`${server.url}/graph/TM-HD-2000?depth=2`)
    await waitForGraph(page)
    await page.getByRole('button', { name: 'Use dark theme' }).click()
    await expect.poll(() => page.evaluate(() => document.documentElement.classList.contains('fw-dark')), within).toBe(true)
    await page.waitForTimeout(300)
    await saveScreenshot(page, 'graph-dark')
    await page.setViewportSize({ width: 768, height: 1024 })
    await page.goto(`${server.url}/parts/TM-BL-1800`)
    await page.getByRole('heading', { name: /What fits TM-BL-1800/ }).waitFor()
    await saveScreenshot(page, 'part-page-dark-768')
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)
    expect(overflow).toBeLessThanOrEqual(0)
    await page.getByRole('button', { name: 'Use light theme' }).click()
    await page.goto(`${server.url}/graph/TM-HD-2000`)
    await waitForGraph(page)
    await saveScreenshot(page, 'graph-768')
  })

  it('logged no console errors', () => {
    expect(consoleErrors.filter((text) => !text.includes('401'))).toEqual([])
  })
})
