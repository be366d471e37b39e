// Wires the pure session engine to Vue: the clock (performance.now()), the time limit, automatic
// moving on after a right answer, and recording every counted answer through the attempts store.
import { computed, onBeforeUnmount, ref, shallowRef, type Ref, type ShallowRef } from 'vue'
import type { DrillId } from '../../contract/drills'
import { useBreakReminder } from '../../composables/useBreakReminder'
import { useAttemptsStore } from '../../stores/attempts'
import * as engine from './session'
import { retryQuestions, summarize } from './summary'
import { toAttempt, type AttemptContext } from './to-attempt'
import type { AnswerRecord, DrillGrader, DrillQuestion, Grade } from './types'
import type { DrillNeck } from './useDrillNeck'

/** What every drill records with an answer: the instrument of the moment and the plan item, if any. */
export const attemptContext =
  (neck: Ref<DrillNeck>, plan: { planItemId: Ref<string | null> }) => (): AttemptContext => ({
    instrumentId: neck.value.instrumentId,
    tuning: neck.value.tuning,
    planItemId: plan.planItemId.value,
  })

export interface DrillSessionOptions<Q extends DrillQuestion, A> {
  drill: DrillId
  /** Read when an answer is graded, so it follows the instrument and settings of the moment. */
  grader: () => DrillGrader<Q, A>
  context: () => AttemptContext
  /** Pause after a right answer before the next question (ms); wrong answers wait for "Next". */
  autoAdvanceMs?: number
  /** Called whenever a question is shown (e.g. to play its pitch). */
  onQuestion?: (question: Q) => void
}

const CLOCK_MS = 250
const AUTO_ADVANCE_MS = 700

// The session's moving parts, shared by the small functions below.
interface Core<Q extends DrillQuestion, A> {
  options: DrillSessionOptions<Q, A>
  state: ShallowRef<engine.SessionState<Q> | null>
  sessionId: Ref<string>
  now: Ref<number>
  timers: { clock?: ReturnType<typeof setInterval>; advance?: ReturnType<typeof setTimeout> }
  record(entry: AnswerRecord<Q>): void
  flush(): void
}

function stopTimers(timers: Core<DrillQuestion, unknown>['timers']) {
  clearInterval(timers.clock)
  clearTimeout(timers.advance)
}

/** Moves to a new state: a finished session is flushed, a newly shown question announced. */
function update<Q extends DrillQuestion, A>(core: Core<Q, A>, next: engine.SessionState<Q>) {
  const before = core.state.value
  core.state.value = next
  if (next.status === 'finished' && before?.status !== 'finished') {
    stopTimers(core.timers)
    core.flush()
  }
  const question = engine.currentQuestion(next)
  const moved =
    !before ||
    before.status === 'ready' ||
    before.status === 'finished' ||
    before.index !== next.index
  if (question && next.status === 'asking' && moved) core.options.onQuestion?.(question)
}

function start<Q extends DrillQuestion, A>(
  core: Core<Q, A>,
  questions: readonly Q[],
  limits: engine.SessionLimits = { timeLimitMs: null },
) {
  stopTimers(core.timers)
  core.sessionId.value = crypto.randomUUID()
  core.now.value = performance.now()
  update(core, engine.startSession(engine.createSession(questions, limits), core.now.value))
  core.timers.clock = setInterval(() => {
    core.now.value = performance.now()
    if (core.state.value) update(core, engine.tick(core.state.value, core.now.value))
  }, CLOCK_MS)
}

function goNext<Q extends DrillQuestion, A>(core: Core<Q, A>, at?: number) {
  clearTimeout(core.timers.advance)
  const now = Math.min(at ?? Infinity, performance.now())
  if (core.state.value) update(core, engine.nextQuestion(core.state.value, now))
}

