import { describe, expect, it } from 'vitest'
import { Note } from 'tonal'
import { customCycle, cycleTonics, preferredTonic } from './cycle'
import { CYCLES } from './cycle-data'

const chroma = (name: string) => Note.chroma(name)

describe('cycleTonics', () => {
  it('fourths from C: C F Bb Eb Ab Db Gb B E A D G (PRODUCT.md; Schmidt-Jones: fourths = fifths reversed)', () => {
    expect(cycleTonics('fourths')).toEqual([
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
  })

  it('fifths from C: C G D A E B F# Db Ab Eb Bb F (Schmidt-Jones, "The Circle of Fifths")', () => {
    expect(cycleTonics('fifths')).toEqual([
      'C',
      'G',
      'D',
      'A',
      'E',
      'B',
      'F#',
      'Db',
      'Ab',
      'Eb',
      'Bb',
      'F',
    ])
  })

  // arithmetic: each step adds the cycle's interval (mod 12)
  it.each([
    ['fourths', 5],
    ['fifths', 7],
    ['chromatic', 1],
  ] as const)('%s moves by %i semitones and visits all 12 keys from any start', (cycle, step) => {
    for (const start of ['C', 'Eb', 'F#', 'A']) {
      const tonics = cycleTonics(cycle, { start })
      expect(tonics[0]).toBe(start)
      tonics.forEach((tonic, index) =>
        expect(chroma(tonic)).toBe(((chroma(start) ?? 0) + step * index) % 12),
      )
    }
  })

  it('whole steps: the whole-tone row of the start, then the row a semitone up (arithmetic)', () => {
    const tonics = cycleTonics('whole-tone', { start: 'D' })
    expect(tonics.map(chroma)).toEqual([2, 4, 6, 8, 10, 0, 3, 5, 7, 9, 11, 1])
    expect(new Set(tonics.map(chroma)).size).toBe(12)
  })

  // Schmidt-Jones key signatures: among enharmonic keys pick the one with fewer accidentals
  it('spells minor keys as minor keys are written: G# C# F# minor, not Ab Db Gb minor', () => {
    // prettier-ignore
    expect(cycleTonics('fourths', { scale: 'minor' })).toEqual([
      'C', 'F', 'Bb', 'Eb', 'G#', 'C#', 'F#', 'B', 'E', 'A', 'D', 'G',
    ])
  })

  // issue 13: every minor variant is written with the natural minor's key signature
  // (Schmidt-Jones), so its tonics are the minor keys' — D♭ minor would need 8 flats
  it.each(['harmonic minor', 'melodic minor', 'minor pentatonic', 'minor blues'])(
    '%s cycles on the natural minor keys: G# and C#, not Ab and Db',
    (scale) => {
      expect(cycleTonics('fourths', { scale })).toEqual(cycleTonics('fourths', { scale: 'minor' }))
    },
  )

  it('keeps the cycle’s own spelling on a tie (Eb minor and D# minor both have 6 accidentals)', () => {
    // prettier-ignore
    expect(cycleTonics('fifths', { start: 'A', scale: 'minor' })).toEqual([
      'A', 'E', 'B', 'F#', 'C#', 'G#', 'Eb', 'Bb', 'F', 'C', 'G', 'D',
    ])
  })

  it('throws a RangeError for an unknown cycle or start', () => {
    expect(() => cycleTonics('thirds' as never)).toThrow(/fourths/)
    expect(() => cycleTonics('fourths', { start: 'Fb' })).toThrow(RangeError)
  })

  it('offers each built-in cycle with a label and all 12 pitch classes', () => {
    for (const cycle of CYCLES) {
      expect(cycle.label.length).toBeGreaterThan(0)
      expect(new Set(cycle.tonics.map(chroma)).size).toBe(12)
    }
  })
})

describe('preferredTonic (Schmidt-Jones: fewer accidentals)', () => {
  it.each([
    [1, 'major', 'Db'], // Db major 5 flats vs C# major 7 sharps
    [1, 'minor', 'C#'], // C# minor 4 sharps vs Db minor (needs Bbb)
    [11, 'major', 'B'], // B major 5 sharps vs Cb major 7 flats
    [8, 'minor', 'G#'], // G# minor 5 sharps vs Ab minor 7 flats
    [10, 'minor', 'Bb'], // Bb minor 5 flats vs A# minor 7 sharps
    [0, 'major', 'C'],
    [8, 'melodic minor', 'G#'], // G# minor's 5 sharps, not Ab minor's 7 flats (issue 13)
    [1, 'harmonic minor', 'C#'], // C# minor's 4 sharps, not Db minor's 8 flats
    [10, 'locrian', 'A#'], // parent B major (5 sharps) vs Cb major (7 flats) (tonal Mode)
  ])('pitch class %i in %s → %s', (pitchClass, scale, tonic) => {
    expect(preferredTonic(pitchClass, scale)).toBe(tonic)
  })

  it('uses the tie-breaker when both spellings are as good (F#/Gb major: 6 each)', () => {
    expect(preferredTonic(6, 'major', 'Gb')).toBe('Gb')
    expect(preferredTonic(6, 'major', 'F#')).toBe('F#')
  })
})

describe('customCycle', () => {
  it('checks and normalises a teacher’s list', () => {
    expect(customCycle(['e', 'A', 'd♭'])).toEqual(['E', 'A', 'Db'])
  })

  it('throws a RangeError for an empty list or an unknown key', () => {
    expect(() => customCycle([])).toThrow(/at least one key/)
    expect(() => customCycle(['C', 'Fb'])).toThrow(/not a key tonic/)
  })
})
