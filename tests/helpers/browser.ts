import { spawn, type ChildProcess } from 'node:child_process'
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { chromium, type Browser, type BrowserContext, type BrowserContextOptions, type Page } from 'playwright-core'

const ROOT = path.resolve(import.meta.dirname, '../..')
export const SCREENSHOT_DIR = path.join(ROOT, 'tests', 'output')

/** Debian's chromium, or CHROMIUM_PATH; null when there is none. */
export function chromiumPath(): string | null {
  const candidates = [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser']
  return candidates.find((candidate) => candidate && existsSync(candidate)) ?? null
}

/**
 * Whether browser tests run. Without a browser they are skipped with a notice,
 * unless FITWRIGHT_E2E=required makes a missing browser a failure.
 */
export function browserAvailable(): boolean {
  if (chromiumPath()) return true
  if (process.env.FITWRIGHT_E2E === 'required') {
    throw new Error("FITWRIGHT_E2E=required but no chromium was found (install Debian's chromium or set CHROMIUM_PATH).")
  }
  console.warn('\n*** Browser tests SKIPPED: no chromium at /usr/bin/chromium or CHROMIUM_PATH. ***\n')
  return false
}

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: chromiumPath()!,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  })
}

export type RunningServer = { url: string; stop: () => Promise<void> }

/** Starts the production server on a free port with a fresh demo database. */
export async function startServer(env: Record<string, string> = {}): Promise<RunningServer> {
  const dir = mkdtempSync(path.join(tmpdir(), 'fitwright-e2e-'))
  const child: ChildProcess = spawn(path.join(ROOT, 'node_modules', '.bin', 'tsx'), ['server/index.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: '0',
      HOST: '127.0.0.1',
      FITWRIGHT_DB_PATH: path.join(dir, 'e2e.sqlite'),
      FITWRIGHT_UPLOAD_DIR: path.join(dir, 'uploads'),
      FITWRIGHT_MAIL_DIR: path.join(dir, 'mail'),
      FITWRIGHT_COOKIE_SECURE: 'auto',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  })
  let output = ''
  const url = await new Promise<string>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`Server did not start:\n${output}`)), 60_000)
    const onData = (chunk: Buffer) => {
      output += chunk.toString()
      const match = /running at (http:\/\/localhost:\d+)\//.exec(output)
      if (match) {
        clearTimeout(timer)
        resolve(match[1]!.replace('localhost', '127.0.0.1'))
      }
    }
    child.stdout?.on('data', onData)
    child.stderr?.on('data', onData)
    child.on('exit', (code) => {
      clearTimeout(timer)
      reject(new Error(`Server exited with ${code}:\n${output}`))
    })
  })
  return {
    url,
    async stop() {
      child.removeAllListeners('exit')
      const exited = new Promise((resolve) => child.once('exit', resolve))
      child.kill('SIGTERM')
      await exited
      rmSync(dir, { recursive: true, force: true })
    },
  }
}

/** Saves a screenshot for a reviewer under tests/output (not committed). */
export async function saveScreenshot(page: Page, name: string) {
  mkdirSync(SCREENSHOT_DIR, { recursive: true })
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true })
}

export async function signInAs(page: Page, baseUrl: string, role: 'admin' | 'editor' | 'counter' | 'tech') {
  await page.goto(`${baseUrl}/sign-in`)
  await page.getByLabel('E-mail').fill(`${role}@fitwright.test`)
  await page.getByLabel('Password').fill('fitwright-demo')
  await page.getByRole('button', { name: 'Sign in' }).click()
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'))
}

export type BrowserSession = {
  server: RunningServer
  browser: Browser
  context: BrowserContext
  page: Page
  /** Console errors and uncaught page errors seen so far. */
  consoleErrors: string[]
  close: () => Promise<void>
}

/** A production server on a fresh demo database and one browser page, for one test file. */
/** `serverEnv` adds settings to the server's environment (e.g. where the local SMTP fake keeps its mail). */
export async function openBrowserSession(
  options: BrowserContextOptions = {},
  serverEnv: Record<string, string> = {},
): Promise<BrowserSession> {
  const server = await startServer(serverEnv)
  const browser = await launchBrowser()
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, ...options })
  const page = await context.newPage()
  const consoleErrors: string[] = []
  page.on('console', (message) => {
    if (message.type() === 'error') consoleErrors.push(message.text())
  })
  page.on('pageerror', (error) => consoleErrors.push(error.message))
  return {
    server,
    browser,
    context,
    page,
    consoleErrors,
    async close() {
      await browser.close()
      await server.stop()
    },
  }
}
