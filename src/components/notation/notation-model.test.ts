import { describe, expect, it } from 'vitest'
import type { Exercise } from '../../exchange'
import { clefFor, keySignatureName, notationModel } from './notation-model'

const base: Exercise = {
  title: 'test',
  tempo: 80,
  keyFifths: 0,
  instrument: 'bass',
  tuning: [28, 33, 38, 43],
  beatsPerMeasure: 4,
  notes: [],
}
const note = (name: string, pitch: number, extra = {}) => ({
  name,
  pitch,
  durationBeats: 1,
  ...extra,
})

describe('clefFor', () => {
  // Bass and guitar parts are written an octave above sounding (common practice, REFERENCES.md).
  it.each([
    ['bass', 'written', { clef: 'bass', clefAnnotation: null, octaveShift: 1 }],
    ['guitar', 'written', { clef: 'treble', clefAnnotation: '8vb', octaveShift: 1 }],
    ['bass', 'sounding', { clef: 'bass', clefAnnotation: null, octaveShift: 0 }],
  ] as const)('%s, %s pitch → %j', (instrument, view, expected) => {
    expect(clefFor(instrument, view)).toEqual(expected)
  })
})

describe('notationModel', () => {
  it('writes a bass E1 as e/2 (an octave up) and keeps it e/1 at sounding pitch', () => {
    const exercise = { ...base, notes: [note('E1', 28)] }
    expect(notationModel(exercise, 'written').measures[0]!.events[0]!.key).toBe('e/2')
    expect(notationModel(exercise, 'sounding').measures[0]!.events[0]!.key).toBe('e/1')
  })

  it('shows accidentals against the key signature and the bar (common practice)', () => {
    // D major (2 sharps: F#, C#): F#2 needs none, F2 a natural, F2 again none, C2 a natural.
    const exercise = {
      ...base,
      keyFifths: 2,
      notes: [note('F#2', 42), note('F2', 41), note('F2', 41), note('C2', 36)],
    }
    const events = notationModel(exercise, 'written').measures[0]!.events
    expect(events.map((e) => e.accidental)).toEqual([null, 'n', null, 'n'])
  })

  it('resets accidentals at the barline and carries TAB strings numbered from the top', () => {
    const notes = ['Eb2', 'G2', 'A2', 'B2', 'Eb2'].map((name, i) =>
      note(name, [39, 43, 45, 47, 39][i]!, { string: 1, fret: [6, 10, 12, 14, 6][i] }),
    )
    const [first, second] = notationModel({ ...base, notes }, 'written').measures
    expect(first!.events[0]!.accidental).toBe('b')
    expect(second!.events[0]!.accidental).toBe('b')
    // VexFlow TAB strings: 1 = the highest line, so the A string of a 4-string bass is 3.
    expect(first!.events[0]!.tab).toEqual({ str: 3, fret: 6 })
  })

  it('puts a key change at the barline where it starts', () => {
    const notes = [0, 1, 2, 3, 4].map((i) => note('C2', 36, i === 4 ? { keyFifths: -1 } : {}))
    const measures = notationModel({ ...base, notes }, 'written').measures
    expect(measures.map((m) => [m.keyFifths, m.keyChange])).toEqual([
      [0, false],
      [-1, true],
    ])
    expect(keySignatureName(-1)).toBe('F') // one flat: F major (Schmidt-Jones)
  })
})
