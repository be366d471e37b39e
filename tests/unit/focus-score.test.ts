// Weakness parts, reasons and spaced-review cards of the focus (pure modules).
import { describe, expect, it } from 'vitest'
import { gradeOf, retrievability, reviewCard } from '../../server/focus/focus-cards'
import {
  errorRate,
  reasonFor,
  scoreCandidate,
  slowness,
  usualResponseMs,
  WEIGHTS,
} from '../../server/focus/focus-score'
import type { FocusCandidate, WeaknessParts } from '../../server/focus/focus-types'
import { rankKeys, rankRegions } from '../../server/focus/focus-keys'
import { scoreAll } from '../../server/focus/focus-selector'

const NOW = new Date('2026-03-10T18:00:00Z')
const DAY = 24 * 3600 * 1000
const daysAgo = (d: number) => new Date(NOW.getTime() - d * DAY)
const PARTS: WeaknessParts = { error: 0.1, slowness: 0, forgetting: 0, due: 0, exploration: 0.1 }

function place(over: Partial<FocusCandidate> = {}): FocusCandidate {
  return {
    string: 0,
    fret: 3,
    pitch: 31,
    attempts: 10,
    recentCorrect: Array(10).fill(true),
    recentMs: [1000],
    lastSeenAt: daysAgo(1),
    card: null,
    ...over,
  }
}

describe('weakness parts', () => {
  it('error rate: no answers count as an even chance; a miss weighs more the more recent it is', () => {
    expect(errorRate([])).toBe(0.5) // prior: half a miss out of one answer
    // Latest answer missed, weight 1: (0.5 + 1) / (1 + 1 + 0.8) = 1.5 / 2.8.
    expect(errorRate([true, false])).toBeCloseTo(1.5 / 2.8, 10)
    // Older answer missed, weight 0.8: (0.5 + 0.8) / 2.8.
    expect(errorRate([false, true])).toBeCloseTo(1.3 / 2.8, 10)
  })

  it('slowness: 0 at the usual time, 0.5 at one and a half times it, 1 at double or slower', () => {
    expect(slowness([1000], 1000)).toBe(0)
    expect(slowness([1400, 1600], 1000)).toBe(0.5) // median 1500
    expect(slowness([5000], 1000)).toBe(1)
    expect(slowness([], 1000)).toBe(0.3)
  })

  it("the usual time is the median of the places' median times, each place counted once", () => {
    // Place medians: 950 (900, 1000), 1200, 3000 (one slow place asked once); none for a place
    // without a right answer → median of 950, 1200, 3000 = 1200.
    const places = [
      place({ recentMs: [900, 1000] }),
      place({ recentMs: [1200, 1100, 1300] }),
      place({ recentMs: [3000] }),
      place({ recentMs: [] }),
    ]
    expect(usualResponseMs(places)).toBe(1200)
  })

  it('the weights sum to 1, so scores stay within 0..1', () => {
    expect(Object.values(WEIGHTS).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 10)
    const worst = scoreCandidate(place({ attempts: 0, recentCorrect: [], recentMs: [] }), 1000, NOW)
    expect(worst.score).toBeGreaterThan(0)
    expect(worst.score).toBeLessThanOrEqual(1)
  })
})

describe('reasons a student sees', () => {
  const missedOn = (...days: number[]) => ({
    ...reviewCard(null, { correct: true, responseMs: 900, at: daysAgo(30) }, 1000),
    recentMisses: days.map(daysAgo),
  })

  it.each([
    ['a place never practised', 'not practised yet', place({ attempts: 0 }), PARTS],
    ['two misses this week', 'missed twice this week', place({ card: missedOn(2, 1) }), PARTS],
    ['one miss this week', 'missed once this week', place({ card: missedOn(3) }), PARTS],
    [
      'four misses this week',
      'missed 4 times this week',
      place({ card: missedOn(6, 4, 2, 1) }),
      PARTS,
    ],
    [
      'misses older than a week',
      'due for review',
      place({ card: missedOn(9, 8) }),
      { ...PARTS, due: 1 },
    ],
    ['slow answers', 'slower than your usual', place(), { ...PARTS, slowness: 0.6 }],
    ['not seen for ten days', 'not seen for 10 days', place({ lastSeenAt: daysAgo(10) }), PARTS],
    ['nothing special', 'a quick check to keep it fresh', place(), PARTS],
  ] as const)('%s → "%s"', (_label, reason, candidate, parts) => {
    expect(reasonFor(candidate, parts, NOW)).toBe(reason)
  })
})

