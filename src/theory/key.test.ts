import { describe, expect, it } from 'vitest'
import { Key } from 'tonal'
import { keyAlteration, keyInfo } from './key'
import { MAJOR_KEY_TONICS, MINOR_KEY_TONICS, TONICS } from './scale-data'

describe('keyAlteration: the signature a scale is written with', () => {
  // Schmidt-Jones, "The Circle of Fifths" (OpenStax m10865): 0–7 sharps and 1–7 flats
  it.each(MAJOR_KEY_TONICS)('%s major as tonal Key.majorKey (library)', (tonic) => {
    expect(keyAlteration(tonic, 'major')).toBe(Key.majorKey(tonic).alteration)
  })

  it.each(MINOR_KEY_TONICS)(
    '%s minor and its harmonic/melodic forms share its signature',
    (tonic) => {
      const natural = Key.minorKey(tonic).alteration // tonal (library)
      expect(keyAlteration(tonic, 'minor')).toBe(natural)
      expect(keyAlteration(tonic, 'harmonic minor')).toBe(natural)
      expect(keyAlteration(tonic, 'melodic minor')).toBe(natural)
    },
  )

  it.each([
    ['D', 'dorian', 0], // D dorian is C major's notes (theory texts)
    ['E', 'phrygian', 0],
    ['F', 'lydian', 0],
    ['Bb', 'mixolydian', -3], // parent Eb major
    ['F#', 'locrian', 1], // parent G major: F# G A B C D E
    ['A', 'minor pentatonic', 0], // written in A minor
    ['C', 'minor blues', -3], // written in C minor
  ])('%s %s → %i', (tonic, scale, alteration) => {
    expect(keyAlteration(tonic, scale)).toBe(alteration)
  })
})

describe('keyInfo: theoretical keys and their enharmonic keys (issue 13)', () => {
  it('D# major has 9 sharps (F## and C## count twice): theoretical, Eb major offered', () => {
    // arithmetic from the spelling D# E# F## G# A# B# C## (Gardner's letter rule)
    expect(keyInfo('D#', 'major')).toEqual({
      tonic: 'D#',
      scale: 'major',
      alteration: 9,
      accidentals: 9,
      theoretical: true,
      enharmonic: { tonic: 'Eb', alteration: -3, accidentals: 3 },
    })
  })

  it('Gb minor has 9 flats: theoretical, F# minor (3 sharps) offered', () => {
    expect(keyInfo('Gb', 'minor')).toMatchObject({
      alteration: -9,
      theoretical: true,
      enharmonic: { tonic: 'F#', accidentals: 3 },
    })
  })

  it('the 30 major and minor keys are not theoretical (Schmidt-Jones)', () => {
    for (const tonic of MAJOR_KEY_TONICS) expect(keyInfo(tonic, 'major').theoretical).toBe(false)
    for (const tonic of MINOR_KEY_TONICS) expect(keyInfo(tonic, 'minor').theoretical).toBe(false)
    expect(keyInfo('C#', 'major').enharmonic).toBeUndefined() // 7 sharps is a real key
  })

  it('marks exactly the major and minor keys past 7 accidentals, each with a better enharmonic', () => {
    const theoretical = TONICS.flatMap((tonic) =>
      ['major', 'minor'].map((scale) => keyInfo(tonic, scale)),
    ).filter((info) => info.theoretical)
    // arithmetic: the 18 tonics minus the 15 real keys of each kind
    expect(theoretical.map((info) => `${info.tonic} ${info.scale}`).sort()).toEqual(
      ['A# major', 'D# major', 'G# major', 'Db minor', 'Gb minor', 'Cb minor'].sort(),
    )
    for (const info of theoretical) {
      expect(info.enharmonic?.accidentals).toBeLessThanOrEqual(7)
    }
  })

  it('throws a RangeError for an unknown tonic or scale', () => {
    expect(() => keyInfo('Fb', 'major')).toThrow(/not a key tonic/)
    expect(() => keyInfo('C', 'majr')).toThrow(/not a known scale/)
  })
})
