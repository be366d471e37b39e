import { describe, expect, it } from 'vitest'
import { Note } from 'tonal'
import {
  acceptedNames,
  accidentalPreferenceOf,
  chromaticPitchNames,
  nameInContext,
  spellInKey,
} from './spelling'

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
    ['D', 'harmonic minor', 'flat'], // written with D minor's one flat; C# is an accidental
    ['D', 'dorian', 'sharp'], // C major's signature: none, so sharps
  ])('%s %s leans %s', (tonic, scale, preference) => {
    expect(accidentalPreferenceOf(tonic, scale)).toBe(preference)
  })
})

describe('acceptedNames (issue 13; spelling rules: Gardner, common practice)', () => {
  it.each([
    // in a key: a scale note only as the key spells it
    [66, { tonic: 'Gb', scale: 'major' }, ['Gb']], // Gb major: Gb Ab Bb Cb Db Eb F (Gardner)
    [47, { tonic: 'Gb', scale: 'major' }, ['Cb']],
    [65, { tonic: 'F#', scale: 'major' }, ['E#']], // F# major has E# (Gardner)
    [67, { tonic: 'G#', scale: 'harmonic minor' }, ['F##']], // raised 7th (tonal Key.minorKey)
    // outside the key: either single-accidental name, the usual one first
    [61, { tonic: 'D', scale: 'minor' }, ['C#', 'Db']], // the raised 7th of D minor (common practice)
    [66, { tonic: 'G', scale: 'minor' }, ['F#', 'Gb']], // raised 7th of G minor
    [70, { tonic: 'C', scale: 'major' }, ['A#', 'Bb']], // Bb accepted in C major
    [66, { tonic: 'Eb', scale: 'major' }, ['Gb', 'F#']], // a flat key names flats first
    [71, { tonic: 'F', scale: 'major' }, ['B']], // a white key outside the key: its natural name
  ])('pitch %i in %j → %j', (pitch, key, names) => {
    expect(acceptedNames(pitch, key)).toEqual(names)
    for (const name of names) expect(Note.chroma(name)).toBe(pitch % 12) // tonal (library)
  })

  it.each([
    [64, ['E']], // no F♭ for E
    [60, ['C']], // no B♯ for C
    [61, ['C#', 'Db']], // no B𝄪 for C♯
    [70, ['A#', 'Bb']],
  ])('without a key, pitch %i → %j', (pitch, names) => {
    expect(acceptedNames(pitch)).toEqual(names)
  })

  it('takes note names too and puts the preferred spelling first', () => {
    expect(acceptedNames('Db3', null, 'flat')).toEqual(['Db', 'C#'])
    expect(acceptedNames('C#')).toEqual(['C#', 'Db'])
    // the chromatic scale as a key: sharp going up and flat coming down both belong to it
    expect(acceptedNames(61, { tonic: 'C', scale: 'chromatic' })).toEqual(['C#', 'Db'])
  })

  it('throws a RangeError for something that is not a pitch', () => {
    expect(() => acceptedNames(128)).toThrow(RangeError)
    expect(() => acceptedNames('H')).toThrow(/not a note name/)
    expect(() => acceptedNames(60, { tonic: 'Fb', scale: 'major' })).toThrow(/not a key tonic/)
  })
})

describe('nameInContext: one naming rule per context (issue 13)', () => {
  it.each([
    [44, { key: { tonic: 'Eb', scale: 'major' } }, 'Ab2'], // Eb major has Ab (Schmidt-Jones)
    [44, { prefer: 'sharp' as const }, 'G#2'], // no key: the instrument's sharps
    [44, { prefer: 'flat' as const }, 'Ab2'],
    [47, { key: { tonic: 'Gb', scale: 'major' } }, 'Cb3'], // PRODUCT.md: Cb3 = 47
    [47, { key: { tonic: 'Gb', scale: 'major' }, withOctave: false }, 'Cb'],
    [61, { key: { tonic: 'D', scale: 'minor' } }, 'C#4'], // raised 7th (common practice)
  ])('pitch %i with %j → %s', (pitch, context, name) => {
    expect(nameInContext(pitch, context)).toBe(name)
  })

  it('agrees with spellInKey for every pitch of a bass in every major and minor key', () => {
    for (const tonic of ['C', 'Eb', 'F#', 'Ab', 'D']) {
      for (const scale of ['major', 'minor', 'harmonic minor']) {
        for (let pitch = 28; pitch <= 67; pitch += 1) {
          const name = nameInContext(pitch, { key: { tonic, scale } })
          expect(spellInKey(pitch, tonic, scale)).toBe(name)
          expect(Note.midi(name)).toBe(pitch) // tonal (library)
          expect(acceptedNames(pitch, { tonic, scale })[0]).toBe(name.replace(/-?\d+$/, ''))
        }
      }
    }
  })
})

describe('chromaticPitchNames (common practice: sharps up, flats down, key notes kept)', () => {
  it('in Eb major, going up and coming down', () => {
    const key = { tonic: 'Eb', scale: 'major' }
    expect(chromaticPitchNames('Eb', { direction: 'up', key })).toEqual(
      'Eb E F F# G Ab A Bb B C C# D'.split(' '),
    )
    expect(chromaticPitchNames('Eb', { direction: 'down', key })).toEqual(
      'Eb E F Gb G Ab A Bb B C Db D'.split(' '),
    )
  })

  it('without a key only the tonic keeps its name', () => {
    expect(chromaticPitchNames('Gb')).toEqual('Gb G G# A A# B C C# D D# E F'.split(' '))
  })
})
