import { describe, expect, it } from 'vitest'
import { cycleKeys, CycleSettingsSchema } from '../../contract/drills'
import { pitchName } from '../../theory'
import {
  cycleOptions,
  cycleSession,
  defaultWindow,
  lowestToneOf,
  planCycle,
  positionAfter,
} from './cycle-generator'

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

  it('plays the worked example C2–C3 going up: C major from C2, then F major folds its 6th (D3 → D2)', () => {
    const plan = planCycle(settings({ direction: 'up' }))
    expect(plan.error).toBeNull()
    const { questions } = cycleSession(cycleOptions(settings({ direction: 'up' })), null, 16)
    // PRODUCT.md worked example (see src/theory/window.test.ts): C2 D2 E2 F2 G2 A2 B2 C3 / F2 G2 A2 Bb2 C3 D2 E2 F2
    expect(questions.map((question) => question.expectedPitch)).toEqual([
      36, 38, 40, 41, 43, 45, 47, 48, 41, 43, 45, 46, 48, 38, 40, 41,
    ])
    expect(questions[13]).toMatchObject({ tonic: 'F', degree: 6, displaced: true, name: 'D2' })
    expect(questions[7]).toMatchObject({ degree: 1, octave: true })
    expect(questions[13]?.detail).toEqual({
      key: 'F',
      scale: 'major',
      degree: 6,
      displaced: true,
      noteIndex: 5,
      phase: 'up',
    })
  })

  it('rounds the count up to whole keys, or plays the whole cycle when there is none', () => {
    const options = cycleOptions(settings())
    expect(cycleSession(options, null, 20).questions).toHaveLength(24) // 3 keys × 8 notes (arithmetic)
    expect(cycleSession(options, null, null).questions).toHaveLength(96) // 12 keys × 8 notes
  })

  it('alternates by default, so E1–B2 is used from its bottom octave to its top (PRODUCT.md)', () => {
    const options = cycleOptions(CycleSettingsSchema.parse({ low: 28, high: 47 }))
    expect(options.direction).toBe('alternate')
    const pitches = cycleSession(options, null, null).questions.map((q) => q.expectedPitch)
    expect(Math.min(...pitches)).toBeLessThan(36) // below C2: the lowest octave is used
    expect(Math.max(...pitches)).toBe(47) // B2, the top of the window
    expect(pitches.every((pitch) => pitch >= 28 && pitch <= 47)).toBe(true)
  })

  it('sessions of 8 notes continue the cycle: C, F, Bb, Eb … every key in turn (issue 13)', () => {
    const options = cycleOptions(settings())
    const played: string[] = []
    let stop = null as Parameters<typeof positionAfter>[1]
    for (let session = 0; session < 12; session += 1) {
      const { questions } = cycleSession(options, positionAfter(options, stop), 8)
      played.push(questions[0]!.tonic)
      const last = questions.at(-1)!
      stop = { key: last.tonic, noteIndex: Number(last.detail.noteIndex), phase: last.direction }
    }
    expect(played).toEqual(cycleKeys(settings())) // the fourths from C (PRODUCT.md)
  })

  it('a session stopped mid-key resumes on the next note of that key', () => {
    const options = cycleOptions(settings())
    const first = cycleSession(options, null, 16).questions
    const from = positionAfter(options, { key: 'F', noteIndex: 2, phase: 'down' }) // alternate: F goes down
    const next = cycleSession(options, from, 1).questions
    expect(next[0]).toMatchObject({ tonic: 'F', expectedPitch: first[11]!.expectedPitch })
    expect(next).toHaveLength(5) // finishes F major: notes 4–8 (wholeKeys)
  })

  it('begins at the start key, and forgets a stop whose key is not in the cycle', () => {
    const options = cycleOptions(settings({ startTonic: 'Eb' }))
    expect(cycleSession(options, null, 8).questions[0]?.tonic).toBe('Eb')
    const custom = cycleOptions(settings({ cycle: 'custom', customTonics: ['C', 'G'] }))
    expect(positionAfter(custom, { key: 'F', noteIndex: 0, phase: 'up' })).toBeNull()
    expect(pitchName(cycleSession(options, null, 8).questions[0]!.expectedPitch)).toMatch(/^D#|^Eb/)
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
