// The demo student works through Pitch Hunt in Chromium, answering from the theory core, sees the
// summary, and finds every answer stored in the database.
import { describe, expect, it } from 'vitest'
import { positionsOf } from '../../src/theory'
import { LAPTOP, PHONE, screenshot } from '../helpers/browser'
import { dbNow, findPitch, storedAttempts, useDrillE2e } from '../helpers/drill-e2e'
import {
  activeInstrument,
  answerAll,
  choose,
  clickCell,
  readQuestion,
  studentOn,
} from '../helpers/drill-pages'

const e2e = useDrillE2e()

describe('Pitch Hunt', () => {
  it('on a laptop: one miss, the right places shown, then the miss retried', async () => {
    const since = await dbNow(e2e.db)
    const { page, context } = await studentOn(e2e.browser, LAPTOP, '/practice/hunt')
    const instrument = await activeInstrument(page)
    await choose(page, 'question-count', '12')
    await page.getByTestId('start-session').click()
    const first = await readQuestion(page)
    // a wrong pick: the note a semitone above
    await clickCell(page, positionsOf(instrument.tuning, instrument.frets, first.pitch + 1)[0]!)
    await page.getByTestId('next').waitFor()
    const places = positionsOf(instrument.tuning, instrument.frets, first.pitch)
    expect(await page.getByTestId('fretboard').locator('[data-marks*="hint"]').count()).toBe(
      places.length,
    )
    await screenshot(page, 'drills-hunt-miss-laptop')
    await page.getByTestId('next').click()
    await answerAll(page, findPitch(page, instrument))
    expect(await page.getByTestId('summary-correct').textContent()).toBe('11 of 12')
    await screenshot(page, 'drills-hunt-summary-laptop')
    await page.getByTestId('retry-misses').click()
    expect((await readQuestion(page)).pitch).toBe(first.pitch)
    await answerAll(page, findPitch(page, instrument))
    expect(await page.getByTestId('summary-accuracy').textContent()).toBe('100 %')
    const rows = await storedAttempts(e2e.db, 'hunt', since, 13)
    expect(rows.filter((row) => !row.correct)).toHaveLength(1)
    expect(new Set(rows.map((row) => row.session_id)).size).toBe(2)
    await context.close()
  })

  it('on a phone: find every place of each pitch', async () => {
    const { page, context } = await studentOn(e2e.browser, PHONE, '/practice/hunt')
    const instrument = await activeInstrument(page)
    await page.getByRole('button', { name: 'Use dark theme' }).click()
    await page.getByTestId('find-all-switch').locator('input').check()
    await choose(page, 'question-count', '12')
    await page.getByTestId('start-session').click()
    let shown = false
    for (let n = 0; n < 3; n++) {
      const q = await readQuestion(page)
      for (const place of positionsOf(instrument.tuning, instrument.frets, q.pitch))
        await clickCell(page, place)
      if (!shown) await screenshot(page, 'drills-hunt-find-all-phone-dark')
      shown = true
      await page.waitForFunction(
        (i) =>
          document.querySelector('[data-testid="question"]')?.getAttribute('data-index') !==
          String(i),
        q.index,
      )
    }
    await page.getByTestId('stop-session').click()
    expect(await page.getByTestId('summary-accuracy').textContent()).toBe('100 %')
    await screenshot(page, 'drills-hunt-summary-phone-dark')
    await context.close()
  })
})
