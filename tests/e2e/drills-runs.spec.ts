// The demo student works through Range Runs in Chromium, answering from the theory core, sees the
// summary, and finds every answer stored in the database.
import { describe, expect, it } from 'vitest'
import { noteAt, rangeRun } from '../../src/theory'
import { LAPTOP, PHONE, screenshot } from '../helpers/browser'
import { dbNow, storedAttempts, useDrillE2e } from '../helpers/drill-e2e'
import { activeInstrument, answerAll, choose, clickCell, studentOn } from '../helpers/drill-pages'

const e2e = useDrillE2e()

describe('Range Runs', () => {
  for (const [viewport, name] of [
    [LAPTOP, 'laptop'],
    [PHONE, 'phone'],
  ] as const) {
    it(`on a ${name}: the run of frets 2–5 up and back down along the offered fingering`, async () => {
      const since = await dbNow(e2e.db)
      const { page, context } = await studentOn(e2e.browser, viewport, '/practice/runs')
      const instrument = await activeInstrument(page)
      await choose(page, 'question-count', '12') // one pass up and down
      await page.getByTestId('show-run').click()
      await screenshot(page, `drills-runs-setup-${name}`)
      await page.getByTestId('start-session').click()
      const run = rangeRun({
        tuning: instrument.tuning,
        lowFret: 2,
        highFret: 5,
        tonic: 'C',
        scale: 'major',
      })
      const asked = await answerAll(page, async (q) => {
        expect(noteAt(instrument.tuning, q.string!, q.fret!)).toBe(q.pitch) // the fingering cell sounds the note
        if (q.index === 4) await screenshot(page, `drills-runs-session-${name}`)
        await clickCell(page, { string: q.string!, fret: q.fret! })
      })
      expect(asked.map((q) => q.pitch)).toEqual([...run, ...run.slice(0, -1).reverse()])
      expect(await page.getByTestId('summary-accuracy').textContent()).toBe('100 %')
      await screenshot(page, `drills-runs-summary-${name}`)
      const rows = await storedAttempts(e2e.db, 'runs', since, asked.length)
      expect(rows.every((row) => row.detail.onFingering === true && row.detail.tonic === 'C')).toBe(
        true,
      )
      await context.close()
    })
  }
})
