// Cuts an exercise's notes into measures: notes crossing a barline are tied, the last bar is filled
// with rests, and every piece is a length notation can write (whole … sixteenth, dotted or not).
import type { ExerciseNote } from './exercise'

/**
 * A written note value: its length in quarter-note beats, MusicXML's type name and its dots.
 *
 * @example
 * NOTE_VALUES.find((value) => value.beats === 1.5) // { beats: 1.5, type: 'quarter', dots: 1 }
 */
export interface NoteValue {
  beats: number
  type: 'whole' | 'half' | 'quarter' | 'eighth' | '16th'
  dots: 0 | 1
}

/** The note values the exports write, longest first. */
export const NOTE_VALUES: readonly NoteValue[] = [
  { beats: 4, type: 'whole', dots: 0 },
  { beats: 3, type: 'half', dots: 1 },
  { beats: 2, type: 'half', dots: 0 },
  { beats: 1.5, type: 'quarter', dots: 1 },
  { beats: 1, type: 'quarter', dots: 0 },
  { beats: 0.75, type: 'eighth', dots: 1 },
  { beats: 0.5, type: 'eighth', dots: 0 },
  { beats: 0.25, type: '16th', dots: 0 },
]

/** One written piece of a note (tied to its neighbours when the note was split) or a rest. */
export type MeasureEvent =
  | { kind: 'note'; noteIndex: number; value: NoteValue; tieStart: boolean; tieStop: boolean }
  | { kind: 'rest'; value: NoteValue }

/**
 * A measure: its number (from 1) and its events in order.
 *
 * @example
 * layoutMeasures([{ pitch: 28, name: 'E1', durationBeats: 4 }], 4)[0]?.events.length // 1
 */
export interface Measure {
  number: number
  events: MeasureEvent[]
}

/**
 * Splits a length into written note values, longest first (2.5 beats → half + eighth).
 *
 * @example
 * splitBeats(2.5) // [{ beats: 2, ... }, { beats: 0.5, ... }]
 */
export function splitBeats(beats: number): NoteValue[] {
  const values: NoteValue[] = []
  let left = beats
  while (left >= 0.25 - 1e-9) {
    const value = NOTE_VALUES.find((candidate) => candidate.beats <= left + 1e-9)
    if (!value) break
    values.push(value)
    left -= value.beats
  }
  return values
}

function restsFor(beats: number): MeasureEvent[] {
  return splitBeats(beats).map((value) => ({ kind: 'rest', value }))
}

/**
 * Lays notes out in measures of `beatsPerMeasure` beats: a note crossing a barline is split into
 * tied pieces, the last measure is filled with rests, and no notes give one measure of rest.
 *
 * @example
 * layoutMeasures([{ pitch: 28, name: 'E1', durationBeats: 3 }, { pitch: 33, name: 'A1', durationBeats: 2 }], 4)
 * // measure 1: E1 dotted half, A1 quarter (tie start); measure 2: A1 quarter (tie stop), half rest
 */
export function layoutMeasures(notes: readonly ExerciseNote[], beatsPerMeasure: number): Measure[] {
  const measures: Measure[] = [{ number: 1, events: [] }]
  let used = 0
  notes.forEach((note, noteIndex) => {
    const pieces: MeasureEvent[] = []
    let left = note.durationBeats
    while (left > 1e-9) {
      if (used >= beatsPerMeasure - 1e-9) {
        measures.push({ number: measures.length + 1, events: [] })
        used = 0
      }
      const take = Math.min(left, beatsPerMeasure - used)
      for (const value of splitBeats(take)) {
        const event: MeasureEvent = {
          kind: 'note',
          noteIndex,
          value,
          tieStart: false,
          tieStop: false,
        }
        measures.at(-1)?.events.push(event)
        pieces.push(event)
      }
      used += take
      left -= take
    }
    tiePieces(pieces)
  })
  if (used < beatsPerMeasure - 1e-9)
    measures.at(-1)?.events.push(...restsFor(beatsPerMeasure - used))
  return measures
}

function tiePieces(pieces: MeasureEvent[]): void {
  pieces.forEach((piece, index) => {
    if (piece.kind !== 'note') return
    piece.tieStop = index > 0
    piece.tieStart = index < pieces.length - 1
  })
}
