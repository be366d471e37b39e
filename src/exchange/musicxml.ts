// MusicXML 4.0 (W3C Music Notation Community Group) export of an exercise: a standard-notation part
// and a TAB part, laid out as in the standard's own tablature tutorial (two parts, TAB at sounding
// pitch with <staff-tuning> per string and <technical><string>/<fret> per note; string 1 = highest).
import { pitchName } from '../theory'
import { element } from './xml'
import { assertExercise, type Exercise, type ExerciseNote } from './exercise'
import { INSTRUMENT_PARTS } from './instrument-parts'
import { layoutMeasures, type Measure, type MeasureEvent } from './measures'
import { spelledNote } from './spelled-note'

/** Divisions of a quarter note: sixteenths are the finest length an exercise note has. */
export const DIVISIONS = 4

const DOCTYPE =
  '<!DOCTYPE score-partwise PUBLIC "-//Recordare//DTD MusicXML 4.0 Partwise//EN" "http://www.musicxml.org/dtds/partwise.dtd">'

interface PartWriter {
  exercise: Exercise
  tab: boolean
  /** Octaves added to the spelled (sounding) octave when writing a pitch. */
  octaveShift: number
}

function pitchElement(name: string, octaveShift: number): string {
  const { step, alter, octave } = spelledNote(name)
  return element('pitch', {}, [
    element('step', {}, step),
    alter === 0 ? '' : element('alter', {}, alter),
    element('octave', {}, octave + octaveShift),
  ])
}

function valueElements(event: MeasureEvent): string[] {
  return [element('type', {}, event.value.type), event.value.dots ? element('dot') : '']
}

function technical(note: ExerciseNote, tuning: readonly number[]): string {
  if (note.string === undefined || note.fret === undefined) return ''
  return element('technical', {}, [
    element('string', {}, tuning.length - note.string),
    element('fret', {}, note.fret),
  ])
}

function noteElement(writer: PartWriter, event: MeasureEvent & { kind: 'note' }): string {
  const note = writer.exercise.notes[event.noteIndex] as ExerciseNote
  const ties = [event.tieStop ? 'stop' : '', event.tieStart ? 'start' : ''].filter(Boolean)
  return element('note', {}, [
    pitchElement(note.name, writer.octaveShift),
    element('duration', {}, event.value.beats * DIVISIONS),
    ...ties.map((type) => element('tie', { type })),
    element('voice', {}, 1),
    ...valueElements(event),
    writer.tab ? element('stem', {}, 'none') : '',
    element('notations', {}, [
      ...ties.map((type) => element('tied', { type })),
      writer.tab ? technical(note, writer.exercise.tuning) : '',
    ]),
  ])
}

function restElement(event: MeasureEvent): string {
  return element('note', {}, [
    element('rest'),
    element('duration', {}, event.value.beats * DIVISIONS),
    element('voice', {}, 1),
    ...valueElements(event),
  ])
}

// What comes before a note's first piece on the standard staff: a key change and its words.
function leadIn(writer: PartWriter, event: MeasureEvent): string[] {
  if (writer.tab || event.kind !== 'note' || event.tieStop) return []
  const note = writer.exercise.notes[event.noteIndex] as ExerciseNote
  return [
    note.keyFifths === undefined
      ? ''
      : element('attributes', {}, [element('key', {}, [element('fifths', {}, note.keyFifths)])]),
    note.text === undefined
      ? ''
      : element('direction', { placement: 'above' }, [
          element('direction-type', {}, [element('words', {}, note.text)]),
        ]),
  ]
}

function keyAndTime(writer: PartWriter): string[] {
  const { exercise, tab } = writer
  const hidden = tab ? { 'print-object': 'no' } : {}
  return [
    element('key', hidden, [
      element('fifths', {}, exercise.keyFifths),
      exercise.mode ? element('mode', {}, exercise.mode) : '',
    ]),
    element('time', hidden, [
      element('beats', {}, exercise.beatsPerMeasure),
      element('beat-type', {}, 4),
    ]),
  ]
}

function standardClef(writer: PartWriter): string[] {
  const part = INSTRUMENT_PARTS[writer.exercise.instrument]
  const clef = element('clef', {}, [
    element('sign', {}, part.clef.sign),
    element('line', {}, part.clef.line),
    part.clefOctaveChange ? element('clef-octave-change', {}, part.clefOctaveChange) : '',
  ])
  if (!part.transposeOctaves) return [clef]
  const transpose = element('transpose', {}, [
    element('diatonic', {}, 0),
    element('chromatic', {}, 0),
    element('octave-change', {}, part.transposeOctaves),
  ])
  return [clef, transpose]
}

