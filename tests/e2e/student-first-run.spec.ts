// A newcomer on a phone is asked what they play before the first drill, then one tap starts a short
// first session on that instrument; a student who has practised is offered their weakest place, and
// one with a plan its next item; on a phone every drill keeps the asked cell in view.
import { randomUUID } from 'node:crypto'
import type { Browser, Page } from 'playwright-core'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { launchBrowser, newPage, PHONE, screenshot, signInThroughUi } from '../helpers/browser'
import { pitchClassName } from '../../src/theory'
import { readQuestion, studentOn } from '../helpers/drill-pages'

let browser: Browser
beforeAll(async () => {
  browser = await launchBrowser()
})
afterAll(async () => {
  await browser?.close()
})

/** Whether the element lies inside the board's scroll box horizontally (what the player sees). */
async function inView(page: Page, selector: string): Promise<boolean> {
  return page.evaluate((sel) => {
    const cell = document.querySelector(sel)
    const box = cell?.closest('.fb-scroll')
    if (!cell || !box) return false
    const [c, b] = [cell.getBoundingClientRect(), box.getBoundingClientRect()]
    return c.left >= b.left - 1 && c.right <= b.right + 1
  }, selector)
}

/** A new account through the sign-up form; it lands on the practice page asking what they play. */
async function register(page: Page, name: string) {
  await page.goto('/register')
  await page.getByLabel('Your name').fill(name)
  await page
    .getByLabel('E-mail')
    .fill(`${name.split(' ')[0]!.toLowerCase()}-${Date.now()}@cedarhollow.test`)
  await page.getByLabel('Password').fill('long enough passphrase')
  await page.getByRole('button', { name: 'Create account' }).click()
  await page.waitForURL('**/practice')
  await page.getByTestId('first-run').waitFor()
}

/** Neck Recall answers as the drill sends them: the given place missed `misses` times, others right. */
async function practise(page: Page, place: { string: number; fret: number }, misses: number) {
  const { instruments } = (await (await page.request.get('/api/instruments')).json()) as {
    instruments: { id: string; tuning: number[] }[]
  }
  const bass = instruments[0]!
  const sessionId = randomUUID()
  const cells = [
    ...Array.from({ length: misses }, () => ({ ...place, correct: false })),
    ...[0, 2, 5, 7].map((fret) => ({ string: 0, fret, correct: true })),
  ]
  const attempts = cells.map((c, i) => ({
    id: randomUUID(),
    instrumentId: bass.id,
    tuning: bass.tuning,
    drill: 'recall',
    sessionId,
    string: c.string,
    fret: c.fret,
    expectedPitch: bass.tuning[c.string]! + c.fret,
    answer: c.correct ? 'right' : 'wrong',
    correct: c.correct,
    responseMs: 1500,
    createdAt: new Date(Date.now() - (cells.length - i) * 4000).toISOString(),
    detail: {},
    planItemId: null,
  }))
  const res = await page.request.post('/api/attempts', {
    data: { attempts },
    headers: { 'X-Requested-With': 'ambitus' }, // as the app's client sends (anti-CSRF)
  })
  expect(res.status()).toBeLessThan(300)
}

describe('first run', () => {
  it('asks a newcomer what they play, saves it, and Practise now starts 12 notes on it', async () => {
    const { page, context } = await newPage(browser, PHONE)
    await register(page, 'Ash Morrow')
    expect(await page.getByTestId('practise-now').count()).toBe(0)
    expect(await page.getByText('Welcome back').count()).toBe(0)
    await page
      .getByTestId('first-run-instrument')
      .getByRole('button', { name: '5-string bass' })
      .click()
    await page
      .getByTestId('first-run-hand')
      .getByRole('button', { name: /left-handed/ })
      .click()
    await screenshot(page, 'first-run-phone')
    await page.getByTestId('first-run-save').click()
    await page.getByTestId('practise-now').waitFor()

    const { instruments } = (await (await page.request.get('/api/instruments')).json()) as {
      instruments: { name: string; presetId: string; handedness: string; tuning: number[] }[]
    }
    expect(instruments).toHaveLength(1)
    // 5-string bass, common practice: B0 E1 A1 D2 G2 = MIDI 23 28 33 38 43
    expect(instruments[0]).toMatchObject({
      name: '5-string bass',
      presetId: 'bass-5',
      handedness: 'left',
      tuning: [23, 28, 33, 38, 43],
    })

    await page.getByTestId('practise-now-start').click()
    await page.getByTestId('question').waitFor()
    expect(page.url()).toContain('/practice/hunt')
    await page
      .getByTestId('session-progress')
      .getByText('Question 1 of 12', { exact: true })
      .waitFor()
    expect(await page.locator('.fb-string-name').count()).toBe(5)
    await screenshot(page, 'first-run-session-phone')
    await context.close()
  })
})

