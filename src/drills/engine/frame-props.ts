// The props of <DrillSessionFrame> from a running session, so each drill view binds them in one go.
import { computed, type ComputedRef, type Ref } from 'vue'
import type { SessionStatus } from './session'
import type { DrillQuestion, Grade, SessionSummary } from './types'
import type { DrillNeck } from './useDrillNeck'
import type { DrillSession } from './useDrillSession'

export interface SessionFrameProps {
  status: SessionStatus
  questionNumber: number
  total: number
  /** The questions are a reserve for a time limit: the count is not shown as a goal. */
  timed: boolean
  answered: number
  correct: number
  elapsedMs: number
  remainingMs: number | null
  grade: Grade | null
  summary: SessionSummary<DrillQuestion> | null
  endReason: 'done' | 'time' | 'stopped' | null
  neck: DrillNeck
  /** What the frame's buttons do: the session's own actions (only "again" differs per drill). */
  controls: SessionControls
}

export interface SessionControls {
  next: () => void
  reveal: () => void
  stop: () => void
  retry: () => void
  settings: () => void
}

export function useFrameProps<Q extends DrillQuestion, A>(
  session: DrillSession<Q, A>,
  neck: Ref<DrillNeck>,
): ComputedRef<SessionFrameProps> {
  return computed(() => {
    const state = session.state.value
    return {
      status: session.status.value,
      questionNumber: (state?.index ?? 0) + 1,
      total: state?.questions.length ?? 0,
      timed: state?.limits.openEnded ?? false,
      answered: session.answered.value,
      correct: session.correct.value,
      elapsedMs: session.elapsedMs.value,
      remainingMs: session.remainingMs.value,
      grade: state?.lastGrade ?? null,
      summary: session.summary.value,
      endReason: state?.endReason ?? null,
      neck: neck.value,
      controls: {
        next: session.next,
        reveal: session.reveal,
        stop: session.stop,
        retry: () => void session.retryMisses(),
        settings: session.reset,
      },
    }
  })
}
