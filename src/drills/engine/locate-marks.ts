// Board marks for drills answered by picking cells: the picks of the current question (right or
// wrong, named) and, once it is answered, the places the student did not pick.
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { noteAt, type AccidentalPreference, type KeyRef, type Position } from '../../theory'
import { nameOnNeck, sameCell } from './locate'
import type { SessionState } from './session'
import type { DrillQuestion, Grade } from './types'

export interface LocateMarkOptions {
  tuning: readonly number[]
  accidentals: AccidentalPreference
  /** The drill's key: picked notes are named in it. */
  key?: KeyRef | null
  picks: readonly Grade[]
  /** The question is answered: show the places it revealed. */
  answered: boolean
  /** How the expected note is labelled on revealed places ("B♭2"). */
  expectedLabel: string
}

export function locateMarks(options: LocateMarkOptions): CellMark[] {
  const { tuning, accidentals, picks } = options
  const marks: CellMark[] = []
  const picked: Position[] = []
  for (const grade of picks) {
    if (!grade.pick || picked.some((cell) => sameCell(cell, grade.pick as Position))) continue
    picked.push(grade.pick)
    const pitch = noteAt(tuning, grade.pick.string, grade.pick.fret)
    const label = nameOnNeck({ tuning, frets: 0, accidentals, key: options.key }, pitch)
    marks.push({ ...grade.pick, kind: grade.correct ? 'correct' : 'wrong', label })
  }
  const last = picks[picks.length - 1]
  const reveal = options.answered ? (last?.reveal ?? []) : []
  for (const cell of reveal) {
    if (!picked.some((other) => sameCell(other, cell)))
      marks.push({ ...cell, kind: 'hint', label: options.expectedLabel })
  }
  return marks
}

/** The marks of the current question's picks, for a session answered on the board. */
export function currentPickMarks<Q extends DrillQuestion>(
  session: { current: { value: Q | null }; state: { value: SessionState<Q> | null } },
  neck: { tuning: readonly number[]; accidentals: AccidentalPreference; key?: KeyRef | null },
  expectedLabel: (question: Q) => string,
): CellMark[] {
  const question = session.current.value
  const state = session.state.value
  if (!question || !state) return []
  return locateMarks({
    tuning: neck.tuning,
    accidentals: neck.accidentals,
    key: neck.key,
    picks: state.picks,
    answered: state.status === 'feedback',
    expectedLabel: expectedLabel(question),
  })
}
