// A drill opened from a practice plan (/practice/<drill>?planItem=<id>): loads the item, checks it is
// for this drill, and gives its settings, title and target; every attempt then carries its id.
import { computed, ref, watch, type Ref } from 'vue'
import { useRoute } from 'vue-router'
import { ApiError } from '../../api/http'
import { fetchPlanItem } from '../../api/plans'
import { describeTarget } from '../../contract/targets'
import { drillContract, drillName, type DrillId, type DrillSettings } from '../../contract/drills'
import type { PracticeTarget } from '../../contract/targets'

export interface LoadedPlanItem<D extends DrillId> {
  id: string
  planTitle: string
  target: PracticeTarget
  targetText: string
  dueAt: string | null
  settings: DrillSettings[D]
}

export function usePlanItem<D extends DrillId>(drill: D) {
  const route = useRoute()
  const item = ref(null) as Ref<LoadedPlanItem<D> | null>
  const isLoading = ref(false)
  const error = ref<string | null>(null)
  const requestedId = computed(() =>
    typeof route.query.planItem === 'string' ? route.query.planItem : null,
  )

  async function load(id: string | null) {
    item.value = null
    error.value = null
    if (!id) return
    isLoading.value = true
    try {
      const context = await fetchPlanItem(id)
      if (context.preset.drill !== drill) {
        error.value = `This plan item is for ${drillName(context.preset.drill)}, not ${drillName(drill)}.`
        return
      }
      item.value = {
        id: context.id,
        planTitle: context.planTitle,
        target: context.target,
        targetText: describeTarget(context.target),
        dueAt: context.dueAt,
        // parsed again: fills defaults added since the plan was saved
        settings: drillContract(drill).settings.parse(context.preset.settings) as DrillSettings[D],
      }
    } catch (e) {
      error.value = e instanceof ApiError ? e.message : 'The plan item could not be loaded.'
    } finally {
      isLoading.value = false
    }
  }

  watch(requestedId, (id) => void load(id), { immediate: true })

  return { item, isLoading, error, planItemId: computed(() => item.value?.id ?? null) }
}
