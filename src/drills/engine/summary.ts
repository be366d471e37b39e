// What a session adds up to: accuracy, median response time, the slowest cells and the misses.
import type { SessionState } from './session'
import { isShown } from './to-attempt'
import type { AnswerRecord, DrillQuestion, SessionSummary, SlowCell } from './types'

/** Median of a list of numbers (mean of the middle two for an even count); null when empty. */
export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null
  const sorted = [...values].sort((a, b) => a - b)
  const middle = Math.floor(sorted.length / 2)
  const upper = sorted[middle] ?? 0
  return sorted.length % 2 === 1 ? upper : ((sorted[middle - 1] ?? upper) + upper) / 2
}

/** Cells answered in the session, slowest median first (ties: more misses first), at most `limit`. */
export function slowestCells<Q extends DrillQuestion>(
  records: readonly AnswerRecord<Q>[],
  limit = 5,
): SlowCell[] {
  const byCell = new Map<string, AnswerRecord<Q>[]>()
  for (const record of records) {
    const cell = record.grade.cell
    if (cell === null) continue
    const key = `${cell.string}:${cell.fret}`
    byCell.set(key, [...(byCell.get(key) ?? []), record])
  }
  const cells = [...byCell.values()].map((group): SlowCell => {
    const cell = group[0]?.grade.cell ?? { string: 0, fret: 0 }
    const correct = group.filter((record) => record.grade.correct).length
    const ms = median(group.map((record) => record.responseMs)) ?? 0
    const name = group[0]?.question.name
    const slow = { string: cell.string, fret: cell.fret, medianMs: ms, answers: group.length }
    return { ...slow, correct, ...(name ? { name } : {}) }
  })
  cells.sort((a, b) => b.medianMs - a.medianMs || a.correct / a.answers - b.correct / b.answers)
  return cells.slice(0, limit)
}

/** The questions with at least one wrong answer, each once, in the order they were asked. */
export function missedQuestions<Q extends DrillQuestion>(records: readonly AnswerRecord<Q>[]): Q[] {
  const missed = new Map<string, Q>()
  for (const record of records) {
    if (!record.grade.correct && !missed.has(record.question.key)) {
      missed.set(record.question.key, record.question)
    }
  }
  return [...missed.values()]
}

export function summarize<Q extends DrillQuestion>(state: SessionState<Q>): SessionSummary<Q> {
  const { records } = state
  const answered = records.filter((record) => !isShown(record.grade))
  const correct = answered.filter((record) => record.grade.correct).length
  const asked = new Set(records.map((record) => record.questionIndex)).size
  return {
    answers: answered.length,
    correct,
    shown: records.length - answered.length,
    accuracy: answered.length === 0 ? null : correct / answered.length,
    medianMs: median(answered.map((record) => record.responseMs)),
    slowest: slowestCells(records),
    misses: missedQuestions(records),
    questionsAsked: asked,
    durationMs: Math.max(0, (state.finishedAt ?? 0) - (state.startedAt ?? 0)),
  }
}

/** A new question list from the misses of a finished session ("retry the misses"). */
export function retryQuestions<Q extends DrillQuestion>(state: SessionState<Q>): Q[] {
  return missedQuestions(state.records).map((question) => ({
    ...question,
    reason: 'missed just now',
  }))
}
