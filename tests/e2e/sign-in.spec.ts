// The demo people sign in through the UI and land on their home pages.
import type { Browser } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import {
  LAPTOP,
  launchBrowser,
  newPage,
  PHONE,
  screenshot,
  signInThroughUi,
} from '../helpers/browser'

let browser: Browser
beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(() => browser?.close())

describe('signing in', () => {
  it('the demo student signs in and lands on Practice, with no request leaving the origin', async () => {
    const { page, foreign, context } = await newPage(browser, LAPTOP)
    await signInThroughUi(page, 'student@cedarhollow.test')
    await page.waitForURL('**/practice')
    await expect.poll(() => page.getByTestId('practice-home').isVisible()).toBe(true)
    expect(await page.getByRole('heading', { level: 1 }).first().textContent()).toContain(
      'Practice',
    )
    await screenshot(page, 'student-home-laptop')
    expect(foreign).toEqual([])
    await context.close()
  })

  it('the demo teacher signs in and lands on the Studio with at least four students', async () => {
    const { page, foreign, context } = await newPage(browser, LAPTOP)
    await signInThroughUi(page, 'teacher@cedarhollow.test')
    await page.waitForURL('**/studio')
    const rows = page.getByTestId('roster').locator('tbody tr')
    await expect.poll(() => rows.count()).toBeGreaterThanOrEqual(4)
    expect(await page.getByTestId('roster').textContent()).toContain('Noor Halvorsen')
    await screenshot(page, 'teacher-home-laptop')
    expect(foreign).toEqual([])
    await context.close()
  })

  it('on a phone, a wrong password shows the message and the student can then sign in', async () => {
    const { page, context } = await newPage(browser, PHONE)
    await signInThroughUi(page, 'student@cedarhollow.test', 'not the password')
    await expect.poll(() => page.getByTestId('form-error').textContent()).toContain('not right')
    await screenshot(page, 'sign-in-error-phone')
    await signInThroughUi(page, 'student@cedarhollow.test')
    await page.waitForURL('**/practice')
    await screenshot(page, 'student-home-phone')
    await context.close()
  })

  it('a signed-out visitor asking for a protected page is sent to sign in, then back', async () => {
    const { page, context } = await newPage(browser, LAPTOP)
    await page.goto('/progress')
    await page.waitForURL(
      (url) => url.pathname === '/sign-in' && url.searchParams.get('next') === '/progress',
    )
    await page.getByLabel('E-mail').fill('student@cedarhollow.test')
    await page.getByLabel('Password', { exact: true }).fill('ambitus-demo')
    await page.getByRole('button', { name: 'Sign in' }).click()
    await page.waitForURL('**/progress')
    await context.close()
  })

  it('signing out ends the session and leaves the next person a clean sign-in page', async () => {
    const { page, context } = await newPage(browser, PHONE)
    await signInThroughUi(page, 'signe@cedarhollow.test')
    await page.waitForURL('**/practice')
    await page.getByTestId('user-menu').click()
    await page.getByTestId('sign-out').click()
    await page.waitForURL('**/sign-in')
    expect((await page.request.get('/api/auth/me')).status()).toBe(401)
    expect(await page.textContent('body')).not.toContain('Signe Marlow')
    await context.close()
  })

  it('an unknown address shows the 404 page', async () => {
    const { page, context } = await newPage(browser, LAPTOP)
    await page.goto('/no/such/page')
    // The page is a lazily loaded route: it may appear a moment after the load event.
    await expect.poll(() => page.textContent('body')).toContain('This page is off the neck')
    await context.close()
  })
})
