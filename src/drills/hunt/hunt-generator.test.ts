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
