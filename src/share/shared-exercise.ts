// A shared link's exercise, made again from its drill, settings and fingering by the drill's own
// generator, so the visitor sees the very notes the sharer saw.
import type { SharedExercise } from '../api/shares'
import type { Exercise } from '../exchange'
import { drillPaper } from './drill-paper'
import { exerciseFromQuestions } from './question-exercise'

export type MadeExercise = { exercise: Exercise; error: null } | { exercise: null; error: string }

/**
 * The exercise of a share, or the theory core's message when its settings no longer make one.
 *
 * @example
 * sharedExercise(share).exercise?.notes.length // 15 for a one-octave scatter
 */
export function sharedExercise(share: SharedExercise): MadeExercise {
  const paper = drillPaper(share.preset.drill)
  if (!paper) return { exercise: null, error: 'This kind of exercise cannot be shown here yet.' }
  try {
    const neck = share.instrument
    const choice = { fingering: share.fingering, seed: 0 }
    const questions = paper.questions(share.preset.settings as never, neck, choice)
    return { exercise: exerciseFromQuestions(questions, neck, paper, share.title), error: null }
  } catch (error) {
    if (!(error instanceof RangeError)) throw error
    return { exercise: null, error: error.message }
  }
}
