import { describe, expect, it } from 'vitest'
import { HuntSettingsSchema } from '../../contract/drills'
import { huntCells, huntQuestions, type HuntPlan } from './hunt-generator'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2 (common practice)
const plan = (settings: object = {}, extra: Partial<HuntPlan> = {}): HuntPlan => ({
  tuning: BASS,
  frets: 20,
  settings: HuntSettingsSchema.parse(settings),
  seed: 11,
  ...extra,
})

describe('Pitch Hunt questions', () => {
  it('draw from the fret band: frets 0–12 of a 4-string bass hold E1 (28) to G3 (55) (arithmetic)', () => {
    const pitches = huntQuestions(plan({ questionCount: 200 })).map(
      (question) => question.expectedPitch,
    )
    expect(Math.min(...pitches)).toBeGreaterThanOrEqual(28)
    expect(Math.max(...pitches)).toBeLessThanOrEqual(55)
    expect(huntCells(plan())).toHaveLength(4 * 13)
  })

  it('never ask the same pitch twice in a row and repeat for the same seed', () => {
    const questions = huntQuestions(plan({ questionCount: 100 }))
    expect(questions).toHaveLength(100)
    questions.forEach((question, index) =>
      expect(question.expectedPitch).not.toBe(questions[index - 1]?.expectedPitch),
    )
    expect(huntQuestions(plan({ questionCount: 100 }))).toEqual(questions)
  })

  it('pick by pitch: E1 (one place) comes up about as often as A2 (four places) (issue 13)', () => {
    // frets 0–12 (arithmetic, open string + fret): E1 = 28 only at E 0; A2 = 45 at A 12, D 7, G 2
    const cells = huntCells(plan())
    const places = (pitch: number) => cells.filter((cell) => cell.pitch === pitch).length
    expect(places(28)).toBe(1)
    expect(places(45)).toBe(3)
    const distinct = new Set(cells.map((cell) => cell.pitch)).size // 28 … 55: 28 pitches
    const pitches = huntQuestions(plan({ questionCount: 500 }, { seed: 3 })).map(
      (q) => q.expectedPitch,
    )
    const share = (pitch: number) => pitches.filter((p) => p === pitch).length / pitches.length
    // even by pitch: each near 1/28 ≈ 3.6 %; by cell A2 would be 3/52 ≈ 5.8 % and E1 1/52 ≈ 1.9 %
    expect(distinct).toBe(28)
    expect(Math.abs(share(45) - share(28))).toBeLessThan(0.025)
  })

  it('clip the band to the instrument (frets 15–24 on a 20-fret neck)', () => {
    expect(huntCells(plan({ lowFret: 15, highFret: 24 }))).toHaveLength(4 * 6)
  })

  it('ask the weak spots inside the band first, with their reasons', () => {
    const focus = [
      { string: 1, fret: 7, pitch: 40, reason: 'missed twice this week' },
      { string: 0, fret: 19, pitch: 47, reason: 'slow' }, // outside frets 0–12
    ]
    const questions = huntQuestions(plan({ questionCount: 3 }, { focus }))
    expect(questions[0]).toMatchObject({
      expectedPitch: 40,
      reason: 'missed twice this week',
      detail: { focusReason: 'missed twice this week' },
    })
    expect(questions.some((question) => question.expectedPitch === 47 && question.reason)).toBe(
      false,
    )
    expect(
      huntQuestions(plan({ questionCount: 3, focus: false }, { focus }))[0]?.reason,
    ).toBeUndefined()
  })
})
