import { describe, expect, it } from 'vitest'
import { Note } from 'tonal'
import {
  assertValidTuning,
  parseTuning,
  stringNames,
  stringNumber,
  TUNING_PRESETS,
  tuningErrors,
  tuningPreset,
} from './tuning'

// common practice open strings (REFERENCES.md), converted to MIDI with tonal Note.midi (library)
const COMMON_PRACTICE: Record<string, string[]> = {
  'bass-4': ['E1', 'A1', 'D2', 'G2'],
  'bass-4-drop-d': ['D1', 'A1', 'D2', 'G2'],
  'bass-5': ['B0', 'E1', 'A1', 'D2', 'G2'],
  'bass-6': ['B0', 'E1', 'A1', 'D2', 'G2', 'C3'],
  'guitar-6': ['E2', 'A2', 'D3', 'G3', 'B3', 'E4'],
  'guitar-6-drop-d': ['D2', 'A2', 'D3', 'G3', 'B3', 'E4'],
  'guitar-6-half-step-down': ['Eb2', 'Ab2', 'Db3', 'Gb3', 'Bb3', 'Eb4'],
  'guitar-7': ['B1', 'E2', 'A2', 'D3', 'G3', 'B3', 'E4'],
}

describe('tuning presets', () => {
  it.each(Object.entries(COMMON_PRACTICE))('%s is tuned %j (common practice)', (id, notes) => {
    expect(tuningPreset(id).pitches).toEqual(notes.map((name) => Note.midi(name)))
  })

  it('offers exactly the presets above, each valid with its own fret count and label', () => {
    expect(TUNING_PRESETS.map((preset) => preset.id).sort()).toEqual(
      Object.keys(COMMON_PRACTICE).sort(),
    )
    TUNING_PRESETS.forEach((preset) =>
      expect(tuningErrors(preset.pitches, preset.frets)).toEqual([]),
    )
    expect(new Set(TUNING_PRESETS.map((preset) => preset.label)).size).toBe(TUNING_PRESETS.length)
  })

  it('4-string bass sounds an octave below the guitar’s lowest four strings (common practice)', () => {
    const bass = tuningPreset('bass-4').pitches
    const guitar = tuningPreset('guitar-6').pitches.slice(0, 4)
    expect(bass.map((pitch, string) => (guitar[string] ?? 0) - pitch)).toEqual([12, 12, 12, 12])
  })

  it('guitar strings are a fourth (5 semitones) apart except G3→B3, a major third (common practice)', () => {
    const guitar = tuningPreset('guitar-6').pitches
    const gaps = guitar.slice(1).map((pitch, string) => pitch - (guitar[string] ?? 0))
    expect(gaps).toEqual([5, 5, 5, 4, 5])
  })

  it('throws a RangeError naming the known ids for an unknown preset', () => {
    expect(() => tuningPreset('banjo')).toThrow(/bass-4/)
  })
})

describe('custom tuning validation (1–10 strings, MIDI 0–127, 1–30 frets)', () => {
  it.each([
    [[28], 1],
    [[23, 28, 33, 38, 43, 48, 53, 58, 63, 68], 30],
    [[0, 0], 30],
    [[97], 30], // arithmetic: 97 + 30 = 127, the top MIDI note
  ])('accepts %j with %i frets', (tuning, frets) => {
    expect(tuningErrors(tuning, frets)).toEqual([])
    expect(() => assertValidTuning(tuning, frets)).not.toThrow()
  })

  it.each([
    [[], 24, /1 to 10 strings/],
    [[1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11], 24, /1 to 10 strings/],
    [[28, 128], 24, /MIDI note number/],
    [[-1, 28], 24, /MIDI note number/],
    [[28, 33.5], 24, /MIDI note number/],
    [[43, 38], 24, /lowest-pitched first/],
    [[28, 33], 0, /1 to 30 frets/],
    [[28, 33], 31, /1 to 30 frets/],
    [[28, 33], 2.5, /1 to 30 frets/],
    [[98], 30, /above MIDI note 127/],
  ])('rejects %j with %f frets', (tuning, frets, message) => {
    expect(tuningErrors(tuning, frets).join(' ')).toMatch(message)
    expect(() => assertValidTuning(tuning, frets)).toThrow(RangeError)
  })

  it('lists several problems at once for a form', () => {
    expect(tuningErrors([43, 38], 40)).toHaveLength(2)
  })
})

describe('parseTuning', () => {
  it('reads note names lowest string first (common practice 5-string bass B0 E1 A1 D2 G2)', () => {
    expect(parseTuning('B0 E1 A1 D2 G2')).toEqual(tuningPreset('bass-5').pitches)
    expect(parseTuning(' E1, A1,D2  G2 ')).toEqual(tuningPreset('bass-4').pitches)
  })

  it('throws a RangeError for bad names or order', () => {
    expect(() => parseTuning('E1 H1')).toThrow(RangeError)
    expect(() => parseTuning('G2 D2')).toThrow(/lowest-pitched first/)
    expect(() => parseTuning('')).toThrow(RangeError)
  })
})

describe('stringNames (common practice names players use)', () => {
  it.each([
    ['bass-4', ['E', 'A', 'D', 'G']],
    ['bass-5', ['B', 'E', 'A', 'D', 'G']],
    ['guitar-6', ['low E', 'A', 'D', 'G', 'B', 'high E']],
    ['guitar-7', ['low B', 'low E', 'A', 'D', 'G', 'B', 'high E']],
    ['bass-4-drop-d', ['low D', 'A', 'D', 'G']],
    ['guitar-6-drop-d', ['low D', 'A', 'D', 'G', 'B', 'E']],
  ])('%s → %j', (id, names) => {
    expect(stringNames(tuningPreset(id).pitches)).toEqual(names)
  })

  it('spells black-key strings as asked (half step down: Eb Ab Db Gb Bb Eb)', () => {
    expect(stringNames(tuningPreset('guitar-6-half-step-down').pitches, 'flat')).toEqual([
      'low Eb',
      'Ab',
      'Db',
      'Gb',
      'Bb',
      'high Eb',
    ])
  })
})

describe('stringNumber (common practice, no source: string 1 is the highest-pitched string)', () => {
  it.each([
    [0, 4, 4], // 4-string bass: low E is string 4
    [3, 4, 1], // 4-string bass: G is string 1
    [0, 5, 5], // 5-string bass: low B is string 5
    [5, 6, 1], // guitar: high E is string 1
    [1, 6, 5], // guitar: A is string 5
    [0, 7, 7], // 7-string guitar: low B is string 7
  ])('index %i of %i strings is string %i', (index, count, number) => {
    expect(stringNumber(index, count)).toBe(number)
  })

  it('refuses an index that is not a string of the tuning', () => {
    expect(() => stringNumber(4, 4)).toThrow(RangeError)
    expect(() => stringNumber(-1, 4)).toThrow(/no string -1/)
  })
})
