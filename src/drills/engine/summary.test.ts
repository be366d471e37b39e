import { describe, expect, it } from 'vitest'
import {
  answerQuestion,
  createSession,
  finishSession,
  nextQuestion,
  startSession,
  type SessionState,
} from './session'
import { median, retryQuestions, slowestCells, summarize } from './summary'
import type { DrillQuestion, Grade } from './types'

const cellQuestion = (string: number, fret: number): DrillQuestion => ({
  key: `${string}:${fret}`,
  expectedPitch: 28 + 5 * string + fret,
  cell: { string, fret },
  detail: {},
})

// Plays a session: each step answers the current question after `ms`, right or wrong.
function play(questions: DrillQuestion[], steps: [number, boolean][]): SessionState<DrillQuestion> {
  let now = 0
  let state = startSession(createSession(questions), now)
  for (const [ms, correct] of steps) {
    now += ms
    const cell = state.questions[state.index]?.cell ?? null
    const grade: Grade = {
      correct,
      answer: '',
      cell,
      complete: true,
      counted: true,
      feedback: '',
      reveal: [],
      detail: {},
    }
    state = nextQuestion(answerQuestion(state, grade, now), now)
  }
  return state.status === 'finished' ? state : finishSession(state, now)
}

describe('median (arithmetic)', () => {
  it.each([
    [[], null],
    [[700], 700],
    [[900, 300, 600], 600],
    [[400, 1000, 200, 800], 600], // middle two 400 and 800
  ])('median of %j is %s', (values, expected) => {
    expect(median(values)).toBe(expected)
  })
})

describe('session summary', () => {
  // Five answers: 1200 ✓, 800 ✗, 3000 ✓, 1000 ✓, 2600 ✗ (cells in that order; the last repeats 0:1).
  const questions = [
    cellQuestion(0, 1),
    cellQuestion(1, 3),
    cellQuestion(2, 5),
    cellQuestion(3, 0),
    cellQuestion(0, 1),
  ]
  const state = play(questions, [
    [1200, true],
    [800, false],
    [3000, true],
    [1000, true],
    [2600, false],
  ])
  const summary = summarize(state)

  it('counts accuracy and the median response time, worked by hand', () => {
    expect(summary.answers).toBe(5)
    expect(summary.correct).toBe(3)
    expect(summary.accuracy).toBeCloseTo(3 / 5)
    expect(summary.medianMs).toBe(1200) // sorted 800 1000 1200 2600 3000
    expect(summary.durationMs).toBe(8600) // 1200 + 800 + 3000 + 1000 + 2600
  })

  it('lists the slowest cells by their median time (0:1 answered in 1200 and 2600 → 1900)', () => {
    expect(summary.slowest.map(({ string, fret, medianMs }) => [string, fret, medianMs])).toEqual([
      [2, 5, 3000],
      [0, 1, 1900],
      [3, 0, 1000],
      [1, 3, 800],
    ])
    expect(summary.slowest[1]).toMatchObject({ answers: 2, correct: 1 })
  })

  it('keeps at most the requested number of slow cells', () => {
    expect(slowestCells(state.records, 2)).toHaveLength(2)
  })

  it('collects each missed question once, in the order asked, and retries them', () => {
    expect(summary.misses.map((question) => question.key)).toEqual(['1:3', '0:1'])
    const retry = retryQuestions(state)
    expect(retry.map((question) => question.key)).toEqual(['1:3', '0:1'])
    expect(retry.every((question) => question.reason === 'missed just now')).toBe(true)
  })

  it('gives no accuracy or median when nothing was answered', () => {
    const empty = summarize(finishSession(startSession(createSession(questions), 0), 5))
    expect(empty.accuracy).toBeNull()
    expect(empty.medianMs).toBeNull()
    expect(empty.misses).toEqual([])
  })
})
