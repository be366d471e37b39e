// Range Runs' board: the chosen fingering (named notes), the notes already played in this pass
// where they were played, the note to play ringed, and the current pick's marks.
import type { CellMark } from '../../components/fretboard/fretboard-types'
import { toUnicode, type Fingering, type Position } from '../../theory'
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
