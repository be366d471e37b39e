// The live breakdown of a session's answers for its summary (see breakdown.ts).
import { computed, type Ref } from 'vue'
import { breakdown } from './breakdown'
import type { SessionState } from './session'
import type { DrillQuestion } from './types'

export function useBreakdown<Q extends DrillQuestion>(
  state: Ref<SessionState<Q> | null>,
  groupOf: (question: Q) => string,
) {
  return computed(() => breakdown(state.value?.records ?? [], groupOf))
}
