import type { Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, openBrowserSession, saveScreenshot, signInAs, type BrowserSession, type RunningServer } from '../helpers/browser'

const run = browserAvailable()
const within = { timeout: 10_000 }
const pairReason = (page: Page, label: string) => page.locator('.planner-pairs li', { hasText: label }).first().locator('.reason')

describe.skipIf(!run)('technician: ignition and induction details on the planner', () => {
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
  ])('on %s, the adapter plate says what it does to the drive dog, and the leads follow the housing cap', async (name, width, height) => {
    await page.setViewportSize({ width, height })
    await page.goto(`${server.url}/planner?head=TM-HD-1800&distributor=TM-DS-2008&ignition-leads=TM-IL-2000`)
    await expect.poll(() => pairReason(page, 'Distributor on head').textContent(), within).toMatch(/keeps 4 mm of its 12 mm/)
    await saveScreenshot(page, `planner-ignition-plate-${name}`)
    await page.goto(`${server.url}/planner?head=TM-HD-1800&distributor=TM-DS-2000&ignition-leads=TM-IL-2000&ecu=TM-EC-2000`)
    await expect
      .poll(() => pairReason(page, 'Leads on distributor cap').textContent(), within)
      .toMatch(/CAP-A cap of the DM-3 housing .* not the donor distributor's CAP-B/)
    expect(await pairReason(page, 'Distributor pickup into control unit').textContent()).toMatch(/optical pickup gives the signal/)
    await saveScreenshot(page, `planner-ignition-transfer-${name}`)
  })

  it.each([
    ['desktop', 1366, 900],
    ['tablet', 768, 1024],
  ])('on %s, each shop caution shows its service manual section beside it', async (name, width, height) => {
    await page.setViewportSize({ width, height })
    await page.goto(`${server.url}/planner?block=TM-BL-2000&head=TM-HD-2000&head-bolt=TM-HB-2000&timing-belt=TM-TB-2000`)
    const turn = page.locator('.planner-cautions li', { hasText: 'two full turns of the crank' })
    await expect.poll(() => turn.locator('.manual').textContent(), within).toBe('Service manual: timing marks and belt tension')
    await saveScreenshot(page, `planner-ignition-cautions-${name}`)
  })
})
