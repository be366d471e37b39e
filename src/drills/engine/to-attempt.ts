// One graded answer as the attempts API stores it (src/contract/attempts.ts), with the detail its
// drill's contract describes (question detail and grade detail together).
import type { DrillAttempt } from '../../contract/attempts'
import type { DrillDetail, DrillId } from '../../contract/drills'
import type { AnswerRecord, DrillQuestion, Grade } from './types'

export interface AttemptContext {
  instrumentId: string | null
  tuning: readonly number[]
  planItemId: string | null
}

const MAX_RESPONSE_MS = 600_000

/** A grade given by "show me" (the answer revealed on request). */
export const isShown = (grade: Grade) => grade.detail.revealed === true

export function toAttempt<D extends DrillId, Q extends DrillQuestion>(
  drill: D,
  sessionId: string,
  entry: AnswerRecord<Q>,
  context: AttemptContext,
  createdAt: Date = new Date(),
): DrillAttempt<D> {
  const { question, grade } = entry
  return {
    id: crypto.randomUUID(),
    instrumentId: context.instrumentId,
    tuning: [...context.tuning],
    drill,
    sessionId,
    string: grade.cell?.string ?? null,
    fret: grade.cell?.fret ?? null,
    expectedPitch: question.expectedPitch,
    answer: grade.answer.slice(0, 32),
    correct: grade.correct,
    responseMs: Math.min(MAX_RESPONSE_MS, Math.max(0, Math.round(entry.responseMs))),
    createdAt: createdAt.toISOString(),
    detail: { ...question.detail, ...grade.detail } as DrillDetail[D],
    planItemId: context.planItemId,
    // "show me" is stored as shown: neither right nor a miss in the statistics
    outcome: isShown(grade) ? 'shown' : 'answered',
  }
}
