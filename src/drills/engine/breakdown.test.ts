import { describe, expect, it } from 'vitest'
import { breakdown, weakestGroup } from './breakdown'
import type { AnswerRecord, DrillQuestion } from './types'

type Q = DrillQuestion & { group: string }

function record(questionIndex: number, group: string, correct: boolean, responseMs: number) {
  const question = { key: `${group}${questionIndex}`, expectedPitch: 40, cell: null, group } as Q
  return {
    question,
    questionIndex,
    grade: { correct, counted: true, cell: null },
    responseMs,
  } as unknown as AnswerRecord<Q>
}

describe('breakdown (arithmetic on the session’s own answers)', () => {
  const records = [
    record(0, 'C major', true, 1000),
    record(1, 'C major', false, 3000),
    record(1, 'C major', true, 2000), // the same question answered again
    record(2, 'F major', true, 800),
    record(3, 'F major', true, 1200),
  ]

  it('groups in the order first asked, counting each question once', () => {
    expect(breakdown(records, (q) => q.group)).toEqual([
      { label: 'C major', questions: 2, answers: 3, correct: 2, medianMs: 2000 },
      { label: 'F major', questions: 2, answers: 2, correct: 2, medianMs: 1000 },
    ])
  })

  it('names the group with the lowest share right as the next step, none when all were right', () => {
    expect(weakestGroup(breakdown(records, (q) => q.group))?.label).toBe('C major')
    expect(weakestGroup(breakdown(records.slice(3), (q) => q.group))).toBeNull()
  })

  it('breaks a tie in share right by the slower median', () => {
    const tied = [record(0, 'A', false, 900), record(1, 'A', true, 900)]
    const slow = [record(2, 'B', false, 4000), record(3, 'B', true, 4000)]
    expect(weakestGroup(breakdown([...tied, ...slow], (q) => q.group))?.label).toBe('B')
  })
})
