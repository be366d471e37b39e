// The demo student taps through Chord Tones in Chromium — a ii–V–I in a hand position on a laptop,
// an own chord list with a slash chord on a phone — answering from the theory core, and finds every
// answer stored with its chord type and degree and counted in the statistics per chord type.
import type { Page } from 'playwright-core'
import { describe, expect, it } from 'vitest'
import { chordTonesInRegion, parseChord, positionsOf, twoFiveOneCycle } from '../../src/theory'
import { LAPTOP, PHONE, screenshot } from '../helpers/browser'
import { dbNow, storedAttempts, useDrillE2e } from '../helpers/drill-e2e'
import {
  activeInstrument,
  answerAll,
  choose,
  clickCell,
  studentOn,
  type ActiveInstrument,
  type AskedQuestion,
} from '../helpers/drill-pages'

const e2e = useDrillE2e()
const POSITION = { lowFret: 2, highFret: 6 } // the drill's default position

// A chord's arpeggio in the position: the chord tones its frets hold, from the lowest bass tone up.
function arpeggio(symbol: string, instrument: ActiveInstrument): number[] {
  const cells = chordTonesInRegion(symbol, { tuning: instrument.tuning, ...POSITION })
  const pitches = [...new Set(cells.map((cell) => cell.pitch))].sort((a, b) => a - b)
  const bass = parseChord(symbol).bass.pitchClass
  return pitches.slice(pitches.findIndex((pitch) => pitch % 12 === bass))
}

// Whole chords until at least `count` notes, as a session plays them.
function expectedPitches(symbols: string[], instrument: ActiveInstrument, count: number) {
  const pitches: number[] = []
  for (const symbol of symbols) {
    if (pitches.length >= count) break
    pitches.push(...arpeggio(symbol, instrument))
  }
  return pitches
}

// Taps the asked pitch at a place inside the position (any place of the exact pitch is right).
const tapInPosition = (page: Page, instrument: ActiveInstrument) => async (q: AskedQuestion) => {
  const places = positionsOf(instrument.tuning, instrument.frets, q.pitch)
  const inside = places.find((p) => p.fret >= POSITION.lowFret && p.fret <= POSITION.highFret)
  await clickCell(page, inside ?? places[0]!)
}

describe('Chord Tones', () => {
  it('on a laptop: a ii–V–I from C in frets 2–6, one miss explained, every answer stored', async () => {
    const since = await dbNow(e2e.db)
    const { page, context } = await studentOn(e2e.browser, LAPTOP, '/practice/chords')
    const instrument = await activeInstrument(page)
    await choose(page, 'question-count', '12')
    await page.locator('[data-testid="chord-tone-stats"][aria-busy="false"]').waitFor()
    await screenshot(page, 'drills-chords-setup-laptop')
    await page.getByTestId('start-session').click()
    const tap = tapInPosition(page, instrument)
    const asked = await answerAll(page, async (q) => {
      if (q.index === 1) {
        // the b3 of Dm7 answered with the root: named as a chord tone, then the right place shown
        const root = arpeggio('Dm7', instrument)[0]!
        await tap({ ...q, pitch: root })
        await expect
          .poll(() => page.getByTestId('feedback-text').textContent())
          .toMatch(/That is D\d \(the 1 of Dm7\); the ♭3 of Dm7 is F\d/)
        await screenshot(page, 'drills-chords-miss-laptop')
        await page.getByTestId('next').click()
        return
      }
      await tap(q)
    })
    const symbols = twoFiveOneCycle().flatMap((key) => key.chords.map((chord) => chord.symbol))
    expect(asked.map((q) => q.pitch)).toEqual(expectedPitches(symbols, instrument, 12))
    expect(asked[0]?.text).toContain('Dm7')
    await screenshot(page, 'drills-chords-summary-laptop')

    const rows = await storedAttempts(e2e.db, 'chords', since, asked.length)
    for (const row of rows) {
      // each stored tone is a tone of its chord, with tonal's chord type (theory core)
      const chord = parseChord(row.detail.chord)
      expect(chord.tones.map((tone) => tone.degree)).toContain(row.detail.degree)
      expect(row.detail.chordType).toBe(chord.type)
    }
    const dm7 = rows.filter((row) => row.detail.chord === 'Dm7')
    expect(rows.filter((row) => !row.correct).map((row) => row.detail.degree)).toEqual(['b3'])
    const figures = await (await page.request.get('/api/progress/chords')).json()
    const minor = figures.chordTypes.find(
      (t: { chordType: string }) => t.chordType === 'minor seventh',
    )
    expect(minor.attempts).toBeGreaterThanOrEqual(dm7.length)
    await context.close()
  })

  it('on a phone: an own chord list with a slash chord starts each arpeggio on its bass', async () => {
    const { page, context } = await studentOn(e2e.browser, PHONE, '/practice/chords')
    const instrument = await activeInstrument(page)
    await choose(page, 'chords-progression', 'My own chords')
    await page.getByTestId('chords-custom').locator('input').fill('Am7 | D7/F# | Gmaj7')
    await choose(page, 'question-count', '12')
    await screenshot(page, 'drills-chords-setup-phone')
    await page.getByTestId('start-session').click()
    const tap = tapInPosition(page, instrument)
    const asked = await answerAll(page, async (q) => {
      if (q.index === 5) await screenshot(page, 'drills-chords-session-phone')
      await tap(q)
    })
    const expected = expectedPitches(['Am7', 'D7/F#', 'Gmaj7'], instrument, 12)
    expect(asked.map((q) => q.pitch)).toEqual(expected)
    // D7/F#: its arpeggio starts on F# (pitch class 6)
    const slash = asked.find((q) => q.text.includes('D7/F♯:')) // its own prompt, not "next chord"
    expect(slash && slash.pitch % 12).toBe(6)
    await screenshot(page, 'drills-chords-summary-phone')
    await context.close()
  })
})
