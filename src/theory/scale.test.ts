import { describe, expect, it } from 'vitest'
import { Key, Note, Scale, ScaleType } from 'tonal'
import {
  SCALE_TYPES,
  scaleDegreeOf,
  scalePitchClasses,
  scalePitchNames,
  scaleTypeName,
  tonicName,
} from './scale'
import { COMMON_SCALES, MAJOR_KEY_TONICS, MINOR_KEY_TONICS, TONICS } from './scale-data'

const letters = (names: string[]) => names.map((name) => name.charAt(0))
const count = (names: string[], accidental: string) =>
  names.reduce(
    (total, name) => total + [...name.slice(1)].filter((sign) => sign === accidental).length,
    0,
  )

// Schmidt-Jones, "The Circle of Fifths" (OpenStax m10865): G D A E B F# C# 1–7 sharps;
// F Bb Eb Ab Db Gb Cb 1–7 flats; each minor key shares its relative major's signature.
const SIGNATURES: [string, string, number, '#' | 'b'][] = [
  ['C', 'A', 0, '#'],
  ...['G', 'D', 'A', 'E', 'B', 'F#', 'C#'].map((major, index): [string, string, number, '#'] => [
    major,
    MINOR_KEY_TONICS[index + 1] ?? '',
    index + 1,
    '#',
  ]),
  ...['F', 'Bb', 'Eb', 'Ab', 'Db', 'Gb', 'Cb'].map(
    (major, index): [string, string, number, 'b'] => [
      major,
      MINOR_KEY_TONICS[index + 8] ?? '',
      index + 1,
      'b',
    ],
  ),
]

describe('the 30 major and minor keys', () => {
  it('are 15 major and 15 minor keys on 18 tonic names', () => {
    expect(new Set([...MAJOR_KEY_TONICS, ...MINOR_KEY_TONICS])).toEqual(new Set(TONICS))
    expect(TONICS).toHaveLength(18)
  })

  it.each(SIGNATURES)(
    '%s major and %s minor carry %i × %s (Schmidt-Jones)',
    (major, minor, accidentals, sign) => {
      expect(count(scalePitchNames(major, 'major'), sign)).toBe(accidentals)
      expect(count(scalePitchNames(minor, 'minor'), sign)).toBe(accidentals)
      expect(count(scalePitchNames(major, 'major'), sign === '#' ? 'b' : '#')).toBe(0)
    },
  )

  // tonal Key (library): major, natural, harmonic and melodic minor of every key
  it.each(MAJOR_KEY_TONICS)('%s major is spelled as tonal Key.majorKey spells it', (tonic) => {
    expect(scalePitchNames(tonic, 'major')).toEqual(Key.majorKey(tonic).scale)
  })

  it.each(MINOR_KEY_TONICS)(
    '%s minor (natural, harmonic, melodic) as tonal Key.minorKey',
    (tonic) => {
      const key = Key.minorKey(tonic)
      expect(scalePitchNames(tonic, 'minor')).toEqual(key.natural.scale)
      expect(scalePitchNames(tonic, 'harmonic minor')).toEqual(key.harmonic.scale)
      expect(scalePitchNames(tonic, 'melodic minor')).toEqual(key.melodic.scale)
    },
  )

  it('Eb natural minor = Eb F Gb Ab Bb Cb Db (Gardner, Essentials of Music Theory)', () => {
    expect(scalePitchNames('Eb', 'minor')).toEqual(['Eb', 'F', 'Gb', 'Ab', 'Bb', 'Cb', 'Db'])
  })

  it('F# major has E#, not F (Gardner)', () => {
    expect(scalePitchNames('F#', 'major')).toContain('E#')
    expect(scalePitchNames('F#', 'major')).not.toContain('F')
  })
})

