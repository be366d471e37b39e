// The demo student works through Window Cycle in Chromium, answering from the theory core, sees the
// summary, and finds every answer stored in the database.
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import { cycleTonics, keyCycleInWindow, windowFromFrets } from '../../src/theory'
import { LAPTOP, PHONE, screenshot } from '../helpers/browser'
import { dbNow, findPitch, storedAttempts, useDrillE2e } from '../helpers/drill-e2e'
import { activeInstrument, answerAll, choose, clickCell, studentOn } from '../helpers/drill-pages'

const e2e = useDrillE2e()

/** Sessions continue the cycle (issue 13): these walks begin at the start key, whatever ran before. */
async function startAtStartKey(page: Page) {
  await page.locator('[data-stop-ready="true"]').waitFor()
  const restart = page.getByTestId('cycle-continues').getByRole('button')
  if (await restart.isVisible()) await restart.click()
}

describe('Window Cycle', () => {
  it('on a laptop: a window too narrow is explained, widened, then the first key is played', async () => {
    const since = await dbNow(e2e.db)
    const { page, context } = await studentOn(e2e.browser, LAPTOP, '/practice/cycle')
    const instrument = await activeInstrument(page)
    await page.getByTestId('pick-window').click()
    await clickCell(page, { string: 0, fret: 0 })
    await clickCell(page, { string: 0, fret: 3 })
    await expect
      .poll(() => page.getByTestId('setup-problem').textContent())
      .toMatch(/is missing .*; widen it to play every key/)
    await screenshot(page, 'drills-cycle-narrow-laptop')
    for (let n = 0; n < 12 && (await page.getByTestId('setup-problem').isVisible()); n++)
      await page.getByTestId('widen-above').click()
    const text = page.getByTestId('window-text')
    const window = {
      low: Number(await text.getAttribute('data-low')),
      high: Number(await text.getAttribute('data-high')),
    }
    expect(window.low).toBe(instrument.tuning[0])
    await choose(page, 'question-count', '8')
    await startAtStartKey(page)
    await page.getByTestId('start-session').click()
    const [firstKey] = keyCycleInWindow({
      ...window,
      tonics: cycleTonics('fourths', { scale: 'major' }),
      scale: 'major',
    })
    const asked = await answerAll(page, findPitch(page, instrument))
    expect(asked.map((q) => q.pitch)).toEqual(firstKey!.pitches)
    await screenshot(page, 'drills-cycle-summary-laptop')
    const rows = await storedAttempts(e2e.db, 'cycle', since, 8)
    expect(rows.map((row) => row.detail.degree).sort()).toEqual([1, 1, 2, 3, 4, 5, 6, 7])
    await context.close()
  })

  it('on a phone: the default window, first key of the cycle of fourths', async () => {
    const { page, context } = await studentOn(e2e.browser, PHONE, '/practice/cycle')
    const instrument = await activeInstrument(page)
    await page.getByRole('button', { name: 'Use dark theme' }).click()
    await choose(page, 'question-count', '8')
    await screenshot(page, 'drills-cycle-setup-phone-dark')
    await startAtStartKey(page)
    await page.getByTestId('start-session').click()
    const window = windowFromFrets({
      tuning: instrument.tuning,
      lowFret: 0,
      highFret: Math.min(4, instrument.frets),
    })
    const [firstKey] = keyCycleInWindow({
      ...window,
      tonics: cycleTonics('fourths', { scale: 'major' }),
      scale: 'major',
    })
    const asked = await answerAll(page, async (q) => {
      if (q.index === 5) await screenshot(page, 'drills-cycle-session-phone-dark')
      await findPitch(page, instrument)(q)
    })
    expect(asked.map((q) => q.pitch)).toEqual(firstKey!.pitches)
    await screenshot(page, 'drills-cycle-summary-phone-dark')
    await context.close()
  })
})
