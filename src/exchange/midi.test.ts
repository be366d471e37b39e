import { describe, expect, it } from 'vitest'
import { Midi } from '@tonejs/midi'
import { cycleExercise, rangeRunExercise } from '../../tests/helpers/exercises'
import { toMidi } from './midi'

describe('toMidi round trip (@tonejs/midi)', () => {
  it('a range run: note numbers, ticks and seconds from the tempo (Standard MIDI File, MIDI 1.0)', () => {
    const { exercise } = rangeRunExercise()
    const midi = new Midi(toMidi({ ...exercise, tempo: 90 }))
    const [track] = midi.tracks
    expect(midi.header.ppq).toBe(480)
    // A Standard MIDI File stores whole microseconds per quarter: 60,000,000 / 90 = 666,666.7,
    // so the tempo read back is within one microsecond of it.
    const microseconds = 60_000_000 / midi.header.tempos[0]!.bpm
    expect(Math.abs(microseconds - 60_000_000 / 90)).toBeLessThanOrEqual(1)
    expect(midi.header.timeSignatures[0]!.timeSignature).toEqual([4, 4])
    expect(track!.notes.map((n) => n.midi)).toEqual(exercise.notes.map((n) => n.pitch))
    // Quarter notes: note k starts at tick 480·k and at 60/90·k seconds (arithmetic).
    track!.notes.forEach((note, k) => {
      expect(note.ticks).toBe(480 * k)
      expect(note.durationTicks).toBe(480)
      expect(note.time).toBeCloseTo((60 / 90) * k, 4)
    })
  })

  it('uses the bass and guitar General MIDI programs (1-based 34 and 28; 0-based 33 and 27)', () => {
    const { exercise } = cycleExercise()
    expect(new Midi(toMidi(exercise)).tracks[0]!.instrument.number).toBe(33)
    const guitar = new Midi(toMidi({ ...exercise, instrument: 'guitar' }))
    expect(guitar.tracks[0]!.instrument.number).toBe(27)
    // MIDI text is bytes: the title's dash arrives as a plain hyphen.
    expect(guitar.tracks[0]!.name).toBe('Window Cycle, major, window E1-C3')
  })

  it('keeps mixed lengths back to back: 1, 0.5, 2.5 beats → ticks 0, 480, 720', () => {
    const { exercise } = cycleExercise()
    const notes = exercise.notes
      .slice(0, 3)
      .map((n, i) => ({ ...n, durationBeats: [1, 0.5, 2.5][i]! }))
    const [track] = new Midi(toMidi({ ...exercise, notes })).tracks
    expect(track!.notes.map((n) => [n.ticks, n.durationTicks])).toEqual([
      [0, 480],
      [480, 240],
      [720, 1200],
    ])
  })
})