describe('Practise now', () => {
  it('offers a student who has practised their weakest place, and starts Neck Recall chosen by the statistics', async () => {
    const { page, context } = await newPage(browser, PHONE)
    await register(page, 'Rin Okafor')
    await page.getByTestId('first-run-save').click() // the suggested 4-string bass, right-handed
    await page.getByTestId('practise-now').waitFor()
    await practise(page, { string: 1, fret: 3 }, 3) // string 1 is A (A1 = MIDI 33); fret 3 is C2
    await page.evaluate(() => localStorage.setItem('ambitus.last-drill', 'hunt'))
    await page.reload()
    const card = page.locator('[data-testid="practise-now"][data-kind="weakest"]')
    await card.waitFor()
    expect(await card.textContent()).toContain(
      'A string, fret 3 (C2): 3 of your latest 3 answers there were wrong',
    )
    expect(await page.getByTestId('practise-continue').textContent()).toContain('Pitch Hunt')
    expect(await page.getByText('Welcome back').count()).toBe(1)
    await screenshot(page, 'practise-now-weakest-phone')

    await page.getByTestId('practise-now-start').click()
    await page.getByTestId('question').waitFor()
    expect(page.url()).toContain('/practice/recall')
    // the statistics chose the question (focus on), and the start link left the address
    await page.getByTestId('focus-reason').waitFor()
    expect(new URL(page.url()).search).toBe('')
    await context.close()
  })

  it('offers a student their plan’s next item and starts it with the plan’s settings', async () => {
    const { page, context } = await newPage(browser, PHONE)
    await signInThroughUi(page, NECK_STUDENT)
    await page.waitForURL('**/practice')
    const card = page.locator('[data-testid="practise-now"][data-kind="plan"]')
    await card.waitFor()
    expect(await card.textContent()).toContain('Next in your plan')
    await screenshot(page, 'practise-now-plan-phone')
    await page.getByTestId('practise-now-start').click()
    await page.getByTestId('question').waitFor()
    expect(new URL(page.url()).searchParams.get('planItem')).toMatch(/^[0-9a-f-]{36}$/)
    expect(new URL(page.url()).searchParams.get('start')).toBeNull()
    await page.getByTestId('plan-item-banner').waitFor()
    await context.close()
  })
})

// Tobiah (5-string, 24 frets) answers here: the drill specs count Noor's stored answers while they run.
const NECK_STUDENT = 'tobiah@cedarhollow.test'

describe('the neck on a 390 px phone', () => {
  it('Neck Recall keeps the asked cell in view question after question', async () => {
    const { page, context } = await studentOn(browser, PHONE, '/practice/recall', NECK_STUDENT)
    await page.getByTestId('start-session').click()
    for (let n = 0; n < 4; n++) {
      const asked = page.locator('[data-asked="true"]')
      await asked.waitFor()
      await expect.poll(() => inView(page, '[data-asked="true"]')).toBe(true)
      if (n === 0) await screenshot(page, 'neck-recall-asked-phone')
      const { index, pitch } = await readQuestion(page)
      await page.getByTestId('typed-answer').locator('input').fill(pitchClassName(pitch, 'flat'))
      await page.keyboard.press('Enter')
      await page.waitForFunction(
        (i) =>
          document.querySelector('[data-testid="question"]')?.getAttribute('data-index') !==
          String(i),
        index,
      )
    }
    await context.close()
  })

  it('Range Runs shows the asked note and its whole position', async () => {
    const { page, context } = await studentOn(browser, PHONE, '/practice/runs', NECK_STUDENT)
    await page.getByTestId('start-session').click()
    await page.locator('[data-asked="true"]').waitFor()
    await expect.poll(() => inView(page, '[data-asked="true"]')).toBe(true)
    await screenshot(page, 'range-runs-asked-phone')
    await context.close()
  })
})
