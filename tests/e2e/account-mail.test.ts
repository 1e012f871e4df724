import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { browserAvailable, launchBrowser, saveScreenshot, signInAs, startServer, type RunningServer } from '../helpers/browser'
import { passwordLink, receivedMail, type ReceivedMail } from '../helpers/mailbox'

const run = browserAvailable()
const within = { timeout: 15_000 }
const NEW_PASSWORD = 'three-stage-torque-9'

describe.skipIf(!run)('forgot password and invitations, through the mail the local SMTP fake keeps', () => {
  let server: RunningServer
  let browser: Browser
  let mailDir = ''
  const errors: string[] = []

  /** The server's outbox goes out on its beat (every few seconds): wait for the message to land. */
  async function mailTo(email: string, count = 1): Promise<ReceivedMail> {
    await expect.poll(() => receivedMail(mailDir).filter((mail) => mail.to === email).length, within).toBeGreaterThanOrEqual(count)
    return receivedMail(mailDir).filter((mail) => mail.to === email)[count - 1]!
  }

  async function newPage(width: number, height: number): Promise<Page> {
    const context = await browser.newContext({ viewport: { width, height } })
    const page = await context.newPage()
    // A step that cannot happen fails with its own message, well before the test's time runs out.
    page.setDefaultTimeout(15_000)
    page.on('pageerror', (error) => errors.push(error.message))
    return page
  }

  /** Lets a message or dialog finish fading in before the picture is taken. */
  async function picture(page: Page, name: string) {
    await page.waitForTimeout(400)
    await saveScreenshot(page, name)
  }

  beforeAll(async () => {
    mailDir = mkdtempSync(path.join(tmpdir(), 'fitwright-e2e-mail-'))
    server = await startServer({ FITWRIGHT_MAIL_DIR: mailDir })
    browser = await launchBrowser()
  })
  afterAll(async () => {
    await browser?.close()
    await server?.stop()
    rmSync(mailDir, { recursive: true, force: true })
  })

  it('mails a reset link from "Forgot password", sets a new password from it, and signs in with that', async () => {
    const page = await newPage(1366, 900)
    await page.goto(`${server.url}/sign-in`)
    await page.getByLabel('E-mail').fill('tech@fitwright.test')
    await page.getByRole('link', { name: 'Forgot password?' }).click()
    await page.waitForURL(/\/forgot-password/)
    expect(await page.getByLabel('E-mail').inputValue()).toBe('tech@fitwright.test')
    await page.getByRole('button', { name: 'Mail me a link' }).click()
    await page.getByRole('status').filter({ hasText: 'a link to set a new password is on its way' }).waitFor()
    await picture(page, 'forgot-password-sent')

    const mail = await mailTo('tech@fitwright.test')
    expect(mail.subject).toBe('Set a new Fitwright password')
    await page.goto(`${server.url}${passwordLink(mail).pathAndHash}`)
    await page.getByRole('heading', { name: 'Choose a new password' }).waitFor()
    expect(await page.getByText('For tech@fitwright.test.').isVisible()).toBe(true)
    await page.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD)
    await page.getByLabel('Repeat the password').fill('three-stage-torque-8')
    await page.getByRole('button', { name: 'Set password' }).click()
    await page.getByText('The two passwords differ.').waitFor()
    await page.getByLabel('Repeat the password').fill(NEW_PASSWORD)
    await picture(page, 'set-password')
    await page.getByRole('button', { name: 'Set password' }).click()

    await page.waitForURL(/\/sign-in/, within)
    await page.getByText('Your password is set. Sign in with it.').waitFor()
    expect(await page.getByLabel('E-mail').inputValue()).toBe('tech@fitwright.test')
    await page.getByLabel('Password').fill(NEW_PASSWORD)
    await page.getByRole('button', { name: 'Sign in' }).click()
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), within)
    await page.getByRole('link', { name: /Your account/ }).waitFor()

    // The same link a second time says it is spent, and offers a new one.
    await page.goto(`${server.url}${passwordLink(mail).pathAndHash}`)
    await page.getByText('This link has expired or was used already. Ask for a new one.').waitFor()
    expect(await page.getByRole('link', { name: 'Mail me a new link' }).isVisible()).toBe(true)
    await page.context().close()
  }, 90_000)

  it('lets an administrator invite a user at tablet width, who chooses a password from the mail and signs in', async () => {
    const admin = await newPage(768, 1024)
    await signInAs(admin, server.url, 'admin')
    await admin.goto(`${server.url}/users`)
    await admin.getByLabel('E-mail').fill('new.fitter@shop.test')
    await admin.getByLabel('Name').fill('New Fitter')
    await admin.getByRole('button', { name: 'Send invitation' }).click()
    await admin.getByText('Invitation sent to New Fitter').first().waitFor()
    await expect.poll(() => admin.getByRole('table', { name: 'Users' }).textContent(), within).toContain('Invited')
    await picture(admin, 'users-invited-tablet')

    const invite = await mailTo('new.fitter@shop.test')
    expect(invite.subject).toBe('You are invited to Fitwright')
    const guest = await newPage(768, 1024)
    await guest.goto(`${server.url}${passwordLink(invite).pathAndHash}`)
    await guest.getByRole('heading', { name: 'Choose your password' }).waitFor()
    expect(await guest.getByText('Welcome, New Fitter.').isVisible()).toBe(true)
    await picture(guest, 'set-password-invite-tablet')
    await guest.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD)
    await guest.getByLabel('Repeat the password').fill(NEW_PASSWORD)
    await guest.getByRole('button', { name: 'Set password' }).click()
    await guest.waitForURL(/\/sign-in/, within)
    await guest.getByLabel('Password').fill(NEW_PASSWORD)
    await guest.getByRole('button', { name: 'Sign in' }).click()
    await guest.waitForURL((url) => !url.pathname.startsWith('/sign-in'), within)
    await guest.context().close()

    // The outbox shows both messages as sent, and a message's text with its link cut short.
    await admin.goto(`${server.url}/mail`)
    const table = admin.getByRole('table', { name: 'Outbox' })
    await expect.poll(() => table.textContent(), within).toContain('You are invited to Fitwright')
    expect(await table.textContent()).toContain('Set a new Fitwright password')
    expect(await table.getByText('Sent').count()).toBeGreaterThanOrEqual(2)
    await picture(admin, 'mail-outbox-tablet')
    await admin.getByRole('button', { name: 'Read You are invited to Fitwright to new.fitter@shop.test' }).click()
    const text = admin.getByLabel('Message text')
    await expect.poll(() => text.textContent(), within).toContain('Hello New Fitter,')
    expect(await text.textContent()).toContain('#token=(removed)')
    await picture(admin, 'mail-message-tablet')
    await admin.context().close()
  }, 120_000)

  it('shows the mail screen and the account page at desktop width', async () => {
    const admin = await newPage(1366, 900)
    await signInAs(admin, server.url, 'admin')
    await admin.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Mail' }).click()
    await admin.waitForURL(/\/mail$/)
    await expect.poll(() => admin.getByRole('table', { name: 'Outbox' }).locator('tbody tr').count(), within).toBeGreaterThanOrEqual(2)
    await picture(admin, 'mail-outbox')
    await admin.getByRole('link', { name: /Your account/ }).click()
    await admin.getByRole('heading', { name: 'Change your password' }).waitFor()
    await admin.getByLabel('Current password').fill('not-the-password')
    await admin.getByLabel('New password', { exact: true }).fill(NEW_PASSWORD)
    await admin.getByLabel('Repeat the new password').fill(NEW_PASSWORD)
    await admin.getByRole('button', { name: 'Change password' }).click()
    await admin.getByText('This is not your current password.').waitFor()
    await picture(admin, 'account-password')
    await admin.context().close()
    expect(errors).toEqual([])
  }, 90_000)
})