/** Grades the current question with a grade from the grader; `at` is when the answer was given. */
function applyGrade<Q extends DrillQuestion, A>(
  core: Core<Q, A>,
  gradeOf: (grader: DrillGrader<Q, A>, question: Q, picks: readonly Grade[]) => Grade,
  at?: number,
) {
  const s = core.state.value
  const question = s ? engine.currentQuestion(s) : null
  if (!s || s.status !== 'asking' || !question) return
  const grade = gradeOf(core.options.grader(), question, s.picks)
  const next = engine.answerQuestion(s, grade, Math.min(at ?? Infinity, performance.now()))
  if (grade.counted) core.record(next.records[next.records.length - 1] as AnswerRecord<Q>)
  update(core, next)
  const pause = core.options.autoAdvanceMs ?? AUTO_ADVANCE_MS
  if (next.status === 'feedback' && grade.correct && pause > 0)
    core.timers.advance = setTimeout(() => goNext(core), pause)
}

/** A new session from the misses of the finished one; false when there were none. */
function retryMisses<Q extends DrillQuestion, A>(core: Core<Q, A>): boolean {
  const s = core.state.value
  if (!s || s.status !== 'finished') return false
  const questions = retryQuestions(s)
  if (questions.length === 0) return false
  start(core, questions, { timeLimitMs: null })
  return true
}

function sessionViews<Q extends DrillQuestion, A>(core: Core<Q, A>) {
  const { state } = core
  const elapsedMs = computed(() => {
    const s = state.value
    return !s || s.startedAt === null ? 0 : (s.finishedAt ?? core.now.value) - s.startedAt
  })
  return {
    status: computed(() => state.value?.status ?? 'ready'),
    current: computed(() => (state.value ? engine.currentQuestion(state.value) : null)),
    summary: computed(() => (state.value?.status === 'finished' ? summarize(state.value) : null)),
    elapsedMs,
    remainingMs: computed(() => {
      const limit = state.value?.limits.timeLimitMs ?? null
      return limit === null ? null : Math.max(0, limit - elapsedMs.value)
    }),
    answered: computed(() => state.value?.records.length ?? 0),
    correct: computed(() => state.value?.records.filter((r) => r.grade.correct).length ?? 0),
  }
}

function createCore<Q extends DrillQuestion, A>(options: DrillSessionOptions<Q, A>): Core<Q, A> {
  const attempts = useAttemptsStore()
  const breaks = useBreakReminder()
  const sessionId = ref<string>(crypto.randomUUID())
  return {
    options,
    state: shallowRef(null),
    sessionId,
    now: ref(performance.now()),
    timers: {},
    record(entry) {
      breaks.markActivity()
      attempts.record(toAttempt(options.drill, sessionId.value, entry, options.context()))
    },
    flush: () => void attempts.flush(),
  }
}

export function useDrillSession<Q extends DrillQuestion, A>(options: DrillSessionOptions<Q, A>) {
  const core = createCore(options)
  onBeforeUnmount(() => {
    stopTimers(core.timers)
    if (core.state.value?.records.length) core.flush()
  })
  const finish = (reason: 'stopped') => {
    if (core.state.value)
      update(core, engine.finishSession(core.state.value, performance.now(), reason))
  }
  return {
    state: core.state,
    sessionId: core.sessionId,
    ...sessionViews(core),
    /** Starts a new session with these questions (a fresh session id). */
    start: (questions: readonly Q[], limits?: engine.SessionLimits) =>
      start(core, questions, limits),
    /** Grades an answer; `at` (performance.now()) is when the student gave it, if before now. */
    answer: (given: A, at?: number) =>
      applyGrade(core, (g, q, picks) => g.grade(q, given, picks), at),
    /** "Show me": a miss that reveals the answer. */
    reveal: () => applyGrade(core, (g, q, picks) => g.reveal(q, picks)),
    /** On to the next question; `at` (a played take's note onset) is when it was shown. */
    next: (at?: number) => goNext(core, at),
    /** Grades with a grade made by the caller from the grader (a played take's note). */
    settle: (
      gradeOf: (grader: DrillGrader<Q, A>, question: Q, picks: readonly Grade[]) => Grade,
      at?: number,
    ) => applyGrade(core, gradeOf, at),
    /** The student ends the session early (answers so far are kept). */
    stop: () => finish('stopped'),
    retryMisses: () => retryMisses(core),
    /** Back to the setup (no session). */
    reset: () => {
      if (core.state.value && core.state.value.status !== 'finished') finish('stopped')
      core.state.value = null
    },
  }
}

export type DrillSession<Q extends DrillQuestion, A> = ReturnType<typeof useDrillSession<Q, A>>
