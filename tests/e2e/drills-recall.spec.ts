// The demo student works through the practice page and Neck Recall in Chromium, answering from the theory core, sees the
// summary, and finds every answer stored in the database.
import { describe, expect, it } from 'vitest'
import { noteAt, pitchClassName } from '../../src/theory'
import { LAPTOP, newPage, PHONE, screenshot, signInThroughUi } from '../helpers/browser'
import { dbNow, storedAttempts, useDrillE2e } from '../helpers/drill-e2e'
import { activeInstrument, answerAll, choose, STUDENT, studentOn } from '../helpers/drill-pages'

const e2e = useDrillE2e()

describe('practice page', () => {
  it('lists the six drills, each with why it helps, on a laptop and a phone', async () => {
    for (const [viewport, name] of [
      [LAPTOP, 'laptop'],
      [PHONE, 'phone'],
    ] as const) {
      const { page, context } = await newPage(e2e.browser, viewport)
      await signInThroughUi(page, STUDENT)
      await page.waitForURL('**/practice')
      for (const drill of ['recall', 'hunt', 'runs', 'scatter', 'cycle', 'chords']) {
        await expect.poll(() => page.getByTestId(`drill-card-${drill}`).isVisible()).toBe(true)
      }
      expect(await page.getByTestId('drill-card-hunt').textContent()).toContain('Hear a pitch')
      // The student's plans load above the cards: click once the page has stopped moving.
      await page.locator('[data-testid="assigned-plans"][data-ready="true"]').waitFor()
      await screenshot(page, `drills-practice-${name}`)
      await page.getByTestId('drill-card-recall').click()
      await page.getByRole('heading', { level: 1, name: 'Neck Recall' }).waitFor()
      expect(new URL(page.url()).pathname).toBe('/practice/recall')
      await context.close()
    }
  })
})

describe('Neck Recall', () => {
  it('on a laptop: typed on the board from the keyboard alone, every cell right, stored', async () => {
    const since = await dbNow(e2e.db)
    const { page, context } = await studentOn(e2e.browser, LAPTOP, '/practice/recall')
    const instrument = await activeInstrument(page)
    await choose(page, 'question-count', '12')
    await screenshot(page, 'drills-recall-setup-laptop')
    await page.getByTestId('start-session').click()
    const asked = await answerAll(page, async (q) => {
      // the asked cell has the keyboard: type the name (letter, then # or b)
      await expect
        .poll(() => page.evaluate(() => document.activeElement?.getAttribute('data-fret')))
        .toBe(String(q.fret))
      const name = pitchClassName(noteAt(instrument.tuning, q.string!, q.fret!) % 12, 'flat')
      await page.keyboard.press(name.charAt(0).toLowerCase())
      if (name.length > 1) await page.keyboard.press('b')
      if (q.index === 3) await screenshot(page, 'drills-recall-session-laptop')
    })
    expect(asked).toHaveLength(12)
    expect(await page.getByTestId('summary-accuracy').textContent()).toBe('100 %')
    await expect
      .poll(() => page.getByTestId('filled-board').locator('[data-marks*="correct"]').count())
      .toBe(12)
    await screenshot(page, 'drills-recall-summary-laptop')
    const rows = await storedAttempts(e2e.db, 'recall', since, 12)
    expect(rows.every((row) => row.correct)).toBe(true)
    expect(rows.map((row) => `${row.string}:${row.fret}`).sort()).toEqual(
      asked.map((q) => `${q.string}:${q.fret}`).sort(),
    )
    await context.close()
  })

  it('on a phone: picked with the note buttons', async () => {
    const { page, context } = await studentOn(e2e.browser, PHONE, '/practice/recall')
    const instrument = await activeInstrument(page)
    await page.getByTestId('answer-picked').click()
    await choose(page, 'question-count', '12')
    await page.getByTestId('start-session').click()
    await answerAll(page, async (q) => {
      const name = pitchClassName(
        noteAt(instrument.tuning, q.string!, q.fret!) % 12,
        instrument.accidentals,
      )
      if (q.index === 2) await screenshot(page, 'drills-recall-session-phone')
      await page.getByTestId('note-picker').locator(`[data-note="${name}"]`).click()
    })
    expect(await page.getByTestId('summary-accuracy').textContent()).toBe('100 %')
    await screenshot(page, 'drills-recall-summary-phone')
    await context.close()
  })
})
