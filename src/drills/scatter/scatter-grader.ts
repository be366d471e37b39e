// Octave Scatter grading: each note at its exact pitch (the octave the sequence put it in), any string.
import { gradeLocate, revealLocate, type Neck, type PickedCell } from '../engine/locate'
import type { DrillGrader } from '../engine/types'
import type { ScatterQuestion } from './scatter-generator'

export function scatterGrader(neck: Neck): DrillGrader<ScatterQuestion, PickedCell> {
  return {
    grade: (question, pick) => ({
      ...gradeLocate({
        neck,
        expectedPitch: question.expectedPitch,
        expectedName: question.name,
        pick,
      }),
      detail: { displaced: question.displaced },
    }),
    reveal: (question) => revealLocate(neck, question.expectedPitch, question.name),
  }
}