describe('spaced-review cards (FSRS)', () => {
  it('grades a miss Again (1), a slow right answer Hard (2), a right answer Good (3)', () => {
    expect(gradeOf({ correct: false, responseMs: 800, at: NOW }, 1000)).toBe(1)
    expect(gradeOf({ correct: true, responseMs: 1600, at: NOW }, 1000)).toBe(2)
    expect(gradeOf({ correct: true, responseMs: 1400, at: NOW }, 1000)).toBe(3)
    expect(gradeOf({ correct: true, responseMs: 9000, at: NOW }, null)).toBe(3)
  })

  it('schedules a missed place sooner than a remembered one, and remembers when it was missed', () => {
    const known = reviewCard(
      reviewCard(null, { correct: true, responseMs: 900, at: daysAgo(3) }, 1000),
      { correct: true, responseMs: 900, at: daysAgo(1) },
      1000,
    )
    const missed = reviewCard(known, { correct: false, responseMs: 3000, at: NOW }, 1000)
    const kept = reviewCard(known, { correct: true, responseMs: 900, at: NOW }, 1000)
    expect(missed.due.getTime()).toBeLessThan(kept.due.getTime())
    expect(missed.lapses).toBe(known.lapses + (known.state === 2 ? 1 : 0))
    expect(missed.recentMisses).toEqual([NOW])
    expect(kept.recentMisses).toEqual([])
  })

  it('forgets over time: retrievability falls as days pass, and is 0 for a place never reviewed', () => {
    const card = reviewCard(null, { correct: true, responseMs: 900, at: daysAgo(10) }, 1000)
    expect(retrievability(card, daysAgo(9))).toBeGreaterThan(retrievability(card, NOW))
    expect(retrievability(null, NOW)).toBe(0)
  })

  it('an answer older than the last review is scheduled at the last review, not in the past', () => {
    const card = reviewCard(null, { correct: true, responseMs: 900, at: NOW }, 1000)
    const late = reviewCard(card, { correct: true, responseMs: 900, at: daysAgo(2) }, 1000)
    expect(late.lastReview!.getTime()).toBeGreaterThanOrEqual(NOW.getTime())
  })
})

describe('keys and regions', () => {
  // Every place on the A string of a bass (A1 = 33) up to fret 12; the F# places are weak.
  const board = Array.from({ length: 13 }, (_, fret) => {
    const pitch = 33 + fret
    const weak = pitch % 12 === 6
    return place({
      fret,
      string: 1,
      pitch,
      recentCorrect: weak ? [false, false, true] : Array(10).fill(true),
      lastSeenAt: daysAgo(0.5),
    })
  })

  it('ranks the major keys that contain F# (G D A E B F# and Db) above those without it', () => {
    const keys = rankKeys(scoreAll(board, NOW), 'major')
    expect(keys).toHaveLength(12)
    // Circle of fifths (Schmidt-Jones, OpenStax m10865): the major keys with an F# (or Gb) are
    // G, D, A, E, B, F#/Gb and Db/C# — seven keys. Spelled with the fewest accidentals: Db (5 flats)
    // not C# (7 sharps); F# and Gb tie at 6, and the first in the tonic list (F#) is kept.
    const withFSharp = keys
      .slice(0, 7)
      .map((k) => k.tonic)
      .sort()
    expect(withFSharp).toEqual(['A', 'B', 'D', 'Db', 'E', 'F#', 'G'])
    expect(keys[0]!.reason).toMatch(/weak spots? (is|are) in this key/)
    expect(keys[11]!.reason).toBe('a balanced review: no weak spots in this key')
  })

  it('calls keys and regions of a board never practised "not practised yet", not weak spots', () => {
    const fresh = board.map((p) => ({
      ...p,
      attempts: 0,
      recentCorrect: [],
      recentMs: [],
      lastSeenAt: null,
    }))
    const keys = rankKeys(scoreAll(fresh, NOW), 'major')
    expect(new Set(keys.map((k) => k.reason))).toEqual(new Set(['not practised yet in this key']))
    const regions = rankRegions(scoreAll(fresh, NOW), 0, 12)
    expect(regions.every((r) => r.reason === 'not practised yet in these frets')).toBe(true)
  })

  it('counts only answered places as weak spots', () => {
    // F# (fret 9) weak; every other place never answered: one weak spot in a key with F#.
    const mixed = board.map((p) =>
      p.fret === 9 ? p : { ...p, attempts: 0, recentCorrect: [], recentMs: [] },
    )
    const keys = rankKeys(scoreAll(mixed, NOW), 'major')
    expect(keys.find((k) => k.tonic === 'G')!.reason).toBe('one of your weak spots is in this key')
    expect(keys.find((k) => k.tonic === 'C')!.reason).toBe('not practised yet in this key')
  })

  it('ranks 5-fret hand regions holding the weak frets first', () => {
    // F# on the A string sits at frets 9 (F#2); regions 5–9 … 9–13 hold it.
    const regions = rankRegions(scoreAll(board, NOW), 0, 12)
    expect(regions[0]!.lowFret).toBeGreaterThanOrEqual(5)
    expect(regions[0]!.lowFret).toBeLessThanOrEqual(9)
    expect(regions[0]!.highFret - regions[0]!.lowFret).toBe(4)
  })
})