describe('every scale type on every tonic', () => {
  const cases = TONICS.flatMap((tonic) =>
    ScaleType.all().map((type) => [tonic, type.name] as const),
  )

  // tonal Scale.get (library): same notes, or — for the few 7-note scales where tonal repeats a
  // letter — the same pitch classes spelled with each letter once (PRODUCT.md domain rule)
  it(`matches tonal Scale.get for all ${cases.length} tonic/scale pairs`, () => {
    for (const [tonic, scale] of cases) {
      const expected = Scale.get([tonic, scale]).notes
      const names = scalePitchNames(tonic, scale)
      expect(names.map((name) => Note.chroma(name))).toEqual(
        expected.map((name) => Note.chroma(name)),
      )
      if (new Set(letters(expected)).size === expected.length || expected.length !== 7) {
        expect(names, `${tonic} ${scale}`).toEqual(expected)
      }
      expect(scalePitchClasses(tonic, scale)).toEqual(expected.map((name) => Note.chroma(name)))
    }
  })

  it('spells every 7-note scale with each letter once, from the tonic’s letter (PRODUCT.md)', () => {
    for (const [tonic, scale] of cases.filter(
      ([, scale]) => ScaleType.get(scale).intervals.length === 7,
    )) {
      const expectedLetters = [...'CDEFGABCDEFGAB'.slice('CDEFGAB'.indexOf(tonic.charAt(0)))].slice(
        0,
        7,
      )
      expect(letters(scalePitchNames(tonic, scale)), `${tonic} ${scale}`).toEqual(expectedLetters)
    }
  })

  // theory texts: the altered scale is the 7th mode of melodic minor a semitone up; tonal spells
  // Db melodic minor Db Eb Fb Gb Ab Bb C (library), so C altered = C Db Eb Fb Gb Ab Bb
  it('C altered is Db melodic minor from its 7th degree (theory texts; tonal Scale.get)', () => {
    const melodic = Scale.get('Db melodic minor').notes
    expect(scalePitchNames('C', 'altered')).toEqual([...melodic.slice(6), ...melodic.slice(0, 6)])
  })
})

describe('names and validation', () => {
  it('lists every tonal scale type once, common ones first (tonal ScaleType.all, library)', () => {
    expect(SCALE_TYPES.map((type) => type.name).sort()).toEqual(
      ScaleType.all()
        .map((type) => type.name)
        .sort(),
    )
    expect(SCALE_TYPES.slice(0, COMMON_SCALES.length).map((type) => type.name)).toEqual(
      COMMON_SCALES,
    )
    for (const type of SCALE_TYPES) {
      expect(type.noteCount).toBe(ScaleType.get(type.name).intervals.length)
      expect(type.label.length).toBeGreaterThan(0)
    }
  })

  it.each([
    ['Major', 'major'],
    ['ionian', 'major'], // tonal alias (library)
    ['aeolian', 'minor'], // tonal alias (library)
    ['blues', 'minor blues'], // REFERENCES.md: "C blues" is the minor blues in tonal
    [' Dorian ', 'dorian'],
  ])('scale name %j → %j', (input, name) => {
    expect(scaleTypeName(input)).toBe(name)
  })

  it.each([
    ['eb', 'Eb'],
    ['f♯', 'F#'],
    ['G#', 'G#'],
    ['bb', 'Bb'],
  ])('tonic %j → %j', (input, name) => {
    expect(tonicName(input)).toBe(name)
  })

  // REFERENCES.md: tonal accepts theoretical keys (Fb, E#, B#…); the app limits tonics to the 18
  it.each(['Fb', 'E#', 'B#', 'H', '', 'C major'])(
    'refuses tonic %j with a readable RangeError',
    (tonic) => {
      expect(() => scalePitchNames(tonic, 'major')).toThrow(RangeError)
      expect(() => scalePitchNames(tonic, 'major')).toThrow(/not a key tonic/)
    },
  )

  it.each(['majr', '', 'C major'])('refuses scale %j with a readable RangeError', (scale) => {
    expect(() => scalePitchNames('C', scale)).toThrow(/not a known scale/)
  })
})

describe('scaleDegreeOf', () => {
  it.each([
    [29, 'Eb', 'minor', 2], // arithmetic: F1 = 29; F is degree 2 of Eb minor (Gardner)
    [28, 'Eb', 'minor', null], // E natural is not in Eb minor
    [60, 'C', 'major', 1],
    [71, 'C', 'major', 7],
    [65, 'F#', 'major', 7], // E# = F, degree 7 of F# major (Gardner)
    [70, 'C', 'minor blues', 6], // tonal C blues = C Eb F Gb G Bb (library)
  ])('pitch %i in %s %s is degree %j', (pitch, tonic, scale, degree) => {
    expect(scaleDegreeOf(pitch, tonic, scale)).toBe(degree)
  })

  it('throws a RangeError for a pitch outside MIDI', () => {
    expect(() => scaleDegreeOf(128, 'C', 'major')).toThrow(RangeError)
  })
})
