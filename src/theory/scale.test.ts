import { describe, expect, it } from 'vitest'
import { Key, Note, Scale, ScaleType } from 'tonal'
import {
  scaleDegreeOf,
  scalePitchClasses,
  scalePitchNames,
  scaleTypeName,
  tonicName,
} from './scale'
import { MAJOR_KEY_TONICS, MINOR_KEY_TONICS, TONICS } from './scale-data'
import { isLetterPerDegree } from './scale-spelling'

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
  const respelled = (tonal: string, ours: string) =>
    tonal.length - 1 > 2 || // tonal's triple accidental (A# whole tone's F###) gives way
    /blues/.test(ours) // the blue note (see the blues tests below)

  // tonal Scale.get (library): the same pitch classes always, and the same names except where
  // the rules below (PRODUCT.md, issue 13) respell: chromatic by direction, blue notes, triples
  it(`matches tonal Scale.get for all ${cases.length} tonic/scale pairs`, () => {
    for (const [tonic, scale] of cases) {
      const expected = Scale.get([tonic, scale]).notes
      const names = scalePitchNames(tonic, scale)
      expect(names.map((name) => Note.chroma(name))).toEqual(
        expected.map((name) => Note.chroma(name)),
      )
      if (scale === 'chromatic') continue
      names.forEach((name, degree) => {
        const theirs = expected[degree] ?? ''
        if (!respelled(theirs, scale)) expect(name, `${tonic} ${scale}`).toBe(theirs)
      })
      expect(scalePitchClasses(tonic, scale)).toEqual(expected.map((name) => Note.chroma(name)))
    }
  })

  // Gardner (handbook): diatonic scales use each letter once; issue 13: the harmonic and melodic
  // minors too, and only those — other 7-note scales keep their interval spelling
  it('spells the seven modes and the two minors with each letter once, from the tonic’s letter', () => {
    const diatonic = cases.filter(([, scale]) => isLetterPerDegree(scale))
    expect(new Set(diatonic.map(([, scale]) => scale)).size).toBe(9)
    for (const [tonic, scale] of diatonic) {
      const from = 'CDEFGAB'.indexOf(tonic.charAt(0))
      const expectedLetters = [...'CDEFGABCDEFGAB'.slice(from, from + 7)]
      expect(letters(scalePitchNames(tonic, scale)), `${tonic} ${scale}`).toEqual(expectedLetters)
    }
  })

  // issue 13 (property over every tonic × every scale × both directions): no triple accidentals
  it('never spells a name with more than two accidentals', () => {
    for (const [tonic, scale] of cases) {
      for (const direction of ['up', 'down'] as const) {
        for (const name of scalePitchNames(tonic, scale, direction)) {
          expect(name.length - 1, `${tonic} ${scale} ${direction}: ${name}`).toBeLessThanOrEqual(2)
        }
      }
    }
  })

  // tonal Scale.get (library), interval spelling 1P 2m 3m 3M 4A 5P 7m: the fifth stays G (not A𝄫)
  it('spells non-diatonic 7-note scales from their intervals: C flamenco, C altered', () => {
    expect(scalePitchNames('C', 'flamenco')).toEqual(['C', 'Db', 'Eb', 'E', 'F#', 'G', 'Bb'])
    // jazz usage: the altered scale as 1 b9 #9 3 #11 b13 b7 (tonal ScaleType "altered", library)
    expect(scalePitchNames('C', 'altered')).toEqual(['C', 'Db', 'D#', 'E', 'F#', 'Ab', 'Bb'])
  })

  it('A# whole tone ends on G# rather than F### (issue 13; tonal Note.simplify, library)', () => {
    expect(scalePitchNames('A#', 'whole tone')).toEqual(['A#', 'B#', 'C##', 'D##', 'E##', 'G#'])
  })
})

describe('blues and chromatic spelling (common practice)', () => {
  it.each([
    ['C', 'minor blues', ['C', 'Eb', 'F', 'Gb', 'G', 'Bb']], // ♭5 (tonal agrees, library)
    ['Eb', 'minor blues', ['Eb', 'Gb', 'Ab', 'A', 'Bb', 'Db']], // ♯4: B𝄫 would need a double flat
    ['Ab', 'minor blues', ['Ab', 'Cb', 'Db', 'D', 'Eb', 'Gb']], // ♯4 for E𝄫
    ['Bb', 'minor blues', ['Bb', 'Db', 'Eb', 'Fb', 'F', 'Ab']], // ♭5 takes one flat: kept
    ['F#', 'minor blues', ['F#', 'A', 'B', 'C', 'C#', 'E']],
    ['C', 'major blues', ['C', 'D', 'Eb', 'E', 'G', 'A']], // ♭3 (tonal, library)
    ['Gb', 'major blues', ['Gb', 'Ab', 'A', 'Bb', 'Db', 'Eb']], // ♯2 for B𝄫
  ])('%s %s → %j (the blue note takes one accidental)', (tonic, scale, names) => {
    expect(scalePitchNames(tonic, scale)).toEqual(names)
  })

  it('chromatic: sharps going up, flats coming down, the tonic as named', () => {
    expect(scalePitchNames('C', 'chromatic')).toEqual('C C# D D# E F F# G G# A A# B'.split(' '))
    expect(scalePitchNames('C', 'chromatic', 'down')).toEqual(
      'C Db D Eb E F Gb G Ab A Bb B'.split(' '),
    )
    expect(scalePitchNames('Eb', 'chromatic')[0]).toBe('Eb')
  })
})

describe('names and validation', () => {
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
