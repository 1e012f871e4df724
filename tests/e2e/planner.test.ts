import { readFileSync } from 'node:fs'
import type { BrowserContext, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import {
  browserAvailable,
  saveScreenshot,
  SCREENSHOT_DIR,
  signInAs,
  type RunningServer,
  openBrowserSession,
  type BrowserSession,
} from '../helpers/browser'

const run = browserAvailable()
/** A fresh page loads the client, restores the session and asks the API: give it time. */
const within = { timeout: 10_000 }

/** Picks a part for a slot the way a technician does: type a little, choose from the suggestions. */
async function choose(page: Page, slotLabel: string, typed: string, partNumber: string) {
  const input = page.getByRole('combobox', { name: slotLabel, exact: true })
  await input.click()
  await input.pressSequentially(typed, { delay: 30 })
  const option = page.getByRole('option', { name: new RegExp(`^${partNumber}\\b`) })
  await option.first().click()
  await expect.poll(() => input.inputValue(), within).toBe(partNumber)
}

function verdictText(page: Page) {
  return page.locator('.planner-verdict').getByRole('heading', { level: 2 }).textContent()
}

describe.skipIf(!run)('technician: plan a build, get the verdict and the parts list, save and reopen it', () => {
  let session: BrowserSession
  let server: RunningServer
  let page: Page
  let context: BrowserContext
  let sheetUrl = ''
  let consoleErrors: string[] = []

  beforeAll(async () => {
    session = await openBrowserSession({ acceptDownloads: true })
    ;({ server, page, context, consoleErrors } = session)
  })
  afterAll(() => session?.close())

  it('opens an empty planner from the navigation', async () => {
    await signInAs(page, server.url, 'tech')
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Build planner' }).click()
    await page.waitForURL(/\/planner$/)
    await expect.poll(() => verdictText(page), within).toBe('No parts chosen yet')
  })

  it('suggests for the head the parts that fit the chosen block, and gives a live verdict', async () => {
    await choose(page, 'Cylinder block', 'TM-BL-18', 'TM-BL-1800')
    await page.waitForURL(/block=TM-BL-1800/)
    const head = page.getByRole('combobox', { name: 'Cylinder head', exact: true })
    await head.click()
    await head.pressSequentially('TM-HD', { delay: 30 })
    const suggested = page.getByRole('option', { name: /^TM-HD-2000\b/ }).first()
    await expect.poll(() => suggested.textContent(), within).toContain('Fits with modification')
    // The visible window only: a full-page capture would close the open list. The block's list fades out first.
    await page.waitForTimeout(400)
    await page.screenshot({ path: `${SCREENSHOT_DIR}/planner-slot-suggestions.png` })
    await suggested.click()
    await page.waitForURL(/head=TM-HD-2000/)
    await expect.poll(() => verdictText(page), within).toBe('The parts chosen so far fit with modifications')
    expect(await page.getByRole('region', { name: /Mating pairs/ }).textContent()).toContain('Head on block')
  })

  it('undoes a slot change with the browser Back button and redoes it with Forward', async () => {
    const head = page.getByRole('combobox', { name: 'Cylinder head', exact: true })
    await page.goBack()
    await page.waitForURL((url) => url.searchParams.get('block') === 'TM-BL-1800' && !url.searchParams.has('head'))
    await expect.poll(() => head.inputValue(), within).toBe('')
    await page.goForward()
    await page.waitForURL(/head=TM-HD-2000/)
    await expect.poll(() => head.inputValue(), within).toBe('TM-HD-2000')
    await expect.poll(() => verdictText(page), within).toBe('The parts chosen so far fit with modifications')
  })

  it('takes the build context and fills the gaps with parts that fit', async () => {
    await page.getByLabel('Target power').fill('110')
    await page.getByLabel('Fuel octane').fill('91')
    await page.getByLabel('Car model year').fill('1994')
    await page.getByLabel('Car model year').press('Tab')
    await page.waitForURL(/power=110.*octane=91.*year=1994/)
    // A double click runs it once: one toast, one set of choices.
    await page.getByRole('button', { name: 'Fill the gaps' }).dblclick()
    await expect.poll(() => page.locator('.p-toast').textContent(), within).toContain('Filled 16 slots')
    await page.waitForTimeout(500)
    expect(await page.locator('.p-toast-message').count()).toBe(1)
    // The toast sits below the top bar, clear of its controls.
    const bar = await page.locator('header.app-bar').boundingBox()
    const toast = await page.locator('.p-toast-message').boundingBox()
    expect(toast!.y).toBeGreaterThanOrEqual(bar!.y + bar!.height)
    await page.screenshot({ path: `${SCREENSHOT_DIR}/planner-fill-toast.png` })
    expect(await page.locator('.p-toast').textContent()).toContain('Every slot now has a part.')
    await expect.poll(() => page.getByRole('combobox', { name: 'Head gasket', exact: true }).inputValue(), within).toMatch(/^TM-HG-/)
    await expect.poll(() => page.locator('.planner-verdict').getAttribute('aria-busy'), within).toBe('false')
    // The demo's classic swap: the TK18 block needs an oil feed restrictor under the TK20V head.
    await expect.poll(() => verdictText(page), within).toBe('The build fits with modifications')
    expect(await page.getByRole('region', { name: /Modifications checklist/ }).textContent()).toContain('Fit an oil feed restrictor')
  })

  it('opens exactly the number a scanner types into a slot on Enter, and Back puts the old part back', async () => {
    const gasket = page.getByRole('combobox', { name: 'Head gasket', exact: true })
    const before = await gasket.inputValue()
    expect(before).not.toBe('TM-HG-2016')
    await gasket.focus()
    // A scanner or autofill: the whole number in one input event, Enter at once.
    await gasket.fill('TM-HG-2016')
    await gasket.press('Enter')
    await page.waitForURL(/head-gasket=TM-HG-2016/)
    await expect.poll(() => gasket.inputValue(), within).toBe('TM-HG-2016')
    await page.goBack()
    await page.waitForURL(new RegExp(`head-gasket=${before}`))
    await expect.poll(() => gasket.inputValue(), within).toBe(before)
    await expect.poll(() => page.locator('.planner-verdict').getAttribute('aria-busy'), within).toBe('false')
    await expect.poll(() => verdictText(page), within).toBe('The build fits with modifications')
  })

  it('shows the full parts list with quantities, the figures with units and the cautions in plain sight', async () => {
    const partsList = page.getByRole('region', { name: /Parts list/ })
    const injectorRow = partsList.getByRole('row').filter({ hasText: 'Chosen injectors.' })
    expect(await injectorRow.getByRole('cell').nth(2).textContent()).toBe('4')
    expect(await partsList.getByRole('row').count()).toBeGreaterThan(15)
    const figures = page.getByRole('region', { name: 'Figures' })
    expect(await figures.textContent()).toMatch(/Displacement\s*1,796\s*cc/)
    expect(await figures.textContent()).toMatch(/compression ratio\s*\d+\.\d\d\s*: 1/)
    expect(await figures.textContent()).toMatch(/Injector headroom\s*-?\d+\.\d\s*%/)
    const cautions = page.getByRole('region', { name: 'Cautions' })
    expect(await cautions.locator('li').first().getAttribute('data-severity')).toBe('danger')
    expect(await cautions.textContent()).toContain('defers to the service manual, local codes and licensed practice')
    await saveScreenshot(page, 'planner-filled')
  })

  it('exports the parts list as a CSV file', async () => {
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: 'Export parts list (CSV)' }).click(),
    ])
    expect(download.suggestedFilename()).toBe('build-parts-list.csv')
    const text = readFileSync((await download.path())!, 'utf8')
    expect(text.replace(/^\uFEFF/, '').split('\r\n')[0]).toBe(
      '"Part number","Description","Quantity","Unit","From the shelf","Category","Reason"',
    )
    // The demo's new head on the counter's shelf (data/demo/stock.json).
    expect(text).toContain(
      '"TM-HD-2000","TK20V cylinder head","1","piece","Northgate counter · Aisle 3, shelf 2 · new · 489.00","Chosen part"',
    )
  })

  it('saves the build as a sheet under a name', async () => {
    await page.getByRole('button', { name: 'Save build sheet' }).click()
    await page.getByLabel('Name of the build sheet').fill('Bench swap for bay 3')
    await page.getByRole('dialog').getByRole('button', { name: 'Save' }).click()
    await page.waitForURL(/\/planner\/\d+\?/)
    sheetUrl = page.url()
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent(), within).toBe('Bench swap for bay 3')
    expect(await page.getByRole('button', { name: 'Save changes' }).isDisabled()).toBe(true)
  })

  it('finds the sheet among the build sheets, renames it and reopens it with its slots', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Build sheets' }).click()
    await page.waitForURL(/\/builds$/)
    const row = page.getByRole('row').filter({ hasText: 'Bench swap for bay 3' })
    await row.waitFor()
    await page.getByRole('row').filter({ hasText: 'TK20V as built at the factory' }).waitFor()
    await row.getByRole('button', { name: 'Rename Bench swap for bay 3' }).click()
    await page.getByLabel('Name of the build sheet').fill('Bench swap for bay 3, customer copy')
    await page.getByRole('dialog').getByRole('button', { name: 'Rename' }).click()
    await page.getByRole('row').filter({ hasText: 'customer copy' }).waitFor()
    await page.getByRole('dialog').waitFor({ state: 'detached' })
    await saveScreenshot(page, 'build-sheets')
    await page.getByRole('link', { name: 'Open Bench swap for bay 3, customer copy' }).click()
    await page.waitForURL(/\/planner\/\d+/)
    await expect.poll(() => page.getByRole('combobox', { name: 'Cylinder head', exact: true }).inputValue(), within).toBe('TM-HD-2000')
    expect(await page.getByRole('combobox', { name: 'Cylinder block', exact: true }).inputValue()).toBe('TM-BL-1800')
    expect(await page.getByLabel('Target power').inputValue()).toBe('110 kW')
    await expect.poll(() => verdictText(page), within).toMatch(/^The build /)
    expect(await page.getByText('unsaved changes').count()).toBe(0)
  })

  it('opens the same build from its address in a fresh tab', async () => {
    const other = await context.newPage()
    await other.goto(sheetUrl)
    await expect.poll(() => other.getByRole('combobox', { name: 'Cylinder head', exact: true }).inputValue(), within).toBe('TM-HD-2000')
    await expect.poll(() => other.getByRole('heading', { level: 1 }).textContent(), within).toBe('Bench swap for bay 3, customer copy')
    await other.close()
  })

  it('prints the sheet without navigation or controls, with slots, verdict, work, parts and cautions', async () => {
    await page.emulateMedia({ media: 'print' })
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false)
    expect(await page.getByRole('toolbar', { name: 'Build actions' }).isVisible()).toBe(false)
    expect(await page.getByRole('combobox', { name: 'Cylinder head', exact: true }).isVisible()).toBe(false)
    expect(await page.getByRole('region', { name: 'Chosen parts' }).isVisible()).toBe(true)
    for (const name of [/Mating pairs/, /Modifications checklist/, /Parts list/, 'Figures', 'Cautions']) {
      expect(await page.getByRole('region', { name }).isVisible()).toBe(true)
    }
    await saveScreenshot(page, 'planner-print')
    await page.pdf({ path: `${SCREENSHOT_DIR}/planner-print.pdf`, format: 'A4', printBackground: false })
    await page.emulateMedia({ media: 'screen' })
  })

  it('keeps checklist ticks through a save and a reload, and asks before leaving a sheet with unsaved ticks', async () => {
    const steps = page.getByRole('region', { name: /Modifications checklist/ }).getByRole('checkbox')
    await steps.first().check()
    await page.getByText('unsaved changes').waitFor()
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Build sheets' }).click()
    const ask = page.getByRole('alertdialog').or(page.getByRole('dialog')).filter({ hasText: 'Leave without saving?' })
    await ask.waitFor()
    await saveScreenshot(page, 'planner-unsaved-guard')
    await ask.getByRole('button', { name: 'Stay' }).click()
    expect(page.url()).toMatch(/\/planner\/\d+/)
    await page.getByRole('button', { name: 'Save changes' }).click()
    await expect.poll(() => page.getByText('unsaved changes').count(), within).toBe(0)
    await page.reload()
    await expect.poll(() => steps.first().isChecked(), within).toBe(true)
    expect(await steps.nth(1).isChecked()).toBe(false)
    await steps.nth(1).check()
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Build sheets' }).click()
    await ask.getByRole('button', { name: 'Leave without saving' }).click()
    await page.waitForURL(/\/builds$/)
  })

  it('shows a demo sheet that does not fit in the dark theme and at tablet width', async () => {
    await page.goto(`${server.url}/builds`)
    await page.getByRole('link', { name: 'Open TK18 head on a TK20V block with torque-to-yield bolts' }).click()
    await expect.poll(() => verdictText(page), within).toBe('The parts chosen so far do not fit')
    await saveScreenshot(page, 'planner-does-not-fit')
    await page.getByRole('button', { name: 'Use dark theme' }).click()
    await page.setViewportSize({ width: 768, height: 1024 })
    await page.waitForTimeout(300)
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)
    expect(overflow).toBeLessThanOrEqual(0)
    await saveScreenshot(page, 'planner-dark-768')
    await page.getByRole('button', { name: 'Use light theme' }).click()
  })

  it('finds sheets by name on a 768 px tablet, with finger-sized Rename and Delete kept apart', async () => {
    await page.setViewportSize({ width: 768, height: 1024 })
    await page.goto(`${server.url}/builds`)
    const row = page.getByRole('row').filter({ hasText: 'Bench swap for bay 3, customer copy' })
    await row.waitFor()
    const rename = await row.getByRole('button', { name: /^Rename / }).boundingBox()
    const remove = await row.getByRole('button', { name: /^Delete / }).boundingBox()
    for (const box of [rename!, remove!]) {
      expect(box.width).toBeGreaterThanOrEqual(44)
      expect(box.height).toBeGreaterThanOrEqual(44)
    }
    expect(remove!.x - (rename!.x + rename!.width)).toBeGreaterThanOrEqual(16)
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)
    expect(overflow).toBeLessThanOrEqual(0)
    await saveScreenshot(page, 'build-sheets-768')
    await page.getByLabel('Search', { exact: true }).fill('TK18 head')
    await expect
      .poll(
        () =>
          page
            .getByRole('status')
            .filter({ hasText: / of \d+ sheets/ })
            .textContent(),
        within,
      )
      .toMatch(/^[1-9]\d* of \d+ sheets$/)
    expect(await page.getByRole('row').filter({ hasText: 'Bench swap for bay 3' }).count()).toBe(0)
    expect(await page.getByRole('row').filter({ hasText: 'TK18 head on a TK20V block' }).count()).toBeGreaterThan(0)
    await saveScreenshot(page, 'build-sheets-search-768')
    await page.setViewportSize({ width: 1280, height: 900 })
  })

  it('logged no console errors', () => {
    expect(consoleErrors.filter((text) => !text.includes('401'))).toEqual([])
  })
})
