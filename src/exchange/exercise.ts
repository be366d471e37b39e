// The generic exercise every export reads: spelled notes with durations and, for TAB, string and fret.
import { parsePitch, tuningErrors, type Instrument } from '../theory'

/**
 * One note of an exercise. `string` follows the theory core (0 = the lowest-pitched string); the
 * MusicXML writer turns it into the standard's numbering (1 = the highest string).
 *
 * @example
 * const note: ExerciseNote = { pitch: 31, name: 'G1', string: 0, fret: 3, durationBeats: 1 }
 */
export interface ExerciseNote {
  /** Sounding pitch, MIDI number. */
  pitch: number
  /** Spelled name with octave in ASCII scientific pitch notation ("Eb2", "Cb3"). */
  name: string
  string?: number
  fret?: number
  /** Length in quarter-note beats: a multiple of 1/4 (a sixteenth), at most 16. */
  durationBeats: number
  /** A few words printed above the note ("F major", "fold"). */
  text?: string
  /** A key signature (fifths) taking effect at this note. */
  keyFifths?: number
}

/**
 * An exercise ready for notation, MusicXML and MIDI: the notes plus what a score needs.
 *
 * @example
 * const exercise: Exercise = { title: 'G major run', tempo: 72, keyFifths: 1, mode: 'major',
 *   instrument: 'bass', tuning: [28, 33, 38, 43], beatsPerMeasure: 4, notes: [] }
 */
export interface Exercise {
  title: string
  /** Quarter notes per minute. */
  tempo: number
  /** Key signature: sharps positive, flats negative (−7…7). */
  keyFifths: number
  mode?: 'major' | 'minor'
  instrument: Instrument
  /** Open strings, lowest-pitched first (MIDI). */
  tuning: readonly number[]
  /** Quarter-note beats per measure (4 = 4/4). */
  beatsPerMeasure: number
  notes: readonly ExerciseNote[]
}

/** The shortest length an exercise note may have, in beats (a sixteenth note). */
export const BEAT_GRID = 0.25

function noteProblem(note: ExerciseNote, tuning: readonly number[]): string | null {
  if (!Number.isInteger(note.pitch) || note.pitch < 0 || note.pitch > 127)
    return `pitch ${String(note.pitch)} is not a MIDI note number`
  if (pitchOfName(note.name) !== note.pitch)
    return `"${note.name}" does not name pitch ${note.pitch}`
  const grid = note.durationBeats / BEAT_GRID
  if (!Number.isInteger(grid) || grid < 1 || note.durationBeats > 16)
    return `a length of ${String(note.durationBeats)} beats is not a multiple of a sixteenth up to 16`
  if ((note.string === undefined) !== (note.fret === undefined))
    return 'string and fret go together'
  if (note.string !== undefined && (tuning[note.string] ?? -99) + (note.fret ?? 0) !== note.pitch)
    return `string ${note.string}, fret ${String(note.fret)} does not sound ${note.name}`
  if (note.keyFifths !== undefined && !isFifths(note.keyFifths))
    return `${note.keyFifths} is not a key signature`
  return null
}

function pitchOfName(name: string): number | null {
  try {
    return parsePitch(name)
  } catch {
    return null
  }
}

const isFifths = (value: number) => Number.isInteger(value) && Math.abs(value) <= 7

/**
 * Throws a RangeError naming the first problem of an exercise: a note whose name, string and fret
 * disagree with its pitch, a length off the sixteenth grid, a bad key, tempo or tuning.
 *
 * @example
 * assertExercise({ ...exercise, notes: [{ pitch: 31, name: 'G1', durationBeats: 1 }] }) // passes
 */
export function assertExercise(exercise: Exercise): void {
  const tuningProblems = tuningErrors(exercise.tuning, 1)
  if (tuningProblems.length > 0) throw new RangeError(tuningProblems.join(' '))
  if (!isFifths(exercise.keyFifths)) throw new RangeError('The key needs −7 to 7 fifths.')
  if (!(exercise.tempo >= 20 && exercise.tempo <= 400))
    throw new RangeError('The tempo must be 20 to 400 beats per minute.')
  if (![2, 3, 4, 5, 6].includes(exercise.beatsPerMeasure))
    throw new RangeError('A measure holds 2 to 6 beats.')
  exercise.notes.forEach((note, index) => {
    const problem = noteProblem(note, exercise.tuning)
    if (problem) throw new RangeError(`Note ${index + 1}: ${problem}.`)
  })
}

/**
 * A file name for an exported exercise: its title in lower-case words joined by hyphens.
 *
 * @example
 * exerciseFileName({ ...exercise, title: 'Window Cycle, major, window E1–C3' }, 'musicxml') // 'window-cycle-major-window-e1-c3.musicxml'
 */
export function exerciseFileName(exercise: Pick<Exercise, 'title'>, extension: string): string {
  const slug = exercise.title
    .toLowerCase()
    .replace(/#/g, '-sharp')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
  return `${slug || 'exercise'}.${extension}`
}
