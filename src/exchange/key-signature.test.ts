import { describe, expect, it } from 'vitest'
import { keyFifths, keyMode } from './key-signature'

describe('keyFifths', () => {
  // C. Schmidt-Jones, "The Circle of Fifths", OpenStax CNX m10865 (handbook): G D A E B F# C# carry
  // 1–7 sharps, F Bb Eb Ab Db Gb Cb 1–7 flats; a minor key shares its relative major's signature.
  it.each([
    ['C', 'major', 0],
    ['G', 'major', 1],
    ['F#', 'major', 6],
    ['C#', 'major', 7],
    ['F', 'major', -1],
    ['Cb', 'major', -7],
    ['A', 'minor', 0],
    ['Eb', 'minor', -6],
    ['C#', 'minor', 4],
    ['G#', 'minor', 5],
  ])('%s %s has %i fifths (Schmidt-Jones, circle of fifths)', (tonic, scale, fifths) => {
    expect(keyFifths(tonic, scale)).toBe(fifths)
  })

  // Modes take the signature of their parent major scale (common practice): D dorian = C major.
  it.each([
    ['D', 'dorian', 0],
    ['E', 'phrygian', 0],
    ['G', 'mixolydian', 0],
    ['Bb', 'lydian', -1], // Bb lydian = the notes of F major (one flat)
  ])('the mode %s %s has %i fifths (common practice: parent major key)', (tonic, scale, fifths) => {
    expect(keyFifths(tonic, scale)).toBe(fifths)
  })

  // Harmonic/melodic minor and pentatonics keep the natural minor's or major's signature; the raised
  // seventh is written as an accidental (common practice, no source).
  it.each([
    ['A', 'harmonic minor', 0],
    ['E', 'melodic minor', 1],
    ['A', 'minor pentatonic', 0],
    ['D', 'major pentatonic', 2],
  ])('%s %s has %i fifths (common practice, no source)', (tonic, scale, fifths) => {
    expect(keyFifths(tonic, scale)).toBe(fifths)
  })

  it('folds a theoretical key to its enharmonic: G# major (8 sharps) → Ab major, 4 flats (arithmetic)', () => {
    expect(keyFifths('G#', 'major')).toBe(-4)
  })
})

describe('keyMode', () => {
  it.each([
    ['A', 'harmonic minor', 'minor'],
    ['D', 'dorian', 'minor'],
    ['G', 'mixolydian', 'major'],
    ['C', 'chromatic', 'major'],
  ])('%s %s reads as %s (a minor third and no major third is minor)', (tonic, scale, mode) => {
    expect(keyMode(tonic, scale)).toBe(mode)
  })
})
