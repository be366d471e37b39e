// The tuner's string choice and cents. Open strings of standard tunings (common practice): bass
// E1 A1 D2 G2 = MIDI 28 33 38 43; a cent is 1/100 of a 12-TET semitone.
import { describe, expect, it } from 'vitest'
import { nearestString, steadyPitch } from './index'

const BASS = [28, 33, 38, 43]

describe('nearestString', () => {
  it.each([
    [33.0, 1, 0, true], // A1 in tune
    [33.04, 1, 4, true], // 4 cents sharp: inside ±5
    [32.9, 1, -10, false], // 10 cents flat
    [29.4, 0, 140, false], // nearer E1 (1.4 semitones) than A1 (3.6)
    [30.5, 0, 250, false], // halfway between E1 and A1: the lower string
    [45, 3, 200, false], // above the top string: still the G string
  ])('reading %f → string %i, %f cents, in tune %s', (pitch, string, cents, inTune) => {
    const reading = nearestString(BASS, pitch)!
    expect(reading.string).toBe(string)
    expect(reading.cents).toBeCloseTo(cents, 6)
    expect(reading.inTune).toBe(inTune)
  })

  it('has no string for an empty tuning', () => {
    expect(nearestString([], 40)).toBeNull()
  })
})

describe('steadyPitch', () => {
  it('is the median, so one stray frame does not move the needle', () => {
    expect(steadyPitch([33.01, 45, 33.02])).toBe(33.02)
    expect(steadyPitch([33.0, 33.02])).toBeCloseTo(33.01, 9)
    expect(steadyPitch([])).toBeNull()
  })
})
