// Debian's Chromium driven by playwright-core (never a downloaded browser); screenshots for review.
import { randomUUID } from 'node:crypto'
import { mkdirSync } from 'node:fs'
import path from 'node:path'
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core'
import { inject } from 'vitest'
import { TEST_OUTPUT_DIR } from '../../scripts/lib/paths.mjs'

export const SCREENSHOT_DIR = path.join(TEST_OUTPUT_DIR, 'screenshots')
export const LAPTOP = { width: 1366, height: 820 }
export const PHONE = { width: 390, height: 844 }

const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--autoplay-policy=no-user-gesture-required',
  // A synthetic microphone (a beep), allowed without a prompt: recording in the browser is tested.
  '--use-fake-device-for-media-stream',
  '--use-fake-ui-for-media-stream',
]

/** Chromium; with `microphoneFile` (a WAV, see take-wav.ts) the microphone plays it in a loop. */
export function launchBrowser(options: { microphoneFile?: string } = {}): Promise<Browser> {
  const file = options.microphoneFile
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: file ? [...CHROMIUM_ARGS, `--use-file-for-fake-audio-capture=${file}`] : CHROMIUM_ARGS,
  })
}

export const baseUrl = () => inject('baseUrl')

/**
 * A new page whose requests to any other origin are recorded, so tests can assert there are none.
 * The service worker is off unless asked for: its one-time download of the whole app (~150 files)
 * would weigh on every context; tests/e2e/offline.spec.ts turns it on.
 */
export async function newPage(
  browser: Browser,
  viewport = LAPTOP,
  { serviceWorkers = 'block' }: { serviceWorkers?: 'allow' | 'block' } = {},
) {
  const context: BrowserContext = await browser.newContext({
    viewport,
    baseURL: baseUrl(),
    serviceWorkers,
  })
  const page = await context.newPage()
  const foreign: string[] = []
  const origin = new URL(baseUrl()).origin
  page.on('request', (req) => {
    const url = req.url()
    if (!url.startsWith(origin) && !url.startsWith('data:') && !url.startsWith('blob:'))
      foreign.push(url)
  })
  return { page, context, foreign }
}

export async function screenshot(page: Page, name: string) {
  mkdirSync(SCREENSHOT_DIR, { recursive: true })
  // From the top: a full-page capture of a scrolled page draws the fixed app bar mid-page.
  const scrolled = await page.evaluate(() => window.scrollY)
  if (scrolled) await page.evaluate(() => window.scrollTo(0, 0))
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true })
  if (scrolled) await page.evaluate((y) => window.scrollTo(0, y), scrolled)
}

/** Signs in through the sign-in form, as a person would. */
export async function signInThroughUi(page: Page, email: string, password = 'ambitus-demo') {
  await page.goto('/sign-in')
  await page.getByLabel('E-mail').fill(email)
  await page.getByLabel('Password', { exact: true }).fill(password)
  await page.getByRole('button', { name: 'Sign in' }).click()
}

/** The app's anti-CSRF header, as its own client sends it with every change. */
export const APP_HEADERS = { 'X-Requested-With': 'ambitus' }

/**
 * Signs a new account up through the API on this page (its cookie signs the page in): for specs that
 * change what they use, so no seeded user another spec reads changes under it. Returns the e-mail.
 */
export async function signUpFresh(
  page: Page,
  name: string,
  role: 'student' | 'teacher' = 'student',
) {
  await page.goto('/')
  const email = `${role}-${randomUUID()}@example.test`
  const res = await page.request.post('/api/auth/register', {
    headers: APP_HEADERS,
    data: { email, password: 'a long enough password', name, role },
  })
  if (res.status() !== 201) throw new Error(`sign-up answered ${res.status()}: ${await res.text()}`)
  return email
}
