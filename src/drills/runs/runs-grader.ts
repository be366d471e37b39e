// Range Runs grading: each note must be the exact pitch; following the fingering is noted, not required.
import { stringNames, toUnicode } from '../../theory'
import { gradeLocate, revealLocate, sameCell, type Neck, type PickedCell } from '../engine/locate'
import type { DrillGrader } from '../engine/types'
import type { RunsQuestion } from './runs-generator'

/**
 * A note is right when the picked cell sounds its exact pitch, on any string: the run is about
 * knowing where the notes are. Whether the pick followed the chosen fingering is stored on the
 * attempt (detail.onFingering) and said in the feedback, so a student sees when they drifted.
 */
export function runsGrader(neck: Neck): DrillGrader<RunsQuestion, PickedCell> {
  const strings = stringNames(neck.tuning, neck.accidentals)
  return {
    grade(question, pick) {
      const grade = gradeLocate({
        neck,
        expectedPitch: question.expectedPitch,
        expectedName: question.name,
        pick,
        questionCell: question.cell,
      })
      const onFingering = sameCell(pick, question.cell)
      const where = `${toUnicode(strings[question.cell.string] ?? '')} string, fret ${question.cell.fret}`
      const feedback =
        !grade.correct || onFingering
          ? grade.feedback
          : `Right note, ${toUnicode(question.name)}; this fingering plays it on the ${where}.`
      return {
        ...grade,
        feedback,
        reveal: grade.correct ? [question.cell] : grade.reveal,
        detail: { onFingering },
      }
    },
    reveal: (question) => ({
      ...revealLocate(neck, question.expectedPitch, question.name),
      cell: question.cell,
      reveal: [question.cell],
    }),
  }
}
