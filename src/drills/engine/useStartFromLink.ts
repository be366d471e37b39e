// "Practise now" links: ?start=1 starts a session as soon as the drill page is ready, once;
// &first=1 makes it a newcomer's short first session (12 questions); &focus=1 asks the weakest places
// first (drills with a focus setting). With ?planItem=<id> the session starts once the plan item has
// loaded, with its settings, and the item stays in the address (its answers count toward its target).
import { nextTick, watch, type ComputedRef, type Ref } from 'vue'
import { useRoute, useRouter } from 'vue-router'

export const FIRST_SESSION_QUESTIONS = 12
/** The query keys that start a session; the rest of the address is kept. */
const START_KEYS = ['start', 'first', 'focus']

export interface StartableDrill {
  settled: ComputedRef<boolean>
  canStart: ComputedRef<boolean>
  settings: Ref<{ questionCount?: number | null; focus?: boolean }>
  plan: { isLoading: Ref<boolean>; item: Ref<unknown> }
  begin(): Promise<void>
}

export function useStartFromLink(drill: StartableDrill) {
  const route = useRoute()
  const router = useRouter()
  if (route.query.start !== '1') return
  const first = route.query.first === '1'
  const focus = route.query.focus === '1'
  const fromPlan = typeof route.query.planItem === 'string'
  // a plan item that failed to load leaves the setup showing its message: nothing starts
  const planReady = () => !fromPlan || drill.plan.item.value !== null
  let started = false
  watch(
    () => drill.settled.value && drill.canStart.value && !drill.plan.isLoading.value && planReady(),
    async (ready) => {
      if (!ready || started) return
      started = true
      await nextTick() // the plan item's settings reach the drill first
      if (first)
        drill.settings.value = { ...drill.settings.value, questionCount: FIRST_SESSION_QUESTIONS }
      if (focus && 'focus' in drill.settings.value)
        drill.settings.value = { ...drill.settings.value, focus: true }
      // the link starts once: a reload or "back" shows the setup again
      const query = Object.fromEntries(
        Object.entries(route.query).filter(([key]) => !START_KEYS.includes(key)),
      )
      void router.replace({ query })
      void drill.begin()
    },
    { immediate: true },
  )
}
