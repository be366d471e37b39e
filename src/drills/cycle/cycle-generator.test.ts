import { describe, expect, it } from 'vitest'
import { cycleKeys, CycleSettingsSchema } from '../../contract/drills'
import { cycleQuestions, defaultWindow, lowestToneOf, planCycle } from './cycle-generator'

const BASS = { tuning: [28, 33, 38, 43], frets: 20 } // E1 A1 D2 G2 (common practice)
const settings = (extra: object = {}) => CycleSettingsSchema.parse({ low: 36, high: 48, ...extra })

describe('Window Cycle plan', () => {
  it('goes round the fourths from C by default (PRODUCT.md: C F Bb Eb Ab Db Gb B E A D G)', () => {
    expect(cycleKeys(settings())).toEqual([
      'C',
      'F',
      'Bb',
      'Eb',
      'Ab',
      'Db',
      'Gb',
      'B',
      'E',
      'A',
      'D',
      'G',
    ])
    expect(cycleKeys(settings({ cycle: 'custom', customTonics: ['Eb', 'A'] }))).toEqual(['Eb', 'A'])
  })

  it('plays the worked example C2–C3: C major from C2, then F major folds its 6th (D3 → D2)', () => {
    const plan = planCycle(settings())
    expect(plan.error).toBeNull()
    const questions = cycleQuestions(plan.keys, 'major', 16)
    // PRODUCT.md worked example (see src/theory/window.test.ts): C2 D2 E2 F2 G2 A2 B2 C3 / F2 G2 A2 Bb2 C3 D2 E2 F2
    expect(questions.map((question) => question.expectedPitch)).toEqual([
      36, 38, 40, 41, 43, 45, 47, 48, 41, 43, 45, 46, 48, 38, 40, 41,
    ])
    expect(questions[13]).toMatchObject({ tonic: 'F', degree: 6, displaced: true, name: 'D2' })
    expect(questions[7]).toMatchObject({ degree: 1, octave: true })
    expect(questions[13]?.detail).toEqual({ key: 'F', scale: 'major', degree: 6, displaced: true })
  })

  it('rounds the count up to whole keys, or plays the whole cycle when there is none', () => {
    const plan = planCycle(settings())
    expect(cycleQuestions(plan.keys, 'major', 20)).toHaveLength(24) // 3 keys × 8 notes (arithmetic)
    expect(cycleQuestions(plan.keys, 'major', null)).toHaveLength(96) // 12 keys × 8 notes
  })

  it("gives the theory core's message for a window too narrow, not an exception", () => {
    const plan = planCycle(settings({ low: 36, high: 43 })) // C2–G2 lacks A, B, Bb… (arithmetic)
    expect(plan.keys).toEqual([])
    expect(plan.error).toMatch(/^The window C2–G2 is missing .*; widen it to play every key\.$/)
  })

  it('starts a new student on the first four frets (E1–B2 on a 4-string bass, arithmetic)', () => {
    expect(defaultWindow(BASS)).toEqual({ low: 28, high: 47 })
  })

  it('knows the awkward key: E-flat minor on a 4-string bass starts on F1, degree 2 (PRODUCT.md)', () => {
    expect(lowestToneOf(BASS, 'Eb', 'minor')).toEqual({ pitch: 29, name: 'F1', degree: 2 })
  })
})
