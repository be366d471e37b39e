// Window Cycle grading: the exact pitch the window rule gives; folded (displaced) notes are flagged.
import { toUnicode } from '../../theory'
import { gradeLocate, revealLocate, type Neck, type PickedCell } from '../engine/locate'
import type { DrillGrader, Grade } from '../engine/types'
import type { CycleQuestion } from './cycle-generator'

// Going up, a note above the window folds down; going down, a note below it folds up.
const folded = (question: Pick<CycleQuestion, 'direction'>) =>
  `folded ${question.direction === 'down' ? 'up' : 'down'} an octave to stay inside the window`

function flagDisplaced(question: CycleQuestion, grade: Grade): Grade {
  const detail = { ...grade.detail, displaced: question.displaced }
  if (!question.displaced) return { ...grade, detail }
  const note = grade.correct ? ` (${folded(question)}).` : ` It was ${folded(question)}.`
  return {
    ...grade,
    detail,
    feedback: `${grade.feedback.replace(/\.$/, grade.correct ? '' : '.')}${note}`,
  }
}

/** The neck naming notes in the question's key (each key of the cycle in its own spelling). */
export const questionKeyed = <N extends Neck>(
  neck: N,
  question: Pick<CycleQuestion, 'tonic' | 'scale'> | null,
): N => ({ ...neck, key: question && { tonic: question.tonic, scale: question.scale } })

export function cycleGrader(neck: Neck): DrillGrader<CycleQuestion, PickedCell> {
  return {
    grade: (question, pick) =>
      flagDisplaced(
        question,
        gradeLocate({
          neck: questionKeyed(neck, question),
          expectedPitch: question.expectedPitch,
          expectedName: question.name,
          pick,
        }),
      ),
    reveal: (question) =>
      flagDisplaced(
        question,
        revealLocate(questionKeyed(neck, question), question.expectedPitch, question.name),
      ),
  }
}

/**
 * "E♭ major, degree 3" for prompts and feedback; the closing root says "(the octave)" only when it
 * lies an octave from the key's first note, and "(folded)" when a fold brought it back there.
 */
export function describeStep(
  question: Pick<CycleQuestion, 'tonic' | 'scale' | 'degree' | 'octave' | 'displaced'>,
): string {
  const step = `${toUnicode(question.tonic)} ${question.scale}, degree ${question.degree}`
  if (question.octave) return `${step} (the octave)`
  return question.displaced && question.degree === 1 ? `${step} (folded)` : step
}
