// The exercise (notation, TAB, MusicXML, MIDI) of a drill's questions: each asked note in order, at
// the drill's place on the neck when it has one, with the key signature following the questions' keys.
import type { DrillQuestion } from '../drills/engine/types'
import { keyFifths, keyMode, type Exercise, type ExerciseNote, type ExportNeck } from '../exchange'
import { instrumentOfTuning } from '../exchange/spelled-note'
import { pitchName, type Position } from '../theory'
import { placeOnNeck } from '../theory/neck-placement'

/** The key a question is asked in (its tonic and scale), which sets the staff's key signature. */
export interface QuestionKey {
  tonic: string
  scale: string
}

/** How a drill's questions read as notes: the key of each and its spelled name with octave. */
export interface QuestionReading<Q extends DrillQuestion> {
  key(question: Q): QuestionKey
  name?(question: Q): string
}

/** Tempo of an exported exercise: quarter notes per minute, one note a beat. */
export const EXERCISE_TEMPO = 72

const sameKey = (a: QuestionKey, b: QuestionKey) => a.tonic === b.tonic && a.scale === b.scale

function places(questions: readonly DrillQuestion[], neck: ExportNeck): (Position | undefined)[] {
  if (questions.every((question) => question.cell)) return questions.map((q) => q.cell ?? undefined)
  return placeOnNeck(
    questions.map((question) => question.expectedPitch),
    neck.tuning,
    neck.frets,
  )
}

/**
 * The questions as an exercise: one note a beat, named as the drill spells it, placed where the
 * drill asks (else where the hand moves least), and a new key signature and key name where the key
 * changes (Window Cycle).
 *
 * @example
 * exerciseFromQuestions(session.questions, { tuning: [28, 33, 38, 43], frets: 20 }, reading, 'G major run')
 */
export function exerciseFromQuestions<Q extends DrillQuestion>(
  questions: readonly Q[],
  neck: ExportNeck,
  reading: QuestionReading<Q>,
  title: string,
): Exercise {
  const first = questions[0]
  if (!first) throw new RangeError('An exercise needs at least one note.')
  const firstKey = reading.key(first)
  const placed = places(questions, neck)
  const notes = questions.map((question, index): ExerciseNote => {
    const key = reading.key(question)
    const previous = questions[index - 1]
    const changes = previous !== undefined && !sameKey(key, reading.key(previous))
    const place = placed[index]
    return {
      pitch: question.expectedPitch,
      name: reading.name?.(question) ?? pitchName(question.expectedPitch),
      ...(place ? { string: place.string, fret: place.fret } : {}),
      durationBeats: 1,
      ...(changes
        ? { text: `${key.tonic} ${key.scale}`, keyFifths: keyFifths(key.tonic, key.scale) }
        : {}),
    }
  })
  return {
    title,
    tempo: EXERCISE_TEMPO,
    keyFifths: keyFifths(firstKey.tonic, firstKey.scale),
    mode: keyMode(firstKey.tonic, firstKey.scale),
    instrument: neck.instrument ?? instrumentOfTuning(neck.tuning),
    tuning: [...neck.tuning],
    beatsPerMeasure: 4,
    notes,
  }
}
