// Window Cycle grading: the exact pitch the window rule gives; folded (displaced) notes are flagged.
import { toUnicode } from '../../theory'
import { gradeLocate, revealLocate, type Neck, type PickedCell } from '../engine/locate'
import type { DrillGrader, Grade } from '../engine/types'
import type { CycleQuestion } from './cycle-generator'

const FOLDED = 'folded down an octave to stay inside the window'

function flagDisplaced(question: CycleQuestion, grade: Grade): Grade {
  const detail = { displaced: question.displaced }
  if (!question.displaced) return { ...grade, detail }
  const note = grade.correct ? ` (${FOLDED}).` : ` It was ${FOLDED}.`
  return {
    ...grade,
    detail,
    feedback: `${grade.feedback.replace(/\.$/, grade.correct ? '' : '.')}${note}`,
  }
}

export function cycleGrader(neck: Neck): DrillGrader<CycleQuestion, PickedCell> {
  return {
    grade: (question, pick) =>
      flagDisplaced(
        question,
        gradeLocate({
          neck,
          expectedPitch: question.expectedPitch,
          expectedName: question.name,
          pick,
        }),
      ),
    reveal: (question) =>
      flagDisplaced(question, revealLocate(neck, question.expectedPitch, question.name)),
  }
}

/** "E♭ major, degree 3" (or "degree 1, the octave") for prompts and feedback. */
export function describeStep(
  question: Pick<CycleQuestion, 'tonic' | 'scale' | 'degree' | 'octave'>,
): string {
  return `${toUnicode(question.tonic)} ${question.scale}, degree ${question.degree}${question.octave ? ' (the octave)' : ''}`
}