function tabClef(tuning: readonly number[]): string[] {
  const lines = tuning.map((open, index) => {
    const { step, alter, octave } = spelledNote(pitchName(open))
    return element('staff-tuning', { line: index + 1 }, [
      element('tuning-step', {}, step),
      alter === 0 ? '' : element('tuning-alter', {}, alter),
      element('tuning-octave', {}, octave),
    ])
  })
  return [
    element('clef', {}, [element('sign', {}, 'TAB'), element('line', {}, 5)]),
    element('staff-details', {}, [element('staff-lines', {}, tuning.length), ...lines]),
  ]
}

function firstAttributes(writer: PartWriter): string[] {
  const attributes = element('attributes', {}, [
    element('divisions', {}, DIVISIONS),
    ...keyAndTime(writer),
    ...(writer.tab ? tabClef(writer.exercise.tuning) : standardClef(writer)),
  ])
  if (writer.tab) return [attributes]
  const tempo = writer.exercise.tempo
  const metronome = element('direction', { placement: 'above' }, [
    element('direction-type', {}, [
      element('metronome', {}, [
        element('beat-unit', {}, 'quarter'),
        element('per-minute', {}, tempo),
      ]),
    ]),
    element('sound', { tempo }),
  ])
  return [attributes, metronome]
}

function measureElement(writer: PartWriter, measure: Measure, last: boolean): string {
  const events = measure.events.flatMap((event) => [
    ...leadIn(writer, event),
    event.kind === 'note' ? noteElement(writer, event) : restElement(event),
  ])
  const barline = last
    ? element('barline', { location: 'right' }, [element('bar-style', {}, 'light-heavy')])
    : ''
  const opening = measure.number === 1 ? firstAttributes(writer) : []
  return element('measure', { number: measure.number }, [...opening, ...events, barline])
}

function partElement(id: string, writer: PartWriter, measures: readonly Measure[]): string {
  return element(
    'part',
    { id },
    measures.map((measure, index) =>
      measureElement(writer, measure, index === measures.length - 1),
    ),
  )
}

function partList(exercise: Exercise, tab: boolean): string {
  const part = INSTRUMENT_PARTS[exercise.instrument]
  const scorePart = element('score-part', { id: 'P1' }, [
    element('part-name', {}, part.name),
    element('part-abbreviation', {}, part.abbreviation),
    element('score-instrument', { id: 'P1-I1' }, [element('instrument-name', {}, part.name)]),
    element('midi-instrument', { id: 'P1-I1' }, [
      element('midi-channel', {}, 1),
      element('midi-program', {}, part.program + 1),
    ]),
  ])
  const tabPart = tab
    ? element('score-part', { id: 'P2' }, [
        element('part-name', {}, `${part.name} [TAB]`),
        element('part-abbreviation', {}, part.abbreviation),
      ])
    : ''
  return element('part-list', {}, [scorePart, tabPart])
}

/**
 * Writes an exercise as a MusicXML 4.0 partwise score: part P1 in standard notation (bass clef,
 * written an octave above sounding through <transpose><octave-change>-1; guitar in treble 8vb at
 * sounding pitch), and part P2 as TAB for the exercise's tuning when every note has a string and
 * fret. Lengths in sixteenths (divisions 4); tempo as a metronome mark and <sound tempo>. Throws a
 * RangeError for an invalid exercise.
 *
 * @example
 * toMusicXml({ title: 'Open E', tempo: 80, keyFifths: 0, instrument: 'bass', tuning: [28, 33, 38, 43],
 *   beatsPerMeasure: 4, notes: [{ pitch: 28, name: 'E1', string: 0, fret: 0, durationBeats: 4 }] })
 * // '<?xml version="1.0" encoding="UTF-8"?>\n<!DOCTYPE score-partwise …><score-partwise version="4.0">…'
 */
export function toMusicXml(exercise: Exercise, options: { encodingDate?: string } = {}): string {
  assertExercise(exercise)
  const measures = layoutMeasures(exercise.notes, exercise.beatsPerMeasure)
  const tab = exercise.notes.length > 0 && exercise.notes.every((note) => note.string !== undefined)
  const part = INSTRUMENT_PARTS[exercise.instrument]
  const standard = { exercise, tab: false, octaveShift: -part.transposeOctaves }
  const date = options.encodingDate ?? new Date().toISOString().slice(0, 10)
  const score = element('score-partwise', { version: '4.0' }, [
    element('work', {}, [element('work-title', {}, exercise.title)]),
    element('identification', {}, [
      element('encoding', {}, [
        element('software', {}, 'Ambitus'),
        element('encoding-date', {}, date),
      ]),
    ]),
    partList(exercise, tab),
    partElement('P1', standard, measures),
    tab ? partElement('P2', { exercise, tab: true, octaveShift: 0 }, measures) : '',
  ])
  return `<?xml version="1.0" encoding="UTF-8" standalone="no"?>\n${DOCTYPE}\n${score}\n`
}
