import { describe, expect, it } from 'vitest'
import { Note } from 'tonal'
import { accidentalPreferenceOf, spellInKey } from './spelling'

describe('spellInKey', () => {
  it.each([
    [47, 'Gb', 'major', 'Cb3'], // Gardner: Gb major has Cb; PRODUCT.md: Cb3 = 47
    [60, 'C#', 'major', 'B#3'], // Gardner: C# major has B#; SPN: B#3 = 60
    [65, 'F#', 'major', 'E#4'], // Gardner: F# major has E#
    [29, 'Eb', 'minor', 'F1'], // awkward-key rule of thumb: F1 in Eb minor
    [42, 'Eb', 'major', 'Gb2'], // not in the scale: a flat key spells it flat (common practice)
    [42, 'E', 'major', 'F#2'], // in the scale (Schmidt-Jones: E major has F#)
    [46, 'D', 'major', 'A#2'], // not in the scale: a sharp key spells it sharp (common practice)
    [61, 'C', 'major', 'C#4'], // no accidentals in C major: sharps, as pitchName does
  ])('pitch %i in %s %s → %s', (pitch, tonic, scale, name) => {
    expect(spellInKey(pitch, tonic, scale)).toBe(name)
    expect(Note.midi(name)).toBe(pitch) // tonal agrees the name is that pitch (library)
  })

  it('throws a RangeError for an unknown key or a pitch outside MIDI', () => {
    expect(() => spellInKey(60, 'Fb', 'major')).toThrow(RangeError)
    expect(() => spellInKey(-1, 'C', 'major')).toThrow(RangeError)
  })
})

describe('accidentalPreferenceOf', () => {
  it.each([
    ['Eb', 'minor', 'flat'], // Schmidt-Jones: Eb minor has 6 flats
    ['F', 'major', 'flat'], // 1 flat
    ['E', 'major', 'sharp'], // 4 sharps
    ['C', 'major', 'sharp'], // no accidentals: sharps by default
    ['A#', 'minor', 'sharp'], // 7 sharps
    ['G', 'harmonic minor', 'flat'], // G minor's 2 flats outweigh the raised F# (common practice)
    ['D', 'harmonic minor', 'sharp'], // Bb against C#: a tie goes to sharps
  ])('%s %s leans %s', (tonic, scale, preference) => {
    expect(accidentalPreferenceOf(tonic, scale)).toBe(preference)
  })
})
