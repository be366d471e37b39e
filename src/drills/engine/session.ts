// The drill session as a pure state machine: ready → asking ⇄ feedback → finished. Every action
// takes the time (performance.now()) as an argument, so the engine is testable without clocks.
import type { AnswerRecord, DrillQuestion, Grade } from './types'

export type SessionStatus = 'ready' | 'asking' | 'feedback' | 'finished'

export interface SessionLimits {
  /** Ends the session when the time is up, whatever is left; null = no time limit. */
  timeLimitMs: number | null
  /** No question count was set: the questions are a reserve until the time is up or the student stops. */
  openEnded?: boolean
}

export interface SessionState<Q extends DrillQuestion> {
  status: SessionStatus
  questions: readonly Q[]
  index: number
  limits: SessionLimits
  startedAt: number | null
  finishedAt: number | null
  /** When the current question was shown, or its last pick was graded (response times start here). */
  shownAt: number | null
  records: readonly AnswerRecord<Q>[]
  /** The grades given to the current question so far (several in "find every place"). */
  picks: readonly Grade[]
  lastGrade: Grade | null
  /** Why the session ended: all questions asked, time up, or the student stopped. */
  endReason: 'done' | 'time' | 'stopped' | null
}

export function createSession<Q extends DrillQuestion>(
  questions: readonly Q[],
  limits: SessionLimits = { timeLimitMs: null },
): SessionState<Q> {
  if (questions.length === 0) throw new RangeError('A session needs at least one question.')
  return {
    status: 'ready',
    questions,
    index: 0,
    limits,
    startedAt: null,
    finishedAt: null,
    shownAt: null,
    records: [],
    picks: [],
    lastGrade: null,
    endReason: null,
  }
}

export function startSession<Q extends DrillQuestion>(
  state: SessionState<Q>,
  now: number,
): SessionState<Q> {
  if (state.status !== 'ready') return state
  return { ...state, status: 'asking', startedAt: now, shownAt: now }
}

export function currentQuestion<Q extends DrillQuestion>(state: SessionState<Q>): Q | null {
  return state.status === 'asking' || state.status === 'feedback'
    ? (state.questions[state.index] ?? null)
    : null
}

/** True once a time limit has run out (the session should then end). */
export function isTimeUp(state: SessionState<DrillQuestion>, now: number): boolean {
  const { timeLimitMs } = state.limits
  return timeLimitMs !== null && state.startedAt !== null && now - state.startedAt >= timeLimitMs
}

/** Records a grade for the current question; a complete grade moves to feedback. */
export function answerQuestion<Q extends DrillQuestion>(
  state: SessionState<Q>,
  grade: Grade,
  now: number,
): SessionState<Q> {
  const question = currentQuestion(state)
  if (state.status !== 'asking' || question === null) return state
  const responseMs = Math.max(0, Math.round(now - (state.shownAt ?? now)))
  const record: AnswerRecord<Q> = { question, questionIndex: state.index, grade, responseMs }
  return {
    ...state,
    status: grade.complete ? 'feedback' : 'asking',
    records: grade.counted ? [...state.records, record] : state.records,
    picks: [...state.picks, grade],
    lastGrade: grade,
    // the next pick of a multi-pick question is timed from this one
    shownAt: grade.counted ? now : state.shownAt,
  }
}

/** Leaves the feedback for the next question, or finishes when none is left or time is up. */
export function nextQuestion<Q extends DrillQuestion>(
  state: SessionState<Q>,
  now: number,
): SessionState<Q> {
  if (state.status !== 'feedback') return state
  if (isTimeUp(state, now)) return finishSession(state, now, 'time')
  if (state.index + 1 >= state.questions.length) return finishSession(state, now, 'done')
  return {
    ...state,
    status: 'asking',
    index: state.index + 1,
    shownAt: now,
    picks: [],
    lastGrade: null,
  }
}

/** Ends the session now (time up or the student stopped); the open question is dropped. */
export function finishSession<Q extends DrillQuestion>(
  state: SessionState<Q>,
  now: number,
  reason: 'done' | 'time' | 'stopped' = 'stopped',
): SessionState<Q> {
  if (state.status === 'finished') return state
  return { ...state, status: 'finished', finishedAt: now, endReason: reason, shownAt: null }
}

/** Checks the clock: ends a timed session whose time is up. */
export function tick<Q extends DrillQuestion>(
  state: SessionState<Q>,
  now: number,
): SessionState<Q> {
  if (state.status === 'ready' || state.status === 'finished') return state
  return isTimeUp(state, now) ? finishSession(state, now, 'time') : state
}

/** The limits of a session from a drill's length settings (minutes → ms). */
export function limitsOf(settings: {
  questionCount: number | null
  timeLimitMinutes: number | null
}): SessionLimits {
  const timeLimitMs = settings.timeLimitMinutes === null ? null : settings.timeLimitMinutes * 60_000
  return { timeLimitMs, openEnded: settings.questionCount === null }
}
