// A session's answers grouped the way a drill thinks (per key, per fingering, per octave), with the
// group most worth another go named as the next step.
import { median } from './summary'
import type { AnswerRecord, DrillQuestion } from './types'

export interface BreakdownRow {
  label: string
  /** Questions asked in this group (a question answered twice counts once). */
  questions: number
  answers: number
  correct: number
  medianMs: number | null
}

/** Groups the answers by `groupOf(question)`, in the order the groups were first asked. */
export function breakdown<Q extends DrillQuestion>(
  records: readonly AnswerRecord<Q>[],
  groupOf: (question: Q) => string,
): BreakdownRow[] {
  const groups = new Map<string, AnswerRecord<Q>[]>()
  for (const record of records) {
    const label = groupOf(record.question)
    groups.set(label, [...(groups.get(label) ?? []), record])
  }
  return [...groups].map(([label, group]) => ({
    label,
    questions: new Set(group.map((r) => r.questionIndex)).size,
    answers: group.length,
    correct: group.filter((r) => r.grade.correct).length,
    medianMs: median(group.map((r) => r.responseMs)),
  }))
}

/**
 * The group to practise next: the one with the lowest share of right answers (ties: the slower);
 * null when every answer was right, so the summary suggests moving on instead.
 */
export function weakestGroup(rows: readonly BreakdownRow[]): BreakdownRow | null {
  const missed = rows.filter((row) => row.correct < row.answers)
  if (missed.length === 0) return null
  const share = (row: BreakdownRow) => row.correct / row.answers
  return [...missed].sort(
    (a, b) => share(a) - share(b) || (b.medianMs ?? 0) - (a.medianMs ?? 0),
  )[0]!
}
