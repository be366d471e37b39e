// Driving a drill page in Chromium: the student's instrument, Vuetify selects, the question's test
// hooks, clicking board cells, and answering a whole session.
import type { Browser, Page } from 'playwright-core'
import { newPage, signInThroughUi } from './browser'

export const STUDENT = 'student@cedarhollow.test'

export interface ActiveInstrument {
  id: string
  tuning: number[]
  frets: number
  accidentals: 'sharp' | 'flat'
  handedness: 'right' | 'left'
}

export interface AskedQuestion {
  index: number
  pitch: number
  string: number | null
  fret: number | null
  text: string
}

/** A signed-in demo student (Noor unless `email` names another) on a fresh page at `path`. */
export async function studentOn(
  browser: Browser,
  viewport: { width: number; height: number },
  path: string,
  email = STUDENT,
) {
  const { page, context } = await newPage(browser, viewport)
  await signInThroughUi(page, email)
  await page.waitForURL('**/practice')
  await page.goto(path)
  await page.locator('[data-testid="drill-setup"][data-ready="true"]').waitFor()
  return { page, context }
}

export async function activeInstrument(page: Page): Promise<ActiveInstrument> {
  const { instruments } = (await (await page.request.get('/api/instruments')).json()) as {
    instruments: (ActiveInstrument & { isActive: boolean })[]
  }
  const active = instruments.find((i) => i.isActive) ?? instruments[0]
  if (!active) throw new Error('the student has no instrument')
  return active
}

/** Picks an option of a Vuetify select found by its data-testid. */
/**
 * Picks an option of a select and waits until the select shows it (a click that lands while the
 * menu still animates, on a busy machine, is tried again).
 */
export async function choose(page: Page, testId: string, option: string) {
  const select = page.getByTestId(testId)
  for (let attempt = 0; attempt < 3; attempt += 1) {
    await select.click()
    await page.getByRole('option', { name: option, exact: true }).click()
    const shown = select.locator('.v-select__selection-text')
    const ok = await shown
      .filter({ hasText: option })
      .waitFor({ timeout: 5_000 })
      .then(() => true)
      .catch(() => false)
    if (ok) return
    await page.keyboard.press('Escape')
  }
  throw new Error(`the select ${testId} does not show "${option}"`)
}

export async function readQuestion(page: Page): Promise<AskedQuestion> {
  const q = page.getByTestId('question')
  const number = async (name: string) => {
    const value = await q.getAttribute(name)
    return value === null ? null : Number(value)
  }
  return {
    index: (await number('data-index')) ?? -1,
    pitch: (await number('data-pitch')) ?? -1,
    string: await number('data-string'),
    fret: await number('data-fret'),
    text: (await q.textContent()) ?? '',
  }
}

export async function clickCell(page: Page, cell: { string: number; fret: number }) {
  await page
    .getByTestId('fretboard')
    .locator(`[data-string="${cell.string}"][data-fret="${cell.fret}"]`)
    .first()
    .click()
}

/** Waits until the question with this index is gone (the next one, or the summary). */
export async function waitPast(page: Page, index: number) {
  await page.waitForFunction((i) => {
    const el = document.querySelector('[data-testid="question"]')
    return !el || Number(el.getAttribute('data-index')) !== i
  }, index)
}

/** Answers every question until the summary shows; returns the questions asked. */
export async function answerAll(
  page: Page,
  answer: (q: AskedQuestion) => Promise<void>,
): Promise<AskedQuestion[]> {
  const asked: AskedQuestion[] = []
  const summary = page.getByTestId('session-summary')
  for (let n = 0; n < 300 && !(await summary.isVisible()); n++) {
    const q = await readQuestion(page)
    asked.push(q)
    await answer(q)
    await waitPast(page, q.index)
  }
  await summary.waitFor()
  return asked
}
