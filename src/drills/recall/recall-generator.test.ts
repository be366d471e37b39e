import { describe, expect, it } from 'vitest'
import { RecallSettingsSchema } from '../../contract/drills'
import { clipRegion, recallQuestions, regionCells, type RecallPlan } from './recall-generator'

const BASS = [28, 33, 38, 43] // E1 A1 D2 G2 (common practice)
const settings = (extra: object = {}) =>
  RecallSettingsSchema.parse({
    region: { lowString: 0, highString: 3, lowFret: 0, highFret: 5 },
    ...extra,
  })
const plan = (extra: Partial<RecallPlan> = {}, settingsExtra: object = {}): RecallPlan => ({
  tuning: BASS,
  settings: settings(settingsExtra),
  accidentals: 'flat',
  seed: 7,
  ...extra,
})

describe('Neck Recall region', () => {
  it('frets 0–5 on four strings are 24 cells (arithmetic: 4 × 6)', () => {
    expect(regionCells(BASS, settings().region)).toHaveLength(24)
  })

  it('strings 1–2, frets 5–7 are the A and D strings only, 6 cells (arithmetic)', () => {
    const cells = regionCells(BASS, { lowString: 1, highString: 2, lowFret: 5, highFret: 7 })
    expect(cells.map((cell) => `${cell.string}:${cell.fret}:${cell.pitch}`)).toEqual([
      '1:5:38',
      '1:6:39',
      '1:7:40',
      '2:5:43',
      '2:6:44',
      '2:7:45', // A1 + 5 = D2 = 38 (arithmetic)
    ])
  })

  it('clips a preset to the instrument (frets 12–17 on a 15-fret neck; strings of a 4-string)', () => {
    expect(clipRegion({ lowString: 0, highString: 9, lowFret: 12, highFret: 17 }, 4, 15)).toEqual({
      lowString: 0,
      highString: 3,
      lowFret: 12,
      highFret: 15,
    })
  })
})

describe('recallQuestions', () => {
  it('sequential order asks string by string, fret by fret', () => {
    const questions = recallQuestions(plan({}, { order: 'sequential', questionCount: 24 }))
    expect(questions.slice(0, 7).map((question) => question.key)).toEqual([
      '0:0',
      '0:1',
      '0:2',
      '0:3',
      '0:4',
      '0:5',
      '1:0',
    ])
  })

  it('random order asks every cell once per round, and repeats the same way for the same seed', () => {
    const questions = recallQuestions(plan({}, { questionCount: 24 }))
    expect(new Set(questions.map((question) => question.key)).size).toBe(24)
    expect(recallQuestions(plan({}, { questionCount: 24 }))).toEqual(questions)
    expect(recallQuestions(plan({ seed: 8 }, { questionCount: 24 }))).not.toEqual(questions)
  })

  it('a count larger than the region adds rounds, never the same cell twice in a row', () => {
    const questions = recallQuestions(plan({}, { questionCount: 60 }))
    expect(questions).toHaveLength(60)
    questions.forEach((question, index) => expect(question.key).not.toBe(questions[index - 1]?.key))
  })

  it('asks the weak spots first, with their reasons, and ignores those outside the region', () => {
    const focus = [
      { string: 2, fret: 3, pitch: 41, reason: 'missed twice this week' },
      { string: 0, fret: 9, pitch: 37, reason: 'slow' }, // fret 9 is outside frets 0–5
      { string: 1, fret: 1, pitch: 34, reason: 'due for review' },
    ]
    const questions = recallQuestions(plan({ focus }, { questionCount: 5 }))
    expect(questions.slice(0, 2).map((question) => [question.key, question.reason])).toEqual([
      ['2:3', 'missed twice this week'],
      ['1:1', 'due for review'],
    ])
    expect(questions[0]?.detail).toEqual({ focusReason: 'missed twice this week' })
    expect(questions.some((question) => question.key === '0:9')).toBe(false)
    expect(
      recallQuestions(plan({ focus }, { questionCount: 5, focus: false }))[0]?.reason,
    ).toBeUndefined()
  })

  it('spells in the key when asked: A string fret 6 is Eb in Bb major (scale degree 4)', () => {
    // Bb major = Bb C D Eb F G A (theory texts, handbook); A1 + 6 = 39 = Eb2 (arithmetic)
    const wide = recallQuestions(
      plan({
        accidentals: 'sharp',
        settings: settings({
          spellInKey: true,
          keyTonic: 'Bb',
          region: { lowString: 1, highString: 1, lowFret: 6, highFret: 6 },
        }),
      }),
    )
    expect(wide[0]?.spelled).toBe('Eb')
    const plain = recallQuestions(
      plan({
        accidentals: 'sharp',
        settings: settings({ region: { lowString: 1, highString: 1, lowFret: 6, highFret: 6 } }),
      }),
    )
    expect(plain[0]?.spelled).toBe('D#')
  })
})
