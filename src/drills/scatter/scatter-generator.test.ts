import { describe, expect, it } from 'vitest'
import { ScatterSettingsSchema } from '../../contract/drills'
import { scatterQuestions, scatterWindow, sequenceSeed } from './scatter-generator'

const NECK = { tuning: [28, 33, 38, 43], frets: 20 } // E1 A1 D2 G2: range E1 (28) to Eb4 (63), arithmetic
const settings = (extra: object = {}) =>
  ScatterSettingsSchema.parse({ tonic: 'C', scale: 'major', ...extra })
const C_MAJOR = [0, 2, 4, 5, 7, 9, 11, 0] // C D E F G A B C, root to root (handbook)

describe('Octave Scatter questions', () => {
  it('use the instrument range when the settings leave the window open', () => {
    expect(scatterWindow(NECK, settings())).toEqual({ low: 28, high: 63 })
    expect(scatterWindow(NECK, settings({ low: 36, high: 60 }))).toEqual({ low: 36, high: 60 })
  })

  it('play the scale root to root, each note in some octave inside the window', () => {
    const questions = scatterQuestions(NECK, settings({ questionCount: 8 }), 42)
    expect(questions).toHaveLength(8)
    expect(questions.map((question) => question.expectedPitch % 12)).toEqual(C_MAJOR)
    questions.forEach((question) => {
      expect(question.expectedPitch).toBeGreaterThanOrEqual(28)
      expect(question.expectedPitch).toBeLessThanOrEqual(63)
    })
    expect(questions.filter((question) => question.displaced).length).toBeGreaterThanOrEqual(2) // minDisplaced default
  })

  it('are the same for the same seed and differ for another (a replay reproduces the session)', () => {
    const a = scatterQuestions(NECK, settings(), 42)
    expect(scatterQuestions(NECK, settings(), 42)).toEqual(a)
    expect(scatterQuestions(NECK, settings(), 43).map((q) => q.expectedPitch)).not.toEqual(
      a.map((q) => q.expectedPitch),
    )
  })

  it('fill the count with whole sequences, each with its own seed in the detail', () => {
    const questions = scatterQuestions(NECK, settings({ questionCount: 20 }), 100)
    expect(questions).toHaveLength(24) // 3 sequences of 8 (arithmetic: ceil(20 / 8) = 3)
    expect(questions[8]?.detail).toEqual({
      tonic: 'C',
      scale: 'major',
      seed: sequenceSeed(100, 1),
      index: 0,
    })
    expect(sequenceSeed(100, 1)).toBe(101)
  })

  it('handle the chromatic scale: 13 notes root to root', () => {
    const questions = scatterQuestions(
      NECK,
      settings({ scale: 'chromatic', questionCount: null }),
      5,
    )
    expect(questions.map((question) => question.expectedPitch % 12)).toEqual([
      0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 0,
    ])
    expect(questions[1]?.name).toMatch(/^C#\d$/) // the chromatic scale going up takes sharps (common practice)
  })

  it('leap at most two octaves by default, also for plans saved without a limit (issue 13)', () => {
    expect(settings().maxLeap).toBe(24)
    expect(settings({ maxLeap: null }).maxLeap).toBe(24)
    for (const seed of [1, 2, 3, 4, 5]) {
      const pitches = scatterQuestions(NECK, settings(), seed).map((q) => q.expectedPitch)
      pitches.slice(1).forEach((pitch, i) => {
        expect(Math.abs(pitch - pitches[i]!)).toBeLessThanOrEqual(24) // arithmetic: semitones
      })
    }
  })

  it('"every note moved": no note is a plain step up from the one before (issue 13)', () => {
    const steps = [2, 2, 1, 2, 2, 2, 1] // major scale steps in semitones (handbook)
    for (const seed of [7, 8, 9]) {
      const pitches = scatterQuestions(NECK, settings({ placement: 'each-moved' }), seed).map(
        (q) => q.expectedPitch,
      )
      pitches.slice(1).forEach((pitch, i) => {
        expect(pitch - pitches[i]!).not.toBe(steps[i])
      })
    }
  })

  it('explain a window that lacks a scale note', () => {
    // E1 (28) to B1 (35) holds no C, D (arithmetic)
    expect(() => scatterQuestions(NECK, settings({ low: 28, high: 35 }), 1)).toThrow(RangeError)
  })
})
