// The demo student works through Octave Scatter in Chromium, answering from the theory core, sees the
// summary, and finds every answer stored in the database.
import { describe, expect, it } from 'vitest'
import { LAPTOP, PHONE, screenshot } from '../helpers/browser'
import { dbNow, findPitch, storedAttempts, useDrillE2e } from '../helpers/drill-e2e'
import { activeInstrument, answerAll, choose, studentOn } from '../helpers/drill-pages'

const e2e = useDrillE2e()

describe('Octave Scatter', () => {
  it('on a laptop: a scattered C major found note by note, then replayed from its seed', async () => {
    const since = await dbNow(e2e.db)
    const { page, context } = await studentOn(e2e.browser, LAPTOP, '/practice/scatter')
    const instrument = await activeInstrument(page)
    await choose(page, 'question-count', '8')
    await page.getByTestId('start-session').click()
    const first = await answerAll(page, findPitch(page, instrument))
    expect(first.map((q) => q.pitch % 12)).toEqual([0, 2, 4, 5, 7, 9, 11, 0]) // C major root to root (handbook)
    expect(await page.getByTestId('summary-accuracy').textContent()).toBe('100 %')
    const seedText = await page.getByTestId('scatter-seed').textContent()
    await screenshot(page, 'drills-scatter-summary-laptop')
    await page.getByTestId('replay-seed').click()
    const again = await answerAll(page, findPitch(page, instrument))
    expect(again.map((q) => q.pitch)).toEqual(first.map((q) => q.pitch))
    expect(await page.getByTestId('scatter-seed').textContent()).toBe(seedText)
    const rows = await storedAttempts(e2e.db, 'scatter', since, 16)
    expect(new Set(rows.map((row) => row.detail.seed)).size).toBe(1)
    await context.close()
  })

  it('on a phone: the sequence is shown with octaves', async () => {
    const { page, context } = await studentOn(e2e.browser, PHONE, '/practice/scatter')
    const instrument = await activeInstrument(page)
    await choose(page, 'question-count', '8')
    await screenshot(page, 'drills-scatter-setup-phone')
    await page.getByTestId('start-session').click()
    await answerAll(page, async (q) => {
      if (q.index === 1) await screenshot(page, 'drills-scatter-session-phone')
      await findPitch(page, instrument)(q)
    })
    await screenshot(page, 'drills-scatter-summary-phone')
    await context.close()
  })
})
