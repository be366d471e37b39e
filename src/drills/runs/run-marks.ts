// Range Runs' board: the chosen fingering (finger numbers, or named notes), the notes already
// played in this pass where they were played, the note to play ringed, and the current pick's marks.
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { toUnicode, type Fingering, type HandMove, type Position } from '../../theory'

/** What a move adds to a finger number on the board: a stretch "↔", a shift "→" (open: "O"). */
export const MOVE_SIGNS: Readonly<Record<HandMove, string>> = {
  open: '',
  hand: '',
  stretch: '↔',
  shift: '→',
}

/** A finger as the board labels it: "1" … "4", "O" for an open string, with the move's sign. */
export function fingerLabel(finger: number | null | undefined, move: HandMove | null | undefined) {
  if (finger === null || finger === undefined) return ''
  return `${finger === 0 ? 'O' : finger}${move ? MOVE_SIGNS[move] : ''}`
}

/** The fingering's cells labelled with their finger numbers (stretches and shifts marked). */
export function fingerMarks(fingering: Fingering | null): CellMark[] {
  return (fingering?.positions ?? []).map((cell, index) => ({
    ...cell,
    kind: 'hint',
    label: fingerLabel(fingering?.fingers?.[index], fingering?.moves?.[index]),
  }))
}
import type { SessionState } from '../engine/session'
import type { RunsQuestion } from './runs-generator'

/** The fingering's cells, each named by its note (without octave). */
export function fingeringMarks(fingering: Fingering | null, names: readonly string[]): CellMark[] {
  return (fingering?.positions ?? []).map((cell, index) => ({
    ...cell,
    kind: 'hint',
    label: toUnicode(names[index]?.replace(/-?\d+$/, '') ?? ''),
  }))
}

/** Which pass (one run up and back down) a question belongs to. */
export const passOf = (question: RunsQuestion): string => question.key.split(':')[0] ?? ''

/** The notes already played in the current pass, where they were played. */
export function trailMarks(state: SessionState<RunsQuestion>, question: RunsQuestion): CellMark[] {
  return state.records
    .filter((r) => r.questionIndex < state.index && passOf(r.question) === passOf(question))
    .flatMap((r): CellMark[] =>
      r.grade.pick
        ? [{ ...(r.grade.pick as Position), kind: r.grade.correct ? 'correct' : 'wrong' }]
        : [],
    )
}

/** The questions of the current pass (a fingering up and back down) and where the student is in it. */
export function passOfQuestion(
  state: SessionState<RunsQuestion> | null,
  question: RunsQuestion | null,
) {
  if (!state || !question) return { names: [] as string[], at: 0 }
  const inPass = state.questions.filter((q) => passOf(q) === passOf(question))
  return { names: inPass.map((q) => q.name), at: inPass.indexOf(question) }
}
