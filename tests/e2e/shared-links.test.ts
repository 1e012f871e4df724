import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, launchBrowser, saveScreenshot, signInAs, startServer, type RunningServer } from '../helpers/browser'
import { receivedMail, sharedLink, type ReceivedMail } from '../helpers/mailbox'

const run = browserAvailable()
const within = { timeout: 15_000 }
const SHEET = 'TK20V head on a TK18 block'

describe.skipIf(!run)('a build sheet shared by mail, opened read-only from the mail', () => {
  let server: RunningServer
  let browser: Browser
  let mailDir = ''
  const errors: string[] = []

  /** The server's outbox goes out on its beat (every few seconds): wait for the message to land. */
  async function mailTo(email: string): Promise<ReceivedMail> {
    // Until the fake has written the whole file, the link is not in it yet.
    const landed = () => receivedMail(mailDir).find((mail) => mail.to === email && mail.text.includes('/shared#token='))
    await expect.poll(() => landed() !== undefined, within).toBe(true)
    return landed()!
  }

  async function newPage(width: number, height: number): Promise<Page> {
    const context = await browser.newContext({ viewport: { width, height } })
    const page = await context.newPage()
    page.setDefaultTimeout(15_000)
    page.on('pageerror', (error) => errors.push(error.message))
    return page
  }

  async function picture(page: Page, name: string) {
    await page.waitForTimeout(400)
    await saveScreenshot(page, name)
  }

  beforeAll(async () => {
    mailDir = mkdtempSync(path.join(tmpdir(), 'fitwright-e2e-shared-'))
    server = await startServer({ FITWRIGHT_MAIL_DIR: mailDir })
    browser = await launchBrowser()
  })
  afterAll(async () => {
    await browser?.close()
    await server?.stop()
    rmSync(mailDir, { recursive: true, force: true })
  })

  it('a tech shares a saved sheet; the mailed link shows its verdict, pairs, cautions and parts list with nothing to edit', async () => {
    const tech = await newPage(1366, 900)
    await signInAs(tech, server.url, 'tech')
    await tech.goto(`${server.url}/builds`)
    await tech.getByRole('link', { name: SHEET, exact: true }).click()
    await tech.getByRole('heading', { name: SHEET }).waitFor()
    await tech.getByRole('button', { name: 'Share by mail' }).click()
    const dialog = tech.getByRole('dialog', { name: 'Share this build sheet by mail' })
    await dialog.getByLabel("Recipient's e-mail").fill('not an address')
    await dialog.getByRole('button', { name: 'Send link' }).click()
    await dialog.getByText('Enter a valid e-mail address.').waitFor()
    await dialog.getByLabel("Recipient's e-mail").fill('customer@example.test')
    await dialog.getByLabel('Link works for (days)').fill('3')
    await picture(tech, 'shared-sheet-dialog')
    await dialog.getByRole('button', { name: 'Send link' }).click()
    await tech.getByText('customer@example.test can read it until').waitFor()
    await dialog.waitFor({ state: 'hidden' })

    const mail = await mailTo('customer@example.test')
    expect(mail.subject).toContain(SHEET)
    expect(mail.text).toContain('for 3 days')
    const { pathAndHash } = sharedLink(mail)

    for (const [width, height, name] of [
      [1366, 900, 'shared-sheet-desktop'],
      [768, 1024, 'shared-sheet-tablet'],
    ] as const) {
      // A fresh browser context: the reader has no account and no session.
      const reader = await newPage(width, height)
      await reader.goto(`${server.url}${pathAndHash}`)
      await reader.getByRole('heading', { name: SHEET }).waitFor()
      expect(reader.url()).toContain('/shared#token=')
      await reader.getByText('Read-only, shared by').waitFor()
      await reader.getByRole('heading', { name: 'Cautions' }).waitFor()
      expect(await reader.getByText('Fitwright defers to the service manual').isVisible()).toBe(true)
      expect(await reader.getByRole('heading', { name: 'Chosen parts' }).isVisible()).toBe(true)
      expect(await reader.getByRole('heading', { name: 'Modifications checklist (1)' }).isVisible()).toBe(true)
      expect(await reader.getByRole('heading', { name: /Parts list/ }).isVisible()).toBe(true)
      // Nothing to change: no form fields, no save or share.
      expect(await reader.locator('input, select, textarea').count()).toBe(0)
      expect(await reader.getByRole('button', { name: /Save|Share|Rename|Fill/ }).count()).toBe(0)
      await picture(reader, name)
      await reader.context().close()
    }
    expect(errors).toEqual([])
  })

  it('an editor shares a quote; the mailed link shows it as it prints, without the counter buttons', async () => {
    const editor = await newPage(1366, 900)
    await signInAs(editor, server.url, 'editor')
    await editor.goto(`${server.url}/builds`)
    await editor.getByRole('button', { name: `Make a quote for ${SHEET}`, exact: true }).click()
    await editor.getByLabel('Customer (optional)').fill('Walk-in, blue hatchback')
    await editor.getByRole('button', { name: 'Make the quote' }).click()
    await editor.waitForURL(/\/quotes\/\d+$/)
    await editor.getByRole('button', { name: 'Share by mail' }).click()
    const dialog = editor.getByRole('dialog', { name: 'Share this quote by mail' })
    await dialog.getByLabel("Recipient's e-mail").fill('walk-in@example.test')
    await dialog.getByRole('button', { name: 'Send link' }).click()
    await dialog.waitFor({ state: 'hidden' })

    const mail = await mailTo('walk-in@example.test')
    expect(mail.subject).toContain('Walk-in, blue hatchback')
    expect(mail.text).toContain('for 7 days')
    const reader = await newPage(768, 1024)
    await reader.goto(`${server.url}${sharedLink(mail).pathAndHash}`)
    await reader.getByRole('region', { name: 'Totals' }).waitFor()
    await reader.getByRole('heading', { name: 'Cautions' }).waitFor()
    expect(await reader.getByText('Walk-in, blue hatchback').first().isVisible()).toBe(true)
    expect(await reader.getByRole('button', { name: /Accept|Share/ }).count()).toBe(0)
    await picture(reader, 'shared-quote-tablet')
    expect(errors).toEqual([])
  })

  it('an unknown link says so instead of showing anything', async () => {
    const reader = await newPage(768, 1024)
    await reader.goto(`${server.url}/shared#token=not-a-real-token`)
    await reader.getByRole('alert').filter({ hasText: 'This link is not known' }).waitFor()
    await picture(reader, 'shared-unknown-link')
  })
})
