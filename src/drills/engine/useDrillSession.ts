// Wires the pure session engine to Vue: the clock (performance.now()), the time limit, automatic
// moving on after a right answer, and recording every counted answer through the attempts store.
import { computed, onBeforeUnmount, ref, shallowRef, type Ref } from 'vue'
import type { DrillId } from '../drill-settings'
import { useBreakReminder } from '../../composables/useBreakReminder'
import { useAttemptsStore } from '../../stores/attempts'
import * as engine from './session'
import { retryQuestions, summarize } from './summary'
import type { AnswerRecord, DrillGrader, DrillQuestion } from './types'
import type { DrillNeck } from './useDrillNeck'
import { toAttempt, type AttemptContext } from './to-attempt'

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

export function useDrillSession<Q extends DrillQuestion, A>(options: DrillSessionOptions<Q, A>) {
  const attempts = useAttemptsStore()
  const breaks = useBreakReminder()
  const state = shallowRef<engine.SessionState<Q> | null>(null)
  const sessionId = ref<string>(crypto.randomUUID())
  const now = ref(performance.now())
  let clock: ReturnType<typeof setInterval> | undefined
  let advance: ReturnType<typeof setTimeout> | undefined

  const status = computed(() => state.value?.status ?? 'ready')
  const current = computed(() => (state.value ? engine.currentQuestion(state.value) : null))
  const summary = computed(() =>
    state.value?.status === 'finished' ? summarize(state.value) : null,
  )
  const elapsedMs = computed(() => {
    const s = state.value
    if (!s || s.startedAt === null) return 0
    return (s.finishedAt ?? now.value) - s.startedAt
  })
  const remainingMs = computed(() => {
    const limit = state.value?.limits.timeLimitMs ?? null
    return limit === null ? null : Math.max(0, limit - elapsedMs.value)
  })
  const answered = computed(() => state.value?.records.length ?? 0)
  const correct = computed(() => state.value?.records.filter((r) => r.grade.correct).length ?? 0)

  function update(next: engine.SessionState<Q>) {
    const before = state.value
    state.value = next
    if (next.status === 'finished' && before?.status !== 'finished') onFinished()
    const question = engine.currentQuestion(next)
    const moved =
      !before ||
      before.status === 'ready' ||
      before.status === 'finished' ||
      before.index !== next.index
    if (question && next.status === 'asking' && moved) options.onQuestion?.(question)
  }

  function onFinished() {
    clearInterval(clock)
    clearTimeout(advance)
    void attempts.flush()
  }

  function record(entry: AnswerRecord<Q>) {
    breaks.markActivity()
    attempts.record(toAttempt(options.drill, sessionId.value, entry, options.context()))
  }

  /** Starts a new session with these questions (a fresh session id). */
  function start(questions: readonly Q[], limits: engine.SessionLimits = { timeLimitMs: null }) {
    clearTimeout(advance)
    clearInterval(clock)
    sessionId.value = crypto.randomUUID()
    now.value = performance.now()
    update(engine.startSession(engine.createSession(questions, limits), now.value))
    clock = setInterval(() => {
      now.value = performance.now()
      if (state.value) update(engine.tick(state.value, now.value))
    }, CLOCK_MS)
  }

  /** Grades an answer; `at` (performance.now()) is when the student gave it, if before now. */
  function answer(given: A, at?: number) {
    const s = state.value
    const question = current.value
    if (!s || s.status !== 'asking' || !question) return
    applyGrade(options.grader().grade(question, given, s.picks), at)
  }

  /** "Show me": a miss that reveals the answer. */
  function reveal() {
    const s = state.value
    const question = current.value
    if (!s || s.status !== 'asking' || !question) return
    applyGrade(options.grader().reveal(question, s.picks))
  }

  function applyGrade(grade: ReturnType<DrillGrader<Q, A>['grade']>, at?: number) {
    const s = state.value
    if (!s) return
    const next = engine.answerQuestion(s, grade, Math.min(at ?? Infinity, performance.now()))
    if (grade.counted) record(next.records[next.records.length - 1] as AnswerRecord<Q>)
    update(next)
    if (next.status === 'feedback' && grade.correct && (options.autoAdvanceMs ?? 700) > 0) {
      advance = setTimeout(goNext, options.autoAdvanceMs ?? 700)
    }
  }

  function goNext() {
    clearTimeout(advance)
    if (state.value) update(engine.nextQuestion(state.value, performance.now()))
  }

  /** The student ends the session early (answers so far are kept). */
  function stop() {
    if (state.value) update(engine.finishSession(state.value, performance.now(), 'stopped'))
  }

  /** A new session from the misses of the finished one; false when there were none. */
  function retryMisses(): boolean {
    const s = state.value
    if (!s || s.status !== 'finished') return false
    const questions = retryQuestions(s)
    if (questions.length === 0) return false
    start(questions, { timeLimitMs: null })
    return true
  }

  /** Back to the setup (no session). */
  function reset() {
    if (state.value && state.value.status !== 'finished') stop()
    state.value = null
  }

  onBeforeUnmount(() => {
    clearInterval(clock)
    clearTimeout(advance)
    if (state.value?.records.length) void attempts.flush()
  })

  return {
    state,
    sessionId,
    status,
    current,
    summary,
    elapsedMs,
    remainingMs,
    answered,
    correct,
    start,
    answer,
    reveal,
    next: goNext,
    stop,
    retryMisses,
    reset,
  }
}

export type DrillSession<Q extends DrillQuestion, A> = ReturnType<typeof useDrillSession<Q, A>>
