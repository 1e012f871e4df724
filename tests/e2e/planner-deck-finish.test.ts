import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, openBrowserSession, saveScreenshot, signInAs, type BrowserSession, type RunningServer } from '../helpers/browser'

const run = browserAvailable()
const within = { timeout: 10_000 }
const pairReason = (page: Page, label: string) => page.locator('.planner-pairs li', { hasText: label }).first().locator('.reason')
const BUILD = 'block=TM-BL-1800&head=TM-HD-1810&head-gasket=TM-HG-1807'

describe.skipIf(!run)('technician: the deck and head face as measured, against the head gasket', () => {
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
  ])('on %s, typing a rough deck reading turns the gasket pair into a resurface with the limit named', async (name, width, height) => {
    await page.setViewportSize({ width, height })
    await page.goto(`${server.url}/planner?${BUILD}`)
    await expect.poll(() => pairReason(page, 'Head gasket on block deck').textContent(), within).not.toMatch(/as measured/)
    const finish = page.getByLabel('Deck finish', { exact: true })
    await finish.fill('2.4')
    await finish.press('Enter')
    const flat = page.getByLabel('Deck out-of-flat', { exact: true })
    await flat.fill('0.03')
    await flat.press('Enter')
    await page.waitForURL(/deckRa=2\.4.*deckFlat=0\.03|deckFlat=0\.03.*deckRa=2\.4/)
    await expect
      .poll(() => pairReason(page, 'Head gasket on block deck').textContent(), within)
      .toMatch(/Block deck as measured: Finish Ra 2\.4 µm is rougher than the 0\.76 µm a multi-layer steel gasket seals on/)
    expect(await page.locator('.planner-cautions li', { hasText: 'epoxy' }).count()).toBeGreaterThan(0)
    await expect.poll(() => page.locator('.planner-modifications', { hasText: 'Resurface the block deck' }).count(), within).toBe(1)
    await saveScreenshot(page, `planner-deck-finish-${name}`)
  })

  it.each([
    ['desktop', 1366, 900],
    ['tablet', 768, 1024],
  ])('on %s, a head with one lower boss puts a washer under that bolt only, and the parts list counts it', async (name, width, height) => {
    await page.setViewportSize({ width, height })
    await page.goto(`${server.url}/planner?block=TM-BL-2000&head=TM-HD-1812&head-gasket=TM-HG-2000&head-bolt=TM-HB-1810`)
    await expect
      .poll(() => pairReason(page, 'Head bolts into block threads').textContent(), within)
      .toMatch(/^Position 9 \(boss 85 mm\): bottoms by 0\.8 mm: add one hardened washer \(2 mm\) under this bolt only/)
    const washers = page.locator('.planner-parts-list tr', { hasText: 'Hardened washers for the odd bolt positions only (TM-XW-1120)' })
    await expect.poll(() => washers.count(), within).toBe(1)
    await saveScreenshot(page, `planner-boss-positions-${name}`)
  })

  it('shows an out-of-range reading in the banner with the field named', async () => {
    await page.setViewportSize({ width: 768, height: 1024 })
    await page.goto(`${server.url}/planner?${BUILD}&headFlat=5`)
    await expect.poll(() => page.locator('.planner-verdict').textContent(), within).toMatch(/Head face out-of-flat/)
    await saveScreenshot(page, 'planner-deck-finish-error-768')
  })
})
