// Standard MIDI File (MIDI 1.0) export of an exercise through @tonejs/midi: one track, the tempo,
// the time signature, and every note at its beat. No key-signature meta event: @tonejs/midi 2.0.28
// encodes it with the wrong sign offset (a C major key would be written as 14 sharps).
import { Midi } from '@tonejs/midi'
import { toAscii } from '../theory'
import { assertExercise, type Exercise } from './exercise'
import { INSTRUMENT_PARTS } from './instrument-parts'

/** Ticks per quarter note in our files (@tonejs/midi's default resolution). */
export const MIDI_PPQ = 480
/** A moderate, even loudness for every note (0–1, i.e. MIDI velocity 89). */
const VELOCITY = 0.7

/**
 * Text for a MIDI meta event in plain ASCII: @tonejs/midi writes one byte per character, so a dash
 * or a ♭ would arrive garbled.
 *
 * @example
 * midiText('Window Cycle, window E1–C3') // 'Window Cycle, window E1-C3'
 */
export function midiText(text: string): string {
  return toAscii(text)
    .replace(/[\u2013\u2014]/g, '-')
    .replace(/[^\x20-\x7e]/g, '')
}

/**
 * Where each note of an exercise starts and how long it lasts, in ticks (480 per quarter).
 *
 * @example
 * noteTicks([{ durationBeats: 1 }, { durationBeats: 0.5 }]) // [{ ticks: 0, durationTicks: 480 }, { ticks: 480, durationTicks: 240 }]
 */
export function noteTicks(
  notes: readonly { durationBeats: number }[],
): { ticks: number; durationTicks: number }[] {
  let at = 0
  return notes.map(({ durationBeats }) => {
    const durationTicks = Math.round(durationBeats * MIDI_PPQ)
    const placed = { ticks: at, durationTicks }
    at += durationTicks
    return placed
  })
}

/**
 * Writes an exercise as a Standard MIDI File (format 1): a tempo and time signature, then one
 * track named after the exercise with the instrument's General MIDI program (fingered bass 33,
 * clean guitar 27, 0-based) and each note at sounding pitch. Throws a RangeError for an invalid
 * exercise.
 *
 * @example
 * new Midi(toMidi(exercise)).tracks[0]?.notes.map((note) => note.midi) // the exercise's pitches
 */
export function toMidi(exercise: Exercise): Uint8Array {
  assertExercise(exercise)
  const midi = new Midi()
  midi.header.name = midiText(exercise.title)
  midi.header.setTempo(exercise.tempo)
  midi.header.timeSignatures.push({ ticks: 0, timeSignature: [exercise.beatsPerMeasure, 4] })
  midi.header.update()
  const track = midi.addTrack()
  track.name = midiText(exercise.title)
  track.channel = 0
  track.instrument.number = INSTRUMENT_PARTS[exercise.instrument].program
  const placed = noteTicks(exercise.notes)
  exercise.notes.forEach((note, index) => {
    const { ticks, durationTicks } = placed[index] ?? { ticks: 0, durationTicks: 0 }
    track.addNote({ midi: note.pitch, ticks, durationTicks, velocity: VELOCITY })
  })
  return midi.toArray()
}
