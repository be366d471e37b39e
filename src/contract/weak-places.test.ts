// The one weak-spot rule (issue 16: "None stand out" beside 0 % cells; a 100 %-right place listed
// under "places to practise most"). Common practice, no source: a miss marks a place to practise.
import { describe, expect, it } from 'vitest'
import { weakestOf } from './weak-places'

const p = (string: number, fret: number, recentAnswers: number, recentAccuracy: number) => ({
  string,
  fret,
  recentAnswers,
  recentAccuracy,
  medianMs: 1000,
})

describe('weakestOf', () => {
  it('lists a first-week place answered wrong once, and never a place always answered right', () => {
    const places = [p(0, 0, 6, 1), p(1, 3, 1, 0), p(2, 5, 2, 0.5)]
    expect(weakestOf(places, 5).map((x) => [x.string, x.fret])).toEqual([
      [1, 3],
      [2, 5],
    ])
  })

  it('puts the surer of two equal accuracies first, then the slower', () => {
    const slow = { ...p(3, 1, 4, 0.5), medianMs: 3000 }
    expect(weakestOf([p(0, 1, 2, 0.5), p(0, 2, 4, 0.5), slow], 3)).toEqual([
      slow,
      p(0, 2, 4, 0.5),
      p(0, 1, 2, 0.5),
    ])
  })
})
