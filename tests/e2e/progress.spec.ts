// The progress page in Chromium: the demo student's seeded history shows the charts, the heat map
// on the fretboard and the note bars, on a laptop and a phone, in light and dark; a new student
// sees how to begin.
import type { Browser, Page } from 'playwright-core'
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

async function openProgress(viewport: typeof LAPTOP, dark: boolean) {
  const opened = await newPage(browser, viewport)
  if (dark)
    await opened.context.addInitScript(() => localStorage.setItem('ambitus.theme', 'lakewoodDark'))
  await signInThroughUi(opened.page, 'student@cedarhollow.test')
  await opened.page.waitForURL('**/practice')
  await opened.page.goto('/progress')
  await waitForFigures(opened.page)
  return opened
}

async function waitForFigures(page: Page) {
  await page.getByTestId('speed-chart').locator('canvas').waitFor()
  await page.getByTestId('accuracy-chart').locator('canvas').waitFor()
  await page.getByTestId('heat-map').getByTestId('fretboard').waitFor()
}

/** The answers figure, or the page's error when a load failed (so a failure says why). */
async function answersOrError(page: Page) {
  const error = page.getByTestId('progress-error')
  if (await error.isVisible()) return `error: ${await error.textContent()}`
  return page.getByTestId('stat-answers').textContent()
}

const heatCells = (page: Page) => page.getByTestId('heat-map').locator('[data-marks="highlight"]')

describe('progress page', () => {
  it('shows the demo student’s charts, heat map, notes and streak on a laptop (light), with no foreign request', async () => {
    const { page, context, foreign } = await openProgress(LAPTOP, false)

    expect(await heatCells(page).count()).toBeGreaterThanOrEqual(30) // 28 days over 4 strings × 12 frets
    expect(await page.getByTestId('heat-map').locator('.fb-heat').count()).toBeGreaterThanOrEqual(
      30,
    )
    const firstLabel = await heatCells(page).first().getAttribute('aria-label')
    expect(firstLabel).toMatch(/string, fret \d+, \d+%/)
    expect(await page.getByTestId('stat-streak').textContent()).toMatch(
      /Practice days in a row\s*\d+ days?/,
    )
    expect(await page.getByTestId('stat-answers').textContent()).toMatch(/Answers\s*[1-9]\d*/)
    expect(await page.getByTestId('note-bars').locator('li').count()).toBe(12)
    expect(await page.getByTestId('weakest-places').locator('li').count()).toBeGreaterThan(0)
    const caption = await page.getByTestId('speed-chart').locator('figcaption').textContent()
    expect(caption).toMatch(/Median recall time: \d+\.\d s on .+, \d+\.\d s on/)
    await screenshot(page, 'progress-laptop-light')

    await page.getByTestId('heat-speed').click()
    await expect
      .poll(async () => (await heatCells(page).first().getAttribute('aria-label')) ?? '')
      .toMatch(/\d\.\ds/)
    await page.evaluate(() => window.scrollTo(0, 0)) // full-page shots of a scrolled page misplace the app bar
    await screenshot(page, 'progress-laptop-light-speed')
    expect(foreign).toEqual([])
    await context.close()
  })

  it('filters by drill and period', async () => {
    const { page, context } = await openProgress(LAPTOP, false)
    const answersBefore = await page.getByTestId('stat-answers').textContent()

    await page.getByTestId('filter-drill').locator('.v-field').click()
    await page.getByRole('option', { name: 'Pitch Hunt' }).click()
    expect(await page.getByTestId('filter-drill').textContent()).toContain('Pitch Hunt')
    await expect.poll(() => answersOrError(page)).not.toBe(answersBefore)
    expect(await answersOrError(page)).toMatch(/^Answers\s*\d+/) // not the page's error
    await page.getByTestId('filter-period').locator('.v-field').click()
    await page.getByRole('option', { name: 'Last 7 days' }).click()
    await expect.poll(() => answersOrError(page)).toMatch(/^Answers\s*\d+/)
    await waitForFigures(page)
    expect(await page.getByTestId('speed-chart').locator('figcaption').textContent()).toMatch(
      /Median recall time|No practice/,
    )
    await context.close()
  })

  it('fits a phone in the dark theme', async () => {
    const { page, context } = await openProgress(PHONE, true)
    expect(await heatCells(page).count()).toBeGreaterThanOrEqual(30)
    const width = await page.evaluate(() => document.documentElement.scrollWidth)
    expect(width).toBeLessThanOrEqual(PHONE.width) // the neck scrolls inside its own box, the page does not
    await screenshot(page, 'progress-phone-dark')
    await context.close()
  })

  it('fits a laptop in the dark theme and a phone in the light theme', async () => {
    const dark = await openProgress(LAPTOP, true)
    await screenshot(dark.page, 'progress-laptop-dark')
    await dark.context.close()
    const light = await openProgress(PHONE, false)
    await screenshot(light.page, 'progress-phone-light')
    await light.context.close()
  })

  it('tells a new student where to begin, and the button starts Neck Recall', async () => {
    const { page, context } = await newPage(browser, PHONE)
    await page.goto('/')
    const email = `newcomer-${Date.now()}@example.test`
    const res = await page.request.post('/api/auth/register', {
      data: { email, password: 'a long enough password', name: 'Newcomer', role: 'student' },
      headers: { 'X-Requested-With': 'ambitus' }, // as the app's client sends (anti-CSRF)
    })
    expect(res.status()).toBe(201)
    await page.goto('/progress')
    await page.getByTestId('progress-empty').waitFor()
    expect(await page.getByTestId('progress-empty').textContent()).toContain(
      'Start with Neck Recall',
    )
    await screenshot(page, 'progress-empty-phone')
    await page.getByRole('link', { name: 'Start Neck Recall' }).click()
    await page.waitForURL('**/practice/recall')
    await context.close()
  })
})
