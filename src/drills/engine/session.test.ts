import { describe, expect, it } from 'vitest'
import {
  answerQuestion,
  createSession,
  currentQuestion,
  finishSession,
  limitsOf,
  nextQuestion,
  startSession,
  tick,
} from './session'
import type { DrillQuestion, Grade } from './types'

const question = (key: string, pitch: number): DrillQuestion => ({
  key,
  expectedPitch: pitch,
  cell: null,
  detail: {},
})
const QUESTIONS = [question('a', 40), question('b', 41), question('c', 42)]

function grade(correct: boolean, extra: Partial<Grade> = {}): Grade {
  return {
    correct,
    answer: 'x',
    cell: null,
    complete: true,
    counted: true,
    feedback: '',
    reveal: [],
    detail: {},
    ...extra,
  }
}

describe('drill session state machine', () => {
  it('walks question → answer → feedback → next and finishes after the last question', () => {
    let state = startSession(createSession(QUESTIONS), 1000)
    expect(state.status).toBe('asking')
    expect(currentQuestion(state)?.key).toBe('a')
    state = answerQuestion(state, grade(true), 1800)
    expect(state.status).toBe('feedback')
    state = nextQuestion(state, 2000)
    expect(currentQuestion(state)?.key).toBe('b')
    state = nextQuestion(answerQuestion(state, grade(false), 2500), 2600)
    state = nextQuestion(answerQuestion(state, grade(true), 3600), 3700)
    expect(state.status).toBe('finished')
    expect(state.endReason).toBe('done')
    expect(currentQuestion(state)).toBeNull()
  })

  it('times each answer from when its question was shown (arithmetic)', () => {
    let state = startSession(createSession(QUESTIONS), 1000)
    state = answerQuestion(state, grade(true), 1800) // 800 ms
    state = nextQuestion(state, 2000)
    state = answerQuestion(state, grade(false), 3250) // 1250 ms, not counting the feedback pause
    expect(state.records.map((record) => record.responseMs)).toEqual([800, 1250])
  })

  it('keeps a multi-pick question open and times each pick from the previous one', () => {
    let state = startSession(createSession(QUESTIONS), 0)
    state = answerQuestion(state, grade(true, { complete: false }), 500)
    expect(state.status).toBe('asking')
    state = answerQuestion(state, grade(false, { complete: false }), 1200)
    state = answerQuestion(state, grade(true, { complete: false, counted: false }), 1500)
    state = answerQuestion(state, grade(true), 2100)
    expect(state.status).toBe('feedback')
    expect(state.picks).toHaveLength(4)
    // the uncounted pick (a place already found) is not recorded and does not restart the clock
    expect(state.records.map((record) => record.responseMs)).toEqual([500, 700, 900])
  })

  it('ends a timed session when its time is up, on a tick or when moving on', () => {
    const timed = startSession(createSession(QUESTIONS, { timeLimitMs: 60_000 }), 0)
    expect(tick(timed, 59_999).status).toBe('asking')
    const ended = tick(timed, 60_000)
    expect(ended.status).toBe('finished')
    expect(ended.endReason).toBe('time')
    const answered = answerQuestion(timed, grade(true), 59_000)
    expect(nextQuestion(answered, 61_000).endReason).toBe('time')
  })

  it('ignores answers outside the asking state and lets the student stop early', () => {
    const ready = createSession(QUESTIONS)
    expect(answerQuestion(ready, grade(true), 10)).toBe(ready)
    const asking = startSession(ready, 0)
    const stopped = finishSession(asking, 5000)
    expect(stopped.status).toBe('finished')
    expect(stopped.endReason).toBe('stopped')
    expect(answerQuestion(stopped, grade(true), 6000).records).toHaveLength(0)
  })

  it('refuses an empty session', () => {
    expect(() => createSession([])).toThrow(RangeError)
  })
})

describe('session limits from settings', () => {
  it.each([
    [
      { questionCount: 24, timeLimitMinutes: null },
      { timeLimitMs: null, openEnded: false },
    ],
    [
      { questionCount: null, timeLimitMinutes: 5 },
      { timeLimitMs: 300_000, openEnded: true },
    ], // 5 × 60 000 ms
    [
      { questionCount: 12, timeLimitMinutes: 2 },
      { timeLimitMs: 120_000, openEnded: false },
    ],
    [
      { questionCount: null, timeLimitMinutes: null },
      { timeLimitMs: null, openEnded: true },
    ],
  ])('%j gives %j (arithmetic)', (settings, limits) => {
    expect(limitsOf(settings)).toEqual(limits)
  })
})
