// Which rendered sample plays a pitch and at what rate (12-TET arithmetic: rate = 2^(semitones/12)).
import { describe, expect, it } from 'vitest'
import {
  MAX_REPITCH,
  nearestSample,
  onsetIndex,
  playbackFrequency,
  SAMPLE_SETS,
  sampleUrls,
  voiceFor,
} from '../../src/audio/sample-map'

const BASS = SAMPLE_SETS.bass.pitches

describe('nearestSample', () => {
  it.each([
    // [pitch, sample, semitones] — bass samples every 4 semitones from B0 (23)
    [23, 23, 0], // B0 is itself a sample
    [28, 27, 1], // E1 from D#1, one semitone up
    [34, 35, -1], // A#1 from B1, one semitone down
    [66, 67, -1], // F#4 from G4
  ])('pitch %i plays from sample %i, %i semitones away', (pitch, sample, semitones) => {
    expect(nearestSample(pitch, 440, BASS)).toMatchObject({ samplePitch: sample, semitones })
  })

  it('on a tie takes the lower sample', () => {
    // 29 lies 2 above 27 and 2 below 31
    expect(nearestSample(29, 440, BASS).samplePitch).toBe(27)
  })

  // 12-TET (Suits, Physics of Music, REFERENCES.md): one semitone = 2^(1/12) = 1.059463
  it.each([
    [27, 1],
    [24, 2 ** (1 / 12)],
    [25, 2 ** (2 / 12)],
    [22, 2 ** (-1 / 12)],
  ])('pitch %i plays at rate %f with A4 = 440', (pitch, rate) => {
    expect(nearestSample(pitch, 440, [23, 27]).playbackRate).toBeCloseTo(rate, 9)
  })

  it('honours the reference pitch: A4 = 415 Hz lowers every note by 415/440', () => {
    // ISO 16: A4 = 440 Hz; a baroque-style 415 Hz is about one semitone lower (415/440 = 0.943182)
    expect(nearestSample(69, 415, [69]).playbackRate).toBeCloseTo(415 / 440, 9)
    expect(playbackFrequency(69, 415)).toBeCloseTo(415, 9)
  })

  it('open strings of a 5-string bass stay within 2 semitones of a sample', () => {
    for (const pitch of [23, 28, 33, 38, 43]) {
      expect(Math.abs(nearestSample(pitch, 440, BASS).semitones)).toBeLessThanOrEqual(2)
    }
    expect(MAX_REPITCH).toBeGreaterThanOrEqual(2)
  })
})

describe('voices', () => {
  it('picks bass samples for basses and guitar samples for guitars', () => {
    expect(voiceFor([23, 28, 33, 38, 43])).toBe('bass')
    expect(voiceFor([23, 28, 33, 38, 43, 48])).toBe('bass') // 6-string bass tops at C3
    expect(voiceFor([40, 45, 50, 55, 59, 64])).toBe('guitar')
  })

  it('lists one URL per rendered pitch, named by MIDI number', () => {
    const urls = sampleUrls('guitar')
    expect(Object.keys(urls).map(Number)).toEqual([...SAMPLE_SETS.guitar.pitches])
    expect(urls[40 + 3]).toBe('43.mp3')
  })

  // ~12 notes per instrument, low enough for B0 on a bass and high enough for fret 24 on a guitar
  it('covers B0 to G4 on bass and B1 to past E6 on guitar', () => {
    expect(BASS[0]).toBe(23)
    expect(BASS.at(-1)).toBeGreaterThanOrEqual(67)
    expect(SAMPLE_SETS.guitar.pitches[0]).toBeLessThanOrEqual(35)
    expect(SAMPLE_SETS.guitar.pitches.at(-1)! + 2).toBeGreaterThanOrEqual(88)
  })
})

describe('onsetIndex', () => {
  it('finds the first sample above 1 % of the peak, after 25 ms of encoder silence at 44.1 kHz', () => {
    // 1,102 zero samples (25 ms × 44.1 kHz = 1,102.5) and low noise, then a decaying pluck.
    const samples = new Float32Array(4000)
    for (let i = 0; i < 1102; i++) samples[i] = i % 2 ? 0.004 : -0.004 // 0.4 % of the peak
    for (let i = 1102; i < 4000; i++) samples[i] = Math.sin(i / 5) * Math.exp(-(i - 1102) / 800)
    const peak = Math.max(...samples.map(Math.abs))
    const expected = samples.findIndex((v, i) => i >= 1102 && Math.abs(v) > peak / 100)
    expect(onsetIndex(samples)).toBe(expected)
    expect(expected).toBeGreaterThanOrEqual(1102)
    expect(expected).toBeLessThan(1110)
  })

  it('keeps a silent buffer whole', () => {
    expect(onsetIndex(new Float32Array(100))).toBe(0)
  })
})
