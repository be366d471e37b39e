// The teacher's week in the browser (issue 16): the demo roster puts the student who needs attention
// first with the reason in words and each student's instrument; on a phone every student is a short
// line; the student page says why; lessons with notes, private or shared, as teacher and student;
// the new-password hint keeps clear of the next field.
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
let teacher: Page
beforeAll(async () => {
  browser = await launchBrowser()
  teacher = (await newPage(browser, LAPTOP)).page
  await signInThroughUi(teacher, 'teacher@cedarhollow.test')
  await teacher.waitForURL('**/studio')
})
afterAll(async () => {
  await browser?.close()
})

describe('who needs attention', () => {
  it('the roster names the demo student who stopped practising, with the reason and the instrument', async () => {
    const rafe = teacher.getByTestId('roster').locator('tr', { hasText: 'Rafe Okonkwo' })
    await expect
      .poll(() => rafe.textContent())
      .toMatch(/No practice since the lesson on \w{3} \d+ \w{3}/)
    expect(await rafe.getByTestId('roster-instrument').textContent()).toContain(
      '4-string bass, drop D (D A D G)',
    )
    const lucia = teacher.getByTestId('roster').locator('tr', { hasText: 'Lucia Amari' })
    expect(await lucia.textContent()).toContain('6-string guitar')
    // needs-attention first: every row with a reason comes before every row without one
    const flagged = await teacher
      .getByTestId('roster')
      .locator('tbody tr')
      .evaluateAll((rows) => rows.map((r) => !!r.querySelector('[data-testid="attention-reason"]')))
    expect(flagged[0]).toBe(true)
    expect(flagged).toEqual([...flagged].sort((a, b) => Number(b) - Number(a)))
    // every column is in view on a 1366 px laptop: the table does not scroll sideways
    const overflow = await teacher
      .getByTestId('roster')
      .locator('.v-table__wrapper')
      .evaluate((w) => w.scrollWidth - w.clientWidth)
    expect(overflow).toBeLessThanOrEqual(0)
    await screenshot(teacher, 'teacher-week-roster-laptop')
  })

  it('the student page says why in words', async () => {
    await teacher.getByTestId('roster').getByRole('link', { name: 'Rafe Okonkwo' }).click()
    await teacher.waitForURL('**/studio/students/*')
    await expect
      .poll(() => teacher.getByTestId('glance-attention').textContent())
      .toMatch(/No practice since the lesson on \w{3} \d+ \w{3}/)
    expect(await teacher.getByTestId('student-glance').textContent()).toContain('drop D')
  })

  it('on a phone each student is a short line (at most 150 px) with the first reason', async () => {
    await teacher.setViewportSize(PHONE)
    await teacher.goto('/studio')
    const items = teacher.getByTestId('roster-phone-item')
    await expect.poll(() => items.count()).toBeGreaterThanOrEqual(5)
    const heights = await items.evaluateAll((els) =>
      els.map((e) => e.getBoundingClientRect().height),
    )
    expect(Math.max(...heights)).toBeLessThanOrEqual(150)
    expect(await teacher.getByTestId('roster').textContent()).toMatch(
      /No practice since the lesson on \w{3} \d+ \w{3}/,
    )
    const width = await teacher.evaluate(() => document.documentElement.scrollWidth)
    expect(width).toBeLessThanOrEqual(PHONE.width)
    await screenshot(teacher, 'teacher-week-roster-phone')
    await teacher.setViewportSize(LAPTOP)
  })
})

describe('lessons and notes', () => {
  const NOTE = 'Next week: Octave Scatter in G minor, slowly.'

  it('the teacher sees what Noor practised since her lesson, schedules the next one and shares a note', async () => {
    await teacher.goto('/studio')
    await teacher.getByTestId('roster').getByRole('link', { name: 'Noor Halvorsen' }).click()
    await teacher.waitForURL('**/studio/students/*')
    const panel = teacher.getByTestId('lessons-panel')
    await expect
      .poll(() => panel.getByTestId('since-last-lesson').textContent())
      .toMatch(/Since the lesson on .+: \d+ answers in \d+ sessions? on \d+ days?, \d+ % right\./)
    const before = await panel.locator('.v-expansion-panel').count()
    const form = panel.getByTestId('lesson-form')
    await form.getByLabel('Date').fill('2031-01-14')
    await form.getByLabel('Time').fill('17:30')
    await form.getByRole('button', { name: 'Schedule' }).click()
    await expect.poll(() => panel.locator('.v-expansion-panel').count()).toBe(before + 1)
    const next = panel.locator('.v-expansion-panel').last()
    expect(await next.textContent()).toMatch(/17:30|0?5:30\sPM/) // as the browser's locale writes it
    await next.locator('.v-expansion-panel-title').click()
    await next.getByLabel('Lesson note').fill(NOTE)
    await next.getByLabel('Share with the student').check()
    await next.getByRole('button', { name: 'Add note' }).click()
    await expect.poll(() => next.getByTestId('lesson-note').textContent()).toContain(NOTE)
    expect(await next.getByTestId('lesson-note').textContent()).toContain('Shared')
    await screenshot(teacher, 'teacher-week-lessons-laptop')
  })

  it('the student reads the shared notes and the coming lessons, not the private note', async () => {
    const { page } = await newPage(browser, PHONE)
    await signInThroughUi(page, 'student@cedarhollow.test')
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'))
    await page.goto('/plans')
    const mine = page.getByTestId('my-lessons')
    await expect.poll(() => mine.textContent()).toContain(NOTE)
    expect(await mine.textContent()).toContain('with Marta Ilves')
    expect(await mine.textContent()).toContain('say each note aloud') // the seeded shared note
    expect(await mine.textContent()).not.toContain('wrist') // the seeded private one
    await screenshot(page, 'teacher-week-my-lessons-phone')
    await page.context().close()
  })
})

describe('choosing a new password', () => {
  it('the hint under the new password ends above the next field', async () => {
    const { page } = await newPage(browser, PHONE)
    await page.goto('/reset-password?token=not-a-real-token-but-the-form-shows')
    const hint = page.getByText('At least 10 characters')
    await expect.poll(() => hint.isVisible()).toBe(true)
    const hintBox = (await hint.boundingBox())!
    const next = page.locator('.v-input', { hasText: 'Repeat the new password' })
    const field = (await next.locator('.v-field').boundingBox())!
    expect(hintBox.y + hintBox.height).toBeLessThanOrEqual(field.y - 4)
    await screenshot(page, 'teacher-week-reset-form-phone')
    await page.context().close()
  })
})
