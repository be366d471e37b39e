// A note played on the instrument as a Grade: the drill's grader decides on the place the note
// sounds at, and the drill's play rules (exact octave, pitch class in a window, another octave than
// the note before) have the last word; the detail says it was played, and how it sat in time.
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { pitchName, toUnicode, type AccidentalPreference, type Position } from '../../theory'
import { placeOfPitch } from './heard-pitch'
import type { TakeEntry, TakeNote } from './play-take'
import type { AttemptDetail, DrillGrader, DrillQuestion, Grade } from './types'

/** How a drill hears a played note (beyond its `heard` answer). */
export interface PlayRules<Q extends DrillQuestion> {
  /** Questions with the same pass are played as one take (a run up and down, a sequence, a key);
   *  without it each question is answered by one note. */
  passOf?(question: Q): string
  /** Whether the note answers the question; default: its exact pitch. */
  matches?(question: Q, heard: TakeNote, previous: TakeNote | null): boolean
  /** Why the rules refuse a note, when they say more than the grader (null: the grader's words). */
  wrongWhy?(question: Q, heard: TakeNote): string | null
}

export const playedMatch =
  <Q extends DrillQuestion>(rules: PlayRules<Q>) =>
  (question: Q, heard: TakeNote, previous: TakeNote | null) =>
    rules.matches?.(question, heard, previous) ?? heard.pitch === question.expectedPitch

export interface PlayedGradeInput<Q extends DrillQuestion, A> {
  grader: DrillGrader<Q, A>
  question: Q
  picks: readonly Grade[]
  given: A | null
  note: TakeNote
  previous: TakeNote | null
  rules: PlayRules<Q>
  accidentals: AccidentalPreference
  extra: AttemptDetail
}

/** The grade of one played note. */
export function playedGrade<Q extends DrillQuestion, A>(input: PlayedGradeInput<Q, A>): Grade {
  const { grader, question, picks, given, note, rules } = input
  const base =
    given === null ? grader.reveal(question, picks) : grader.grade(question, given, picks)
  const right = playedMatch(rules)(question, note, input.previous)
  const heardName = toUnicode(pitchName(note.pitch, input.accidentals))
  let feedback = base.feedback
  const why = right ? null : (rules.wrongWhy?.(question, note) ?? null)
  if (right && !base.correct) feedback = `Right: ${heardName}.`
  else if (why) feedback = why
  else if (!right && (base.correct || given === null))
    feedback = octaveWords(question, note, input.accidentals)
  const detail: AttemptDetail = { ...base.detail, played: true, ...input.extra }
  delete detail.revealed
  return { ...base, correct: right, answer: pitchName(note.pitch), feedback, detail }
}

// A note of the right name in another octave: the played modes want the exact pitch.
function octaveWords(question: DrillQuestion, note: TakeNote, accidentals: AccidentalPreference) {
  const heard = toUnicode(pitchName(note.pitch, accidentals))
  const asked = toUnicode(pitchName(question.expectedPitch, accidentals))
  if (note.pitch % 12 !== question.expectedPitch % 12) return `Not ${heard}: ${asked} is asked.`
  const way = note.pitch > question.expectedPitch ? 'higher' : 'lower'
  return `Right note, wrong octave: ${heard} is ${way} than the ${asked} asked.`
}

/** The grade of an asked note the take left out. */
export function missingGrade(base: Grade, name: string): Grade {
  return { ...base, feedback: `${toUnicode(name)} was not played.`, detail: { ...base.detail } }
}

type Neck = { tuning: readonly number[]; frets: number; accidentals: AccidentalPreference }

/** Board marks of a graded take: right and wrong notes where they sound, missing ones asked, extras. */
export function takeMarks<Q extends DrillQuestion>(
  entries: readonly TakeEntry[],
  questions: readonly Q[],
  neck: Neck,
): CellMark[] {
  const label = (pitch: number) => toUnicode(pitchName(pitch, neck.accidentals))
  const near = (entry: TakeEntry): Position | null =>
    'index' in entry ? (questions[entry.index]?.cell ?? null) : null
  return entries.flatMap((entry): CellMark[] => {
    if (entry.kind === 'missing') {
      const question = questions[entry.index]
      const place = question && placeOfPitch(neck, question.expectedPitch, question.cell)
      return place ? [{ ...place, kind: 'hint', label: label(question.expectedPitch) }] : []
    }
    const place = placeOfPitch(neck, entry.heard.pitch, near(entry))
    if (!place) return []
    const kind = entry.kind === 'right' ? 'correct' : 'wrong'
    const prefix = entry.kind === 'extra' ? '+' : ''
    return [{ string: place.string, fret: place.fret, kind, label: prefix + label(place.pitch) }]
  })
}
