// "Places to practise most": the worst places first, thinly answered ones kept (and flagged by the
// view), places with every recent answer right never listed.
import { describe, expect, it } from 'vitest'
import { weakestPlaces } from '../../src/components/progress/heat-marks'
import type { PositionFigures } from '../../src/contract/progress'

function place(
  fret: number,
  recentAnswers: number,
  right: number,
  medianMs = 1500,
): PositionFigures {
  const recentAccuracy = recentAnswers ? right / recentAnswers : null
  return {
    ...{ string: 0, fret, pitch: 28 + fret, attempts: recentAnswers, correct: right },
    ...{ accuracy: recentAccuracy, recentAnswers, recentAccuracy, medianMs, p90Ms: medianMs },
    ...{ lastSeenAt: '2026-12-01T10:00:00Z', shown: 0 },
  }
}

describe('weakestPlaces', () => {
  it('lists a place missed in its only two answers first instead of hiding it', () => {
    const list = weakestPlaces([place(3, 10, 7), place(5, 2, 0), place(7, 4, 3)])
    expect(list.map((p) => p.fret)).toEqual([5, 3, 7])
  })

  it('never lists a place whose recent answers are all right, however slow', () => {
    const list = weakestPlaces([place(1, 10, 10, 4800), place(2, 10, 9, 900)])
    expect(list.map((p) => p.fret)).toEqual([2])
  })

  it('breaks ties in accuracy by the slower median, and keeps at most the count asked', () => {
    const list = weakestPlaces([place(1, 4, 2, 900), place(2, 4, 2, 3000), place(3, 4, 1)], 2)
    expect(list.map((p) => p.fret)).toEqual([3, 2])
  })

  it('skips places never answered', () => {
    expect(weakestPlaces([place(4, 0, 0)])).toEqual([])
  })
})
