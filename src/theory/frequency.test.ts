import { describe, expect, it } from 'vitest'
import { Midi } from 'tonal'
import { CONCERT_A, frequencyToPitch, nearestPitch, pitchToFrequency } from './frequency'
import { parsePitch } from './pitch'

describe('pitchToFrequency', () => {
  it('A4 = MIDI 69 = 440 Hz (ISO 16:1975; MIDI 1.0 spec)', () => {
    expect(CONCERT_A).toBe(440)
    expect(pitchToFrequency(parsePitch('A4'))).toBe(440)
  })

  it.each([
    [0, 8.1758], // MIDI Tuning Standard: note 0 = 8.1758 Hz
    [127, 12543.854], // MIDI Tuning Standard: note 127 = 12543.854 Hz
  ])('MIDI note %i = %f Hz (MIDI Tuning Standard)', (pitch, hertz) => {
    expect(pitchToFrequency(pitch)).toBeCloseTo(hertz, 3)
  })

  // CRC Handbook "Musical scales" table; Suits, Physics of Music equal-tempered table (handbook)
  it.each([
    ['B0', 30.868],
    ['E1', 41.203],
    ['A1', 55.0],
    ['D2', 73.416],
    ['G2', 97.999],
    ['C3', 130.813],
    ['E2', 82.407],
    ['A2', 110.0],
    ['D3', 146.832],
    ['G3', 195.998],
    ['B3', 246.942],
    ['E4', 329.628],
  ])('open string %s = %f Hz (CRC Handbook / Suits table)', (name, hertz) => {
    expect(pitchToFrequency(parsePitch(name))).toBeCloseTo(hertz, 3)
  })

  // tonal Midi.midiToFreq(m, ref) (library) for another concert pitch
  it.each([415, 432, 442])('follows a reference of A4 = %i Hz as tonal does', (reference) => {
    for (const pitch of [0, 28, 40, 69, 100, 127]) {
      expect(pitchToFrequency(pitch, reference)).toBeCloseTo(Midi.midiToFreq(pitch, reference), 9)
    }
  })

  it('an octave doubles the frequency (Suits: f = 440 · 2^((m − 69)/12))', () => {
    expect(pitchToFrequency(81) / pitchToFrequency(69)).toBeCloseTo(2, 12)
  })

  it.each([
    [Number.NaN, 440],
    [60, 0],
    [60, -440],
  ])('throws a RangeError for pitch %s with reference %s', (pitch, reference) => {
    expect(() => pitchToFrequency(pitch, reference)).toThrow(RangeError)
  })
})

describe('frequencyToPitch and nearestPitch', () => {
  it('inverts pitchToFrequency (arithmetic)', () => {
    for (const pitch of [0, 23.5, 28, 69, 127]) {
      expect(frequencyToPitch(pitchToFrequency(pitch))).toBeCloseTo(pitch, 9)
      expect(frequencyToPitch(pitchToFrequency(pitch, 432), 432)).toBeCloseTo(pitch, 9)
    }
  })

  it('finds the nearest note and the cents off (arithmetic: 1200 · log2(446/440) = 23.45)', () => {
    const heard = nearestPitch(446)
    expect(heard.pitch).toBe(69)
    expect(heard.cents).toBeCloseTo(1200 * Math.log2(446 / 440), 9)
  })

  it('reads 55 Hz as A1 = 33 (CRC table: A1 = 55.000 Hz)', () => {
    expect(nearestPitch(55)).toEqual({ pitch: 33, cents: 0 })
  })

  it('throws a RangeError outside the MIDI range or for non-positive frequencies', () => {
    expect(() => nearestPitch(1)).toThrow(RangeError)
    expect(() => frequencyToPitch(0)).toThrow(RangeError)
  })
})
