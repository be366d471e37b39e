// Where a Window Cycle session continues: after the last note answered on this page, else after
// the last one the server holds for this scale (and plan item), so every key of the cycle comes
// round in turn however short the sessions are.
import { computed, ref, watch, type Ref } from 'vue'
import { fetchCyclePosition } from '../../api/progress'
import type { CycleSettings, CycleStop } from '../../contract/drills'
import type { AnswerRecord } from '../engine/types'
import type { CycleQuestion } from './cycle-generator'

/** The stop a recorded answer leaves: its key, its note in the key and the key's way. */
export function stopOf(record: AnswerRecord<CycleQuestion> | undefined): CycleStop | null {
  const detail = record?.question.detail
  if (!record || !detail || typeof detail.noteIndex !== 'number') return null
  return { key: String(detail.key), noteIndex: detail.noteIndex, phase: record.question.direction }
}

export function useCycleStop(
  settings: Ref<CycleSettings>,
  planItemId: Ref<string | null>,
  records: Ref<readonly AnswerRecord<CycleQuestion>[] | undefined>,
) {
  const local = ref<CycleStop | null>(null)
  const stored = ref<CycleStop | null>(null)
  const restarting = ref(false)
  /** The server's answer is in (or failed): what the page shows about continuing is final. */
  const ready = ref(false)
  let loading: Promise<void> = Promise.resolve()

  async function load(scale: string, planItem: string | null) {
    stored.value = null
    ready.value = false
    try {
      const answer = await fetchCyclePosition({ scale, planItem: planItem ?? undefined })
      if (scale === settings.value.scale) stored.value = answer.stop
    } catch {
      stored.value = null // offline or signed out: start at the start key
    } finally {
      ready.value = true
    }
  }
  watch(
    () => [settings.value.scale, planItemId.value] as const,
    ([scale, planItem]) => {
      local.value = null
      restarting.value = false
      loading = load(scale, planItem)
    },
    { immediate: true },
  )
  watch(
    () => records.value?.length,
    () => {
      const stop = stopOf(records.value?.at(-1))
      if (stop) [local.value, restarting.value] = [stop, false]
    },
  )

  /** The stop the next session continues after; null: it begins at the start key. */
  const current = computed(() => (restarting.value ? null : (local.value ?? stored.value)))
  /** The stop, once the server has answered. */
  async function lastStop(): Promise<CycleStop | null> {
    await loading
    return current.value
  }
  /** Forget where the cycle stopped: the next session begins at the start key. */
  const restart = () => (restarting.value = true)
  return { current, lastStop, restart, ready }
}
