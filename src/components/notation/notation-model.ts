// What the notation component draws, as plain data: clef, measures, VexFlow keys and durations,
// accidentals by the key signature and the bar, and where each exercise note's pieces are.
import {
  layoutMeasures,
  spelledNote,
  WRITTEN_OCTAVE_ABOVE,
  type Exercise,
  type MeasureEvent,
} from '@/exchange'
import { toUnicode } from '@/theory'

export type PitchView = 'written' | 'sounding'

export interface StaffEvent {
  /** Index of the exercise note, or null for a rest. */
  noteIndex: number | null
  /** VexFlow key ("eb/3"), or a rest position. */
  key: string
  /** VexFlow duration ("q", "8", "h" …) without the rest mark. */
  duration: string
  dots: number
  accidental: string | null
  tieStart: boolean
  tieStop: boolean
  /** TAB: VexFlow string number (1 = the highest) and fret. */
  tab: { str: number; fret: number } | null
  text: string | null
}

export interface StaffMeasure {
  number: number
  keyFifths: number
  keyChange: boolean
  events: StaffEvent[]
}

export interface NotationModel {
  clef: 'bass' | 'treble'
  /** VexFlow clef annotation: the small 8 below a guitar's treble clef. */
  clefAnnotation: '8vb' | null
  beatsPerMeasure: number
  strings: number
  measures: StaffMeasure[]
}

const DURATIONS: Record<string, string> = {
  whole: 'w',
  half: 'h',
  quarter: 'q',
  eighth: '8',
  '16th': '16',
}
const MAJOR_BY_FIFTHS = [
  'Cb',
  'Gb',
  'Db',
  'Ab',
  'Eb',
  'Bb',
  'F',
  'C',
  'G',
  'D',
  'A',
  'E',
  'B',
  'F#',
  'C#',
]
const SHARP_ORDER = 'FCGDAEB'
const ACCIDENTAL_SIGNS: Record<number, string> = { [-2]: 'bb', [-1]: 'b', 0: 'n', 1: '#', 2: '##' }

/**
 * The VexFlow key-signature name for a number of fifths (the major key with that signature).
 *
 * @example
 * keySignatureName(-3) // 'Eb'
 */
export function keySignatureName(fifths: number): string {
  return MAJOR_BY_FIFTHS[fifths + 7] ?? 'C'
}

/** The alteration the key signature gives a letter: +1 for sharpened, −1 for flattened letters. */
function signatureAlter(fifths: number, letter: string): number {
  const position = SHARP_ORDER.indexOf(letter)
  if (fifths > 0) return position < fifths ? 1 : 0
  if (fifths < 0) return 6 - position < -fifths ? -1 : 0
  return 0
}

/**
 * Clef and octave for a view: written bass parts sit an octave above sounding in bass clef, written
 * guitar parts in treble clef with an 8 below; sounding pitch is shown in bass clef.
 *
 * @example
 * clefFor('guitar', 'written') // { clef: 'treble', clefAnnotation: '8vb', octaveShift: 1 }
 */
export function clefFor(instrument: Exercise['instrument'], view: PitchView) {
  if (view === 'sounding') return { clef: 'bass' as const, clefAnnotation: null, octaveShift: 0 }
  const octaveShift = WRITTEN_OCTAVE_ABOVE[instrument]
  if (instrument === 'guitar')
    return { clef: 'treble' as const, clefAnnotation: '8vb' as const, octaveShift }
  return { clef: 'bass' as const, clefAnnotation: null, octaveShift }
}

function restKey(clef: 'bass' | 'treble') {
  return clef === 'bass' ? 'd/3' : 'b/4'
}

function toStaffEvents(
  exercise: Exercise,
  events: readonly MeasureEvent[],
  context: { fifths: number; octaveShift: number; clef: 'bass' | 'treble' },
): StaffEvent[] {
  const inBar = new Map<string, number>()
  return events.map((event): StaffEvent => {
    const duration = DURATIONS[event.value.type] ?? 'q'
    const base = { duration, dots: event.value.dots, text: null, tab: null, accidental: null }
    if (event.kind === 'rest') {
      return {
        ...base,
        noteIndex: null,
        key: restKey(context.clef),
        tieStart: false,
        tieStop: false,
      }
    }
    const note = exercise.notes[event.noteIndex]!
    const { step, alter, octave } = spelledNote(note.name)
    const written = octave + context.octaveShift
    const place = `${step}${written}`
    const current = inBar.get(place) ?? signatureAlter(context.fifths, step)
    inBar.set(place, alter)
    const accidental = current === alter || event.tieStop ? null : (ACCIDENTAL_SIGNS[alter] ?? null)
    const tab =
      note.string === undefined || note.fret === undefined
        ? null
        : { str: exercise.tuning.length - note.string, fret: note.fret }
    return {
      ...base,
      noteIndex: event.noteIndex,
      key: `${step.toLowerCase()}/${written}`,
      accidental,
      tieStart: event.tieStart,
      tieStop: event.tieStop,
      tab,
      text: event.tieStop || note.text === undefined ? null : toUnicode(note.text),
    }
  })
}

/**
 * Builds what to draw for an exercise in a view: measures with VexFlow keys, durations, accidentals
 * (shown when the key signature or an earlier note of the bar does not already give them), TAB
 * places and words, and the key signature in force at each measure.
 *
 * @example
 * notationModel(exercise, 'written').measures[0]?.events[0]?.key // 'f#/2' for F#1 on a bass
 */
export function notationModel(exercise: Exercise, view: PitchView): NotationModel {
  const { clef, clefAnnotation, octaveShift } = clefFor(exercise.instrument, view)
  let fifths = exercise.keyFifths
  let pending = false
  const measures = layoutMeasures(exercise.notes, exercise.beatsPerMeasure).map((measure) => {
    const first = measure.events[0]
    const change =
      first?.kind === 'note' && !first.tieStop
        ? exercise.notes[first.noteIndex]?.keyFifths
        : undefined
    const keyChange = pending || (change !== undefined && change !== fifths)
    fifths = change ?? fifths
    pending = false
    const keyFifths = fifths
    const events = toStaffEvents(exercise, measure.events, { fifths, octaveShift, clef })
    // A key change inside a bar is drawn at the next barline (signatures stand at barlines).
    for (const event of measure.events.slice(1)) {
      const later =
        event.kind === 'note' && !event.tieStop
          ? exercise.notes[event.noteIndex]?.keyFifths
          : undefined
      if (later !== undefined && later !== fifths) {
        fifths = later
        pending = true
      }
    }
    return { number: measure.number, keyFifths, keyChange, events }
  })
  return {
    clef,
    clefAnnotation,
    beatsPerMeasure: exercise.beatsPerMeasure,
    strings: exercise.tuning.length,
    measures,
  }
}
