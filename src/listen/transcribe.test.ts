// transcribe() on generated signals. Expected pitches: ISO 16 (A4 = 440 Hz) and the 12-TET formula
// f = 440 · 2^((m − 69) / 12) (REFERENCES.md), e.g. E1 = 41.203 Hz, B0 = 30.868 Hz, A1 = 55 Hz.
import { describe, expect, it } from 'vitest'
import {
  delayed,
  glide,
  hum,
  karplusStrong,
  line,
  mixInto,
  pluckedTone,
  whiteNoise,
  withNoise,
} from '../../scripts/lib/test-signals'
import { transcribe } from './index'

const RATE = 48_000
const pluck = (pitch: number, seconds = 0.5) =>
  pluckedTone(pitch, { sampleRate: RATE, durationS: seconds, fundamental: 0.5 })

/**
 * Notes played one after another from 100 ms, each damped over its last 20 ms as a player does
 * before the next pluck; `loudness` scales each note (a softer re-pluck of a ringing string).
 */
function played(pitches: number[], noteS: number, loudness: number[] = []): Float32Array {
  const out = new Float32Array(Math.round((pitches.length * noteS + 0.2) * RATE))
  pitches.forEach((pitch, k) => {
    const note = pluck(pitch, noteS)
    const fade = 0.02 * RATE
    for (let i = 0; i < fade; i += 1) note[note.length - fade + i]! *= 1 - i / fade
    mixInto(out, note, Math.round((0.1 + k * noteS) * RATE), loudness[k] ?? 1)
  })
  return out
}

describe('transcribe: single plucked notes', () => {
  it.each([
    // [MIDI, name, Hz from 440 · 2^((m − 69)/12)]
    [23, 'B0', 30.868], // the low B of a 5-string bass
    [28, 'E1', 41.203], // open E of a 4-string bass
    [33, 'A1', 55.0], // open A of a bass
    [43, 'G2', 97.999], // open G of a bass
    [52, 'E3', 164.814], // E3, guitar 2nd fret D string
    [69, 'A4', 440.0], // ISO 16 concert pitch
    [88, 'E6', 1318.51], // 24th fret of a guitar's high E
  ])('hears MIDI %i (%s, %f Hz) once, in tune, at its onset', (pitch, name) => {
    const notes = transcribe(delayed(pluck(pitch), RATE, 0.2), RATE, { lowest: 'B0', highest: 88 })
    expect(notes).toHaveLength(1)
    expect(notes[0]).toMatchObject({ pitch, name })
    expect(Math.abs(notes[0]!.cents)).toBeLessThan(5)
    expect(notes[0]!.onsetMs).toBeGreaterThan(195)
    expect(notes[0]!.onsetMs).toBeLessThan(215)
  })

  it('hears a Karplus–Strong string at 44.1 kHz (A1 = 55 Hz, 12-TET)', () => {
    const samples = karplusStrong(33, { sampleRate: 44_100, durationS: 0.5 })
    expect(transcribe(samples, 44_100, { lowest: 'E1' }).map((n) => n.name)).toEqual(['A1'])
  })

  it('hears the same notes whether the range is given by name or MIDI number', () => {
    const samples = played([28, 33, 38], 0.4)
    const byName = transcribe(samples, RATE, { lowest: 'E1', highest: 'G4' })
    expect(byName.map((n) => n.pitch)).toEqual([28, 33, 38])
    expect(transcribe(samples, RATE, { lowest: 28, highest: 67 })).toEqual(byName)
  })

  it('hears a note with noise at 20 dB SNR and 50 Hz hum (G1 = 48.999 Hz, near the hum)', () => {
    const noisy = withNoise(delayed(pluck(31), RATE, 0.3), RATE, {
      snrDb: 20,
      mainsHz: 50,
      seed: 3,
    })
    expect(transcribe(noisy, RATE, { lowest: 'B0' }).map((n) => n.name)).toEqual(['G1'])
  })
})

describe('transcribe: lines of notes', () => {
  it('counts a repeated note every time it is plucked (A1 ×3, then D2 ×2)', () => {
    const notes = transcribe(played([33, 33, 33, 38, 38], 0.3), RATE, { lowest: 'E1' })
    expect(notes.map((n) => n.name)).toEqual(['A1', 'A1', 'A1', 'D2', 'D2'])
    // Onsets 300 ms apart, from 100 ms (within a few ms: the attack is found block by block).
    notes.forEach((note, k) => expect(Math.abs(note.onsetMs - (100 + 300 * k))).toBeLessThan(10))
  })

  it('hears a softer re-pluck of a ringing string (its fresh upper partials)', () => {
    const notes = transcribe(played([33, 33, 33], 0.2, [1, 0.6, 0.6]), RATE, { lowest: 'E1' })
    expect(notes.map((n) => n.name)).toEqual(['A1', 'A1', 'A1'])
  })

  it('hears a quickly repeated B0 (30.868 Hz: the 20 ms damping is shorter than a period)', () => {
    const notes = transcribe(played([23, 23, 23], 0.2), RATE, { lowest: 'B0', highest: 'G4' })
    expect(notes.map((n) => n.name)).toEqual(['B0', 'B0', 'B0'])
  })

  it('splits a legato line (pitch changes without a new attack) into its notes', () => {
    // E2 F#2 G#2 A2 (82.4, 92.5, 103.8, 110 Hz), one tone that changes pitch every 300 ms
    const legato = line([40, 42, 44, 45], {
      sampleRate: RATE,
      durationS: 1.2,
      switchS: [0.3, 0.6, 0.9],
    })
    const notes = transcribe(legato, RATE, { lowest: 'E1' })
    expect(notes.map((n) => n.name)).toEqual(['E2', 'F#2', 'G#2', 'A2'])
    expect(notes[1]!.onsetMs).toBeGreaterThan(280)
    expect(notes[1]!.onsetMs).toBeLessThan(340)
  })

  it('hears a slide as one note, not every pitch it passes', () => {
    // E2 gliding up to A2 over 200 ms, then held
    const slide = glide(40, 45, { sampleRate: RATE, durationS: 1, atS: 0.3, glideS: 0.2 })
    expect(transcribe(slide, RATE, { lowest: 'E1' }).map((n) => n.name)).toEqual(['E2'])
  })
})

describe('transcribe: nothing played', () => {
  it('hears no note in silence', () => {
    expect(transcribe(new Float32Array(RATE), RATE, { lowest: 'E1' })).toEqual([])
  })

  it('hears no note in room noise with 50 Hz and 60 Hz hum', () => {
    for (const mainsHz of [50, 60]) {
      const room = mixInto(whiteNoise(RATE, 0.02, mainsHz), hum(RATE, RATE, mainsHz, 0.02))
      expect(transcribe(room, RATE, { lowest: 'B0' })).toEqual([])
    }
  })
})

describe('transcribe: bad input', () => {
  it.each([
    [{ lowest: 'H2' }, /not a note name/],
    [{ lowest: 200 }, /MIDI number/],
    [{ lowest: 'E2', highest: 'E1' }, /must not be below/],
  ])('rejects %o with a RangeError', (options, message) => {
    expect(() => transcribe(new Float32Array(10), RATE, options)).toThrow(message)
  })

  it('rejects an impossible sample rate', () => {
    expect(() => transcribe(new Float32Array(10), 0, { lowest: 'E1' })).toThrow(RangeError)
  })
})
