// Statistics arithmetic (pure): percentiles as PostgreSQL's percentile_cont, streaks, totals.
import { describe, expect, it } from 'vitest'
import { median, percentile } from '../../server/progress/percentile'
import {
  addDays,
  figuresOf,
  localDay,
  streakOf,
  totalsOf,
} from '../../server/progress/progress-stats'

describe('percentile (linear interpolation, rank = p·(n − 1), as percentile_cont)', () => {
  it.each([
    // Arithmetic: odd count → the middle value; even → mean of the two middle values.
    [[900, 1200, 1800], 0.5, 1200],
    [[1, 2, 3, 10], 0.5, 2.5],
    // p90 of 3 values: rank 1.8 → 1200 + 0.8·(1800 − 1200) = 1680.
    [[1800, 900, 1200], 0.9, 1680],
    [[7], 0.9, 7],
  ])('percentile(%j, %s) = %s', (values, p, expected) => {
    expect(percentile(values, p)).toBeCloseTo(expected, 10)
  })

  it('is null without values', () => {
    expect(median([])).toBeNull()
  })
})

describe('figures of pooled places', () => {
  it('pools answers and right-answer times of several rows', () => {
    const at = new Date('2026-03-02T10:00:00Z')
    const later = new Date('2026-03-03T10:00:00Z')
    const f = figuresOf([
      {
        string: 1,
        fret: 3,
        pitch: 36,
        attempts: 4,
        correct: 3,
        shown: 1,
        lastAt: at,
        recentCorrect: [true, true, false, true],
        recentMs: [1200, 1800, 900],
      },
      {
        string: 0,
        fret: 8,
        pitch: 36,
        attempts: 2,
        correct: 1,
        shown: 0,
        lastAt: later,
        recentCorrect: [true, false],
        recentMs: [2000],
      },
    ])
    // 6 answers, 4 right, 1 shown apart; times 900 1200 1800 2000 → median 1500.
    expect(f).toMatchObject({
      attempts: 6,
      correct: 4,
      shown: 1,
      recentAnswers: 6,
      medianMs: 1500,
      lastSeenAt: later.toISOString(),
    })
    expect(f.accuracy).toBeCloseTo(4 / 6, 10)
  })
})

describe('days and streaks', () => {
  it('finds the local calendar day of an instant', () => {
    // 02:30 UTC on 2 March is 18:30 on 1 March in Los Angeles (UTC−8) and 11:30 on 2 March in Tokyo.
    const instant = new Date('2026-03-02T02:30:00Z')
    expect(localDay(instant, 'America/Los_Angeles')).toBe('2026-03-01')
    expect(localDay(instant, 'Asia/Tokyo')).toBe('2026-03-02')
  })

  it('moves days across month and leap-year ends', () => {
    expect(addDays('2028-02-28', 1)).toBe('2028-02-29') // 2028 is a leap year
    expect(addDays('2026-03-01', -1)).toBe('2026-02-28')
  })

  it.each([
    [
      ['2026-03-08', '2026-03-09', '2026-03-10'],
      '2026-03-10',
      { current: 3, longest: 3, practisedToday: true },
    ],
    [['2026-03-08', '2026-03-09'], '2026-03-10', { current: 2, longest: 2, practisedToday: false }],
    [
      ['2026-03-01', '2026-03-02', '2026-03-03', '2026-03-04', '2026-03-09'],
      '2026-03-10',
      { current: 1, longest: 4, practisedToday: false },
    ],
    [['2026-03-07'], '2026-03-10', { current: 0, longest: 1, practisedToday: false }],
    [
      ['2028-02-28', '2028-02-29', '2028-03-01'],
      '2028-03-01',
      { current: 3, longest: 3, practisedToday: true },
    ],
    [[], '2026-03-10', { current: 0, longest: 0, practisedToday: false }],
  ])('days %j on %s give %j', (days, today, streak) => {
    expect(streakOf(days, today)).toEqual(streak)
  })

  it('sums days: minutes from active milliseconds, accuracy from right answers', () => {
    const day = { drill: '*', lastAt: new Date(), medianMs: null, p90Ms: null }
    const totals = totalsOf(
      [
        { ...day, day: '2026-03-01', attempts: 8, correct: 6, shown: 2, activeMs: 172_200 },
        { ...day, day: '2026-03-02', attempts: 2, correct: 1, shown: 0, activeMs: 6000 },
      ],
      3,
    )
    // 10 answers, 7 right; 178 200 ms = 2.97 min → 3.0.
    expect(totals).toEqual({
      attempts: 10,
      correct: 7,
      shown: 2,
      accuracy: 0.7,
      minutes: 3,
      days: 2,
      sessions: 3,
    })
  })
})
